import { Op, type Transaction } from 'sequelize';
import { env } from '../env';
import { notFound } from '../errors';
import { Organization, ServiceBooking } from '../models';
import type { OrgAccess } from '../policies/access';
import type { BookingStatus } from '../../shared/schemas/dealers';
import type { PlannedVisit } from '../../shared/schemas/service-record-responses';
import { recordAudit } from '../infra/audit';
import { openPlansOf, plansOverlapping } from './planned-visits';

// Service bookings read from either side, and what proposing (booking-proposals.ts) and deciding
// (booking-decisions.ts) share: the audit entry and the link to the bookings page.

/** The bookings page of an organization, for the e-mails about a booking. */
export const bookingsUrl = (organizationId: string) =>
  `${env.APP_URL.replace(/\/+$/, '')}/o/${organizationId}/bookings`;

/** The audit entry of a booking's step (the dealer named). */
export const auditBooking = (
  access: OrgAccess,
  action: string,
  booking: ServiceBooking,
  changes: Record<string, unknown>,
  transaction?: Transaction,
) =>
  recordAudit(
    {
      organizationId: booking.organizationId,
      actorUserId: access.userId,
      action,
      entityType: 'service_booking',
      entityId: booking.id,
      changes: { dealerOrganizationId: booking.dealerOrganizationId, ...changes },
    },
    transaction,
  );

/** Bookings of this organization: a dealer's proposals, or a farm's, soonest date first. */
export async function listBookings(
  access: OrgAccess,
  query: { status?: BookingStatus; customerId?: string },
) {
  const dealer = access.organization.kind === 'dealer';
  return ServiceBooking.findAll({
    where: {
      ...(dealer
        ? { dealerOrganizationId: access.organization.id }
        : { organizationId: access.organization.id }),
      ...(query.status && { status: query.status }),
      ...(dealer && query.customerId && { organizationId: query.customerId }),
    },
    order: [
      ['proposedFor', 'ASC'],
      ['createdAt', 'ASC'],
    ],
    limit: 500,
  });
}

/** A booking of this organization (either side), or 404. */
export async function loadBooking(access: OrgAccess, id: string, transaction?: Transaction) {
  const side =
    access.organization.kind === 'dealer'
      ? { dealerOrganizationId: access.organization.id }
      : { organizationId: access.organization.id };
  const booking = await ServiceBooking.findOne({
    where: { id, ...side },
    transaction,
    ...(transaction && { lock: transaction.LOCK.UPDATE }),
  });
  if (!booking) throw notFound('Booking');
  return booking;
}

/** The names of the organizations (farms and dealers) the bookings name, by id. */
export async function bookingOrganizationNames(bookings: ServiceBooking[]) {
  const ids = [...new Set(bookings.flatMap((b) => [b.organizationId, b.dealerOrganizationId]))];
  const orgs = ids.length
    ? await Organization.findAll({ where: { id: { [Op.in]: ids } }, attributes: ['id', 'name'] })
    : [];
  return new Map(orgs.map((o) => [o.id, o.name]));
}

/**
 * For the farm, per proposal still waiting and per machine of it: the farm's open plans on the
 * proposed date or covering one of the proposed tasks — accepting would plan that work twice.
 * The dealer sees none (the farm's plans are the farm's own).
 */
export async function bookingOverlaps(access: OrgAccess, bookings: ServiceBooking[]) {
  const waiting =
    access.organization.kind === 'farm' ? bookings.filter((b) => b.status === 'proposed') : [];
  const plans = await openPlansOf(
    access.organization.id,
    waiting.flatMap((b) => b.items.map((i) => i.machineId)),
  );
  const overlaps = new Map<string, PlannedVisit[]>();
  for (const b of waiting)
    for (const i of b.items)
      overlaps.set(
        `${b.id}|${i.machineId}`,
        plansOverlapping(
          plans.get(i.machineId) ?? [],
          i.tasks.map((t) => t.taskId),
          b.proposedFor,
        ),
      );
  return (bookingId: string, machineId: string) => overlaps.get(`${bookingId}|${machineId}`) ?? [];
}
