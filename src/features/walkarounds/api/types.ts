import type { Defect } from '../../../../shared/schemas/defects';
import type { Machine } from '../../../../shared/schemas/machines';

// The walkaround API's answers are the shared schemas' types (shared/schemas/walkarounds.ts);
// what follows them here are the client's views of other features' answers.
export type {
  Checklist,
  ChecklistItem,
  ChecklistResponse,
  UploadedPhoto,
  Walkaround as SentWalkaround,
  WalkaroundOutcome,
} from '../../../../shared/schemas/walkarounds';
export type { MachineRef } from '../../../../shared/schemas/refs';

/** A machine in the walkaround picker (a row of GET machines). */
export type PickableMachine = Pick<
  Machine,
  | 'id'
  | 'fleetNumber'
  | 'name'
  | 'category'
  | 'status'
  | 'restriction'
  | 'meterUnit'
  | 'lastReading'
  | 'operatorIds'
>;

/** What the outcome screen shows of a defect the walkaround raised. */
export type RaisedDefect = Pick<
  Defect,
  'id' | 'title' | 'description' | 'severity' | 'status' | 'itemId' | 'reportCount'
>;
