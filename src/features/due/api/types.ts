import type { DueListQuery } from '../../../../shared/schemas/readings';
import type { ListFilters } from '../../../lib/list-filters';

// The due list's JSON, typed by the zod schemas the server checks its answers against.
export type { DueCounts, DueList, DueRow, StaleMeter } from '../../../../shared/schemas/due';

/**
 * The filters of the due list: its query (dueListQuerySchema, without the one machine), "any"
 * held as null. The server answers in its own order (overdue first, then date).
 */
export type DueFilters = ListFilters<Omit<DueListQuery, 'machineId'>, 'category' | 'status'>;
