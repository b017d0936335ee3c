import type { MachineCategory, MachineStatus, MeterUnit } from '../../../../shared/constants';
import type { DuePoint, DueStatus } from '../../../../shared/domain/types';

/** One task of one machine on the due list, as GET /organizations/:orgId/due presents it. */
export interface DueRow {
  taskId: string;
  taskName: string;
  hazards: string[];
  labourHours: number | null;
  machine: {
    id: string;
    fleetNumber: string;
    name: string;
    category: MachineCategory;
    status: MachineStatus;
    meterUnit: MeterUnit;
  };
  due: DuePoint;
  /** last reading: value on the meter fitted now, and on the lifetime scale */
  lastReading: { value: number; lifetimeValue: number; takenAt: string } | null;
  /** the due value as the meter fitted now shows it (differs after a meter replacement) */
  dueOnMeter: number | null;
  usage: { method: 'trend' | 'season' | 'none'; rate: number; low: number; high: number } | null;
}

export type DueCounts = Record<DueStatus, number>;

/** A machine in season whose meter has not been read for STALE_READING_DAYS or more. */
export interface StaleMeter {
  machine: { id: string; fleetNumber: string; name: string };
  lastReadingAt: string | null;
  daysSince: number | null;
}

export interface DueList {
  data: DueRow[];
  meta: {
    asOf: string;
    total: number;
    page: number;
    pageSize: number;
    counts: DueCounts;
    stale: StaleMeter[];
  };
}

/** The filters of the due list; the server answers in its own order (overdue first, then date). */
export interface DueFilters {
  horizon: number;
  category: MachineCategory | null;
  status: DueStatus | null;
  page: number;
  pageSize: number;
}
