import type { Defect } from '../../../../shared/schemas/defects';

// The service-record API's answers are the shared schemas' types (shared/schemas/service-record-responses.ts);
// what follows them here are the client's own views of other features' answers.
export type {
  Attachment,
  Measurement,
  MeasurementName,
  MeasurementPoint,
  Prefill,
  PullFluid,
  PullPart,
  RecordAbilities,
  RecordResponse,
  RecordWithResets,
  ServiceHistory,
  ServiceRecord,
  ShopDay,
  ShopDueRow,
  ShopPlanned,
  ShopWeek,
  SpecStatus,
  TaskReset,
} from '../../../../shared/schemas/service-record-responses';
export type { MachineRef, PersonRef as Person } from '../../../../shared/schemas/refs';

/** An open or in-repair defect a visit may close (from the machine's defect list). */
export type ActiveDefect = Pick<Defect, 'id' | 'title' | 'severity' | 'status'>;

export type { ShopPerson } from '../../../../shared/schemas/members';
export type { TaskChoice } from '../../../../shared/schemas/schedule';
