import type { DealerLink, ServiceBooking } from '../models';
import type { Booking, Customer, FarmDealerLink } from '../../shared/schemas/dealer-responses';
import type { PlannedVisit } from '../../shared/schemas/service-record-responses';
import { peopleById } from './people';

/** A link as the farm sees it: which dealer, what access, since when. */
export function presentFarmLink(link: DealerLink, canManage: boolean): FarmDealerLink {
  return {
    id: link.id,
    dealer: { id: link.dealerOrganizationId, name: link.dealer?.name ?? '' },
    access: link.access,
    status: link.status,
    initiatedBy: link.initiatedBy,
    acceptedAt: link.acceptedAt?.toISOString() ?? null,
    revokedAt: link.revokedAt?.toISOString() ?? null,
    abilities: {
      update: canManage && link.status === 'active',
      revoke: canManage && link.status === 'active',
    },
  };
}

/** A link as the dealer sees it: a customer (active) or a request waiting for the farm. */
export function presentCustomer(link: DealerLink, machineCount: number): Customer {
  const active = link.status === 'active';
  return {
    id: link.id,
    status: link.status,
    customer: active && link.farm ? { id: link.farm.id, name: link.farm.name } : null,
    access: active ? link.access : null,
    farmSettings:
      active && link.farm
        ? { timeZone: link.farm.timeZone, currency: link.farm.currency, units: link.farm.units }
        : null,
    invitedEmail: link.invitedEmail,
    machineCount: active ? machineCount : 0,
    acceptedAt: link.acceptedAt?.toISOString() ?? null,
    expiresAt: link.expiresAt?.toISOString() ?? null,
    createdAt: link.createdAt.toISOString(),
  };
}

export async function presentBookings(
  bookings: ServiceBooking[],
  names: Map<string, string>,
  abilities: (b: ServiceBooking) => { accept: boolean; decline: boolean; cancel: boolean },
  plannedVisits: (bookingId: string, machineId: string) => PlannedVisit[] = () => [],
): Promise<Booking[]> {
  const person = await peopleById(bookings.flatMap((b) => [b.proposedBy, b.decidedBy]));
  return bookings.map((b) => ({
    id: b.id,
    status: b.status,
    proposedFor: b.proposedFor,
    note: b.note,
    responseNote: b.responseNote,
    customer: { id: b.organizationId, name: names.get(b.organizationId) ?? '' },
    dealer: { id: b.dealerOrganizationId, name: names.get(b.dealerOrganizationId) ?? '' },
    proposedBy: person(b.proposedBy),
    decidedBy: person(b.decidedBy),
    decidedAt: b.decidedAt?.toISOString() ?? null,
    createdAt: b.createdAt.toISOString(),
    items: b.items.map((i) => ({
      machine: { id: i.machineId, fleetNumber: i.fleetNumber, name: i.machineName },
      tasks: i.tasks.map((t) => ({ taskId: t.taskId, name: t.name })),
      serviceRecordId: i.serviceRecordId,
      plannedVisits: plannedVisits(b.id, i.machineId),
    })),
    abilities: abilities(b),
  }));
}
