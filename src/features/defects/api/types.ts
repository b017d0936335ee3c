import type { MachineCategory, MachineStatus, MeterUnit } from '../../../../shared/constants';
import type { DefectSeverity, DefectStatus } from '../../../../shared/schemas/defects';

export interface MachineRef {
  id: string;
  fleetNumber: string;
  name: string;
  category: MachineCategory;
  status: MachineStatus;
  meterUnit: MeterUnit;
}

export interface PersonRef {
  id: string;
  name: string;
}

export interface Defect {
  id: string;
  machine: MachineRef;
  title: string;
  description: string;
  severity: DefectSeverity;
  status: DefectStatus;
  walkaroundId: string | null;
  itemId: string | null;
  photoUrl: string | null;
  thumbnailUrl: string | null;
  /** the same defect found again on later walkarounds adds to this */
  reportCount: number;
  lastReportedAt: string;
  reportedBy: PersonRef | null;
  assignedTo: PersonRef | null;
  fixedAt: string | null;
  fixedBy: PersonRef | null;
  fixedByRecordId: string | null;
  fixNote: string;
  createdAt: string;
  updatedAt: string;
}

export interface DefectAbilities {
  update: boolean;
  close: boolean;
  /** the caller may return tagged-out machines to service (the farm's technicians, managers) */
  returnToService: boolean;
}

/** What closing a defect answers: the machine (its status unchanged) and its open critical count. */
export interface ClosedDefect {
  data: Defect;
  abilities: DefectAbilities;
  machine: MachineRef;
  openCriticalDefects: number;
}

export interface DefectList {
  data: Defect[];
  meta: {
    total: number;
    page: number;
    pageSize: number;
    activeBySeverity: Record<DefectSeverity, number>;
  };
  abilities: DefectAbilities;
}

export type DefectStatusFilter = 'active' | 'all' | DefectStatus;

export interface DefectFilters {
  status: DefectStatusFilter;
  severity?: DefectSeverity;
  machineId?: string;
  /** a user id, "me" or "none" */
  assignedTo?: string;
  page: number;
}

/** A machine to choose in the filters and the report form (a row of GET machines). */
export interface MachineOption {
  id: string;
  fleetNumber: string;
  name: string;
  status: MachineStatus;
}

/** A completed service record that may have fixed a defect. */
export interface CompletedRecord {
  id: string;
  performedOn: string | null;
  meterValue: number | null;
  tasks: { name: string }[];
  notes: string;
}
