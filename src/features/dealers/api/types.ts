import type { MachineCategory } from '../../../../shared/constants';
import type { DueStatus } from '../../../../shared/domain/types';

// The dealer API's answers are the shared schemas' types (shared/schemas/dealer-responses.ts);
// the board's filters are the client's own.
export type {
  AuditEvent,
  AuditLog,
  Board,
  BoardRow,
  Booking,
  Customer,
  CustomerRef,
  DealerInvitation,
  FarmDealerLink,
  FluidLine,
  PartLine,
  PartsForecast,
  ReminderDraft,
} from '../../../../shared/schemas/dealer-responses';
export type { DueCounts } from '../../../../shared/schemas/due';
export type { OrgRef } from '../../../../shared/schemas/refs';

export interface BoardFilters {
  horizon: number;
  customerId: string | null;
  category: MachineCategory | null;
  task: string;
  status: DueStatus | null;
  page: number;
  pageSize: number;
}
