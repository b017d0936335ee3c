import type { MachineCategory, MachineStatus, MeterUnit } from '../../../../shared/constants';
import type { DuePoint, DueStatus } from '../../../../shared/domain/types';
import type {
  BookingStatus,
  DealerAccess,
  DealerLinkStatus,
} from '../../../../shared/schemas/dealers';

// The shapes of the dealer endpoints, as server/presenters/dealer.ts writes them.

export interface OrgRef {
  id: string;
  name: string;
}

export interface CustomerRef extends OrgRef {
  access: DealerAccess;
}

/** One due task of one customer's machine on the dealer's board. */
export interface BoardRow {
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
  lastReading: { value: number; lifetimeValue: number; takenAt: string } | null;
  dueOnMeter: number | null;
  customer: CustomerRef;
  /** whole days since the last reading; null without readings */
  lastReadingAgeDays: number | null;
}

export type DueCounts = Record<DueStatus, number>;

export interface Board {
  data: BoardRow[];
  meta: {
    asOf: string;
    total: number;
    page: number;
    pageSize: number;
    counts: DueCounts;
    customers: CustomerRef[];
  };
}

export interface BoardFilters {
  horizon: number;
  customerId: string | null;
  category: MachineCategory | null;
  task: string;
  status: DueStatus | null;
  page: number;
  pageSize: number;
}

export interface PartLine {
  partNumber: string;
  description: string;
  quantity: number;
  machines: number;
  services: number;
  firstNeededOn: string;
}

export interface FluidLine {
  kind: string;
  unit: string;
  volume: number;
  machines: number;
  services: number;
  firstNeededOn: string;
}

export interface PartsForecast {
  asOf: string;
  horizon: number;
  services: number;
  undated: number;
  customers: CustomerRef[];
  parts: PartLine[];
  fluids: FluidLine[];
  byCustomer: { customer: OrgRef; parts: PartLine[]; fluids: FluidLine[] }[];
}

/** A link as the dealer sees it: a customer, or a request the farm has not answered. */
export interface Customer {
  id: string;
  status: DealerLinkStatus;
  customer: OrgRef | null;
  access: DealerAccess | null;
  invitedEmail: string;
  machineCount: number;
  acceptedAt: string | null;
  expiresAt: string | null;
  createdAt: string;
}

/** A link as the farm sees it. */
export interface FarmDealerLink {
  id: string;
  dealer: OrgRef;
  access: DealerAccess;
  status: DealerLinkStatus;
  initiatedBy: 'dealer' | 'farm';
  acceptedAt: string | null;
  revokedAt: string | null;
  abilities: { update: boolean; revoke: boolean };
}

export interface DealerInvitation {
  dealer: OrgRef;
  invitedEmail: string;
  message: string;
  expiresAt: string | null;
  farms: (OrgRef & { linked: boolean })[];
}

export interface ReminderDraft {
  customer: OrgRef;
  subject: string;
  body: string;
  recipients: { name: string }[];
}

export interface Booking {
  id: string;
  status: BookingStatus;
  proposedFor: string;
  note: string;
  responseNote: string;
  customer: OrgRef;
  dealer: OrgRef;
  proposedBy: { id: string; name: string } | null;
  decidedBy: { id: string; name: string } | null;
  decidedAt: string | null;
  createdAt: string;
  items: {
    machine: { id: string; fleetNumber: string; name: string };
    tasks: { taskId: string; name: string }[];
    serviceRecordId: string | null;
  }[];
  abilities: { accept: boolean; decline: boolean; cancel: boolean };
}

export interface AuditEvent {
  id: string;
  action: string;
  entityType: string;
  entityId: string | null;
  path: string | null;
  actor: { id: string; name: string } | null;
  dealer: OrgRef | null;
  createdAt: string;
}

export interface AuditLog {
  data: AuditEvent[];
  meta: { total: number; page: number; pageSize: number };
  dealers: OrgRef[];
}
