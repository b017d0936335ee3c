import type { BoardQuery } from '../../../../shared/schemas/dealers';
import type { ListFilters } from '../../../lib/list-filters';

// The dealer API's answers are the shared schemas' types (shared/schemas/dealer-responses.ts);
// the board's filters are its query (boardQuerySchema), "any" held as null.
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
  WearLine,
} from '../../../../shared/schemas/dealer-responses';
export type { DueCounts } from '../../../../shared/schemas/due';
export type { OrgRef } from '../../../../shared/schemas/refs';

export type BoardFilters = ListFilters<BoardQuery, 'customerId' | 'category' | 'status'>;
