import type {
  MachineCategory,
  MachineStatus,
  MeterUnit,
  ReadingSource,
} from '../../../../shared/constants';
import type { DueStatus } from '../../../../shared/domain/types';

export interface LastReading {
  /** the value shown on the meter fitted now */
  value: number;
  /** the same reading on the machine's lifetime scale (differs after a meter replacement) */
  lifetimeValue: number;
  takenAt: string;
}

export interface Machine {
  id: string;
  fleetNumber: string;
  name: string;
  category: MachineCategory;
  make: string;
  model: string;
  serialNumber: string;
  year: number | null;
  purchasePrice: number | null;
  listPrice: number | null;
  meterUnit: MeterUnit;
  status: MachineStatus;
  seasonMonths: number[];
  notes: string;
  operatorIds: string[];
  lastReading: LastReading | null;
  dueStatus: DueStatus | null;
  /** ISO local date (yyyy-mm-dd) */
  nextDueDate: string | null;
  /** served by the API to people who may see the machine; null without a photo */
  photoUrl: string | null;
  thumbnailUrl: string | null;
}

/** The server's usage estimate: meter units per day, with a low/high range. */
export interface Usage {
  method: 'trend' | 'season' | 'none';
  rate: number;
  low: number;
  high: number;
  readingCount: number;
  explanation: string;
}

export interface MachineAbilities {
  update: boolean;
  editSchedule: boolean;
  setLastDone: boolean;
  logReading: boolean;
  correctReading: boolean;
  replaceMeter: boolean;
  /** the machine is tagged out and the caller is one of the farm's technicians or managers */
  returnToService: boolean;
}

/** Why and since when a machine is tagged out; a dealer is told neither why nor how many. */
export interface TagOut {
  since: string | null;
  reason: string | null;
  openCriticalDefects: number | null;
}

export interface MachineDetail {
  data: Machine & { usage: Usage | null; tagOut: TagOut | null };
  abilities: MachineAbilities;
}

export const MACHINE_SORT_FIELDS = [
  'fleetNumber',
  'name',
  'category',
  'status',
  'nextDue',
] as const;
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

export interface MachineList {
  data: Machine[];
  meta: { total: number; page: number; pageSize: number };
  abilities: { create: boolean };
}

export interface Reading {
  id: string;
  /** as the meter showed it */
  value: number;
  /** continuous across meter replacements; what the forecast and the chart use */
  lifetimeValue: number;
  takenAt: string;
  source: ReadingSource;
  enteredBy: string | null;
}

export interface MeterReplacement {
  id: string;
  replacedAt: string;
  oldFinalValue: number;
  newStartValue: number;
  note: string;
}

export interface ReadingHistory {
  data: Reading[];
  replacements: MeterReplacement[];
}

export interface Operator {
  userId: string;
  name: string;
}
