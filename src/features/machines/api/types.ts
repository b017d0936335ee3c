import type { MachineCategory, MachineStatus } from '../../../../shared/constants';
import type { DueStatus } from '../../../../shared/domain/types';
import { MACHINE_SORTS } from '../../../../shared/schemas/machines';

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

export interface MachineFilters {
  category?: MachineCategory;
  status?: MachineStatus;
  dueStatus?: DueStatus;
  q?: string;
  sort: MachineSortField;
  order: 'asc' | 'desc';
  page: number;
  pageSize: number;
}

/** An operator of the farm, for assigning machines (taken from the member list). */
export interface Operator {
  userId: string;
  name: string;
}
