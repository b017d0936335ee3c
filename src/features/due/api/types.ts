import type { MachineCategory } from '../../../../shared/constants';
import type { DueStatus } from '../../../../shared/domain/types';

// The due list's JSON, typed by the zod schemas the server checks its answers against.
export type { DueCounts, DueList, DueRow, StaleMeter } from '../../../../shared/schemas/due';

/** The filters of the due list; the server answers in its own order (overdue first, then date). */
export interface DueFilters {
  horizon: number;
  category: MachineCategory | null;
  status: DueStatus | null;
  page: number;
  pageSize: number;
}
