import type { MachineCategory, MachineStatus, MeterUnit } from '../../../../shared/constants';
import type { DuePoint, DueStatus } from '../../../../shared/domain/types';
import type { Hazard } from '../../../../shared/schemas/schedule';
import type { ServiceStatus } from '../../../../shared/schemas/services';

// The shapes of the service-record API (server/routes/services/*.router.ts), as the client reads them.

export interface MachineRef {
  id: string;
  fleetNumber: string;
  name: string;
  category: MachineCategory;
  status: MachineStatus;
  meterUnit: MeterUnit;
}

export interface Person {
  id: string;
  name: string;
}

export type SpecStatus = 'in' | 'low' | 'high';

export interface Measurement {
  id: string;
  name: string;
  value: number;
  unit: string;
  specMin: number | null;
  specMax: number | null;
  inSpec: boolean | null;
  specStatus: SpecStatus | null;
}

export interface Attachment {
  id: string;
  kind: 'image' | 'pdf';
  contentType: string;
  fileName: string;
  sizeBytes: number;
  /** served through the API only (cookie session) */
  url: string;
  thumbnailUrl: string | null;
  uploadedBy: Person | null;
  createdAt: string;
}

export interface ServiceRecord {
  id: string;
  machine: MachineRef;
  status: ServiceStatus;
  /** ISO local dates (yyyy-mm-dd) */
  plannedFor: string | null;
  performedOn: string | null;
  /** as the meter fitted then showed it */
  meterValue: number | null;
  /** the same value on the machine's lifetime scale */
  meterLifetime: number | null;
  readingId: string | null;
  tasks: { taskId: string; name: string; onSchedule: boolean; labourHours: number | null }[];
  technicians: Person[];
  labourHours: number | null;
  estimatedLabourHours: number;
  parts: {
    partNumber: string;
    description: string;
    quantity: number;
    unitCost: number | null;
    lineCost: number | null;
  }[];
  fluids: {
    kind: string;
    volume: number;
    unit: string;
    unitCost: number | null;
    lineCost: number | null;
  }[];
  otherCosts: { description: string; amount: number }[];
  costs: { parts: number; fluids: number; other: number; total: number; linesWithoutCost: number };
  notes: string;
  measurements: Measurement[];
  reassemblySettings: { what: string; value: string; restored: boolean }[];
  unrestoredReason: string;
  defectIds: string[];
  attachments: Attachment[];
  createdBy: Person | null;
  completedBy: Person | null;
  completedAt: string | null;
  createdAt: string;
  updatedAt: string;
}

export interface RecordAbilities {
  update: boolean;
  complete: boolean;
  cancel: boolean;
  attach: boolean;
}

export interface RecordResponse {
  data: ServiceRecord;
  abilities: RecordAbilities;
}

/** What completing did to each task the visit covered. */
export interface TaskReset {
  taskId: string;
  name: string;
  reset: boolean;
  lastDoneMeter: number | null;
  lastDoneOn: string | null;
  note: string;
}

export interface RecordWithResets extends RecordResponse {
  resets: TaskReset[];
}

export interface ServiceHistory {
  data: ServiceRecord[];
  meta: { total: number; page: number; pageSize: number };
  abilities: { create: boolean };
}

export interface Prefill {
  tasks: { taskId: string; name: string; labourHours: number | null }[];
  estimatedLabourHours: number;
  parts: { partNumber: string; description: string; quantity: number; unitCost: number | null }[];
  fluids: { kind: string; volume: number; unit: string; unitCost: number | null }[];
}

export interface MeasurementName {
  name: string;
  unit: string;
  count: number;
  lastOn: string;
  lastValue: number;
}

export interface MeasurementPoint {
  recordId: string;
  performedOn: string;
  meterValue: number | null;
  value: number;
  unit: string;
  specMin: number | null;
  specMax: number | null;
  inSpec: boolean | null;
}

/** A member who may be named on a record: the farm's technicians and managers. */
export interface ShopPerson {
  userId: string;
  name: string;
  role: 'manager' | 'technician';
}

/** An open or in-repair defect a visit may close. */
export interface ActiveDefect {
  id: string;
  title: string;
  severity: 'critical' | 'major' | 'minor';
  status: 'open' | 'in_repair' | 'fixed';
}

/** A task of the machine's schedule, as the form needs it (from the schedules feature's list). */
export interface TaskChoice {
  id: string;
  name: string;
  hazards: Hazard[];
  safetyNotes: string;
  labourHours: number | null;
  /** the task's due status now, as the server computed it */
  dueStatus: DueStatus | null;
}

export interface PullPart {
  partNumber: string;
  description: string;
  quantity: number;
}
export interface PullFluid {
  kind: string;
  unit: string;
  volume: number;
}

/** A due-list row with the plan that covers it, if any. */
export interface ShopDueRow {
  taskId: string;
  taskName: string;
  hazards: string[];
  labourHours: number | null;
  machine: MachineRef;
  due: DuePoint;
  lastReading: { value: number; takenAt: string } | null;
  booked: { recordId: string; plannedFor: string } | null;
}

export interface ShopPlanned {
  id: string;
  plannedFor: string;
  machine: MachineRef;
  tasks: { taskId: string; name: string; labourHours: number | null }[];
  technicians: Person[];
  notes: string;
  defectIds: string[];
  estimatedLabourHours: number;
  partsToPull: PullPart[];
  fluidsToPull: PullFluid[];
}

export interface ShopDay {
  date: string;
  weekday: string;
  planned: ShopPlanned[];
  due: ShopDueRow[];
  plannedLabourHours: number;
  unbookedDueLabourHours: number;
  partsToPull: PullPart[];
  fluidsToPull: PullFluid[];
}

export interface ShopWeek {
  start: string;
  end: string;
  asOf: string;
  days: ShopDay[];
  overdue: ShopDueRow[];
  totals: {
    plannedRecords: number;
    dueTasks: number;
    overdueTasks: number;
    plannedLabourHours: number;
    unbookedDueLabourHours: number;
    partsToPull: PullPart[];
    fluidsToPull: PullFluid[];
  };
}
