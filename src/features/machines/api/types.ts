import { MACHINE_SORTS, type MachineListQuery } from '../../../../shared/schemas/machines';
import type { ListFilters } from '../../../lib/list-filters';

// The JSON of the machine endpoints is typed by the zod schemas the server checks its answers
// against (shared/schemas): no second description of it here.
export type {
  LastReading,
  Machine,
  MachineAbilities,
  MachineDetail,
  MachineList,
  MachineRefResponse,
  MachineResponse,
  TagOut,
  Usage,
} from '../../../../shared/schemas/machines';
export type {
  MeterReplacement,
  Reading,
  ReadingHistory,
  ReadingLogged,
  ReadingResponse,
  MeterReplacementResponse,
} from '../../../../shared/schemas/readings';

export const MACHINE_SORT_FIELDS = MACHINE_SORTS;
export type MachineSortField = (typeof MACHINE_SORT_FIELDS)[number];

export type MachineFilters = Pick<MachineListQuery, 'category' | 'status' | 'dueStatus' | 'q'> &
  Pick<ListFilters<MachineListQuery>, 'sort' | 'order' | 'page' | 'pageSize'>;
export type { Operator } from '../../../../shared/schemas/members';
