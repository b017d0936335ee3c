import type { DueStatus } from '../../../../shared/domain/types';
import type { Defect } from '../../../../shared/schemas/defects';
import type { Member } from '../../../../shared/schemas/members';
import type { Task } from '../../../../shared/schemas/schedule';

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

/** A member who may be named on a record: the farm's technicians and managers. */
export type ShopPerson = {
  userId: Member['user']['id'];
  name: Member['user']['name'];
  role: Extract<Member['role'], 'manager' | 'technician'>;
};

/** An open or in-repair defect a visit may close (from the machine's defect list). */
export type ActiveDefect = Pick<Defect, 'id' | 'title' | 'severity' | 'status'>;

/** A task of the machine's schedule, as the form needs it (from the schedules feature's list). */
export type TaskChoice = Pick<Task, 'id' | 'name' | 'hazards' | 'safetyNotes' | 'labourHours'> & {
  /** the task's due status now, as the server computed it */
  dueStatus: DueStatus | null;
};
