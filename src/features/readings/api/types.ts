import type { MachineCategory, MachineStatus, MeterUnit } from '../../../../shared/constants';

/** One machine the caller may log hours for, with its last reading (GET readings/latest). */
export interface LatestReading {
  machine: {
    id: string;
    fleetNumber: string;
    name: string;
    meterUnit: MeterUnit;
    status: MachineStatus;
    category: MachineCategory;
  };
  lastReading: { value: number; lifetimeValue: number; takenAt: string } | null;
}

export interface BulkReadingOutcome {
  machineId: string;
  status: 'added' | 'duplicate';
}

/** One row of a CSV file as the server read and checked it. */
export interface ImportPreviewRow {
  line: number;
  fleetNumber: string;
  machine: { id: string; name: string; fleetNumber: string; meterUnit: string } | null;
  takenAt: string | null;
  value: number | null;
  status: 'new' | 'duplicate' | 'error';
  error: string | null;
}

export interface ImportPreview {
  rows: ImportPreviewRow[];
  summary: { total: number; new: number; duplicates: number; errors: number };
}

export interface ImportResult {
  added: number;
  duplicates: number;
  total: number;
}
