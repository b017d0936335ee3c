import { z } from 'zod';
import type { DealerLink, ServiceBooking } from '../models';
import {
  BOOKING_STATUSES,
  DEALER_ACCESS,
  DEALER_LINK_STATUSES,
} from '../../shared/schemas/dealers';
import { dueRowSchema } from './due';
import { peopleById, personSchema } from './people';

const orgRef = z.object({ id: z.string(), name: z.string() });
const accessEnum = z.enum(DEALER_ACCESS);

/** A link as the farm sees it: which dealer, what access, since when. */
export const farmDealerLinkSchema = z
  .object({
    id: z.string(),
    dealer: orgRef,
    access: accessEnum,
    status: z.enum(DEALER_LINK_STATUSES),
    initiatedBy: z.enum(['dealer', 'farm']),
    acceptedAt: z.string().nullable(),
    revokedAt: z.string().nullable(),
    abilities: z.object({ update: z.boolean(), revoke: z.boolean() }),
  })
  .openapi('FarmDealerLink');

export function presentFarmLink(link: DealerLink, canManage: boolean) {
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
export const customerSchema = z
  .object({
    id: z.string(),
    status: z.enum(DEALER_LINK_STATUSES),
    customer: orgRef.nullable(),
    access: accessEnum.nullable(),
    invitedEmail: z.string(),
    machineCount: z.number(),
    acceptedAt: z.string().nullable(),
    expiresAt: z.string().nullable(),
    createdAt: z.string(),
  })
  .openapi('DealerCustomer');

export function presentCustomer(link: DealerLink, machineCount: number) {
  const active = link.status === 'active';
  return {
    id: link.id,
    status: link.status,
    customer: active && link.farm ? { id: link.farm.id, name: link.farm.name } : null,
    access: active ? link.access : null,
    invitedEmail: link.invitedEmail,
    machineCount: active ? machineCount : 0,
    acceptedAt: link.acceptedAt?.toISOString() ?? null,
    expiresAt: link.expiresAt?.toISOString() ?? null,
    createdAt: link.createdAt.toISOString(),
  };
}

export const boardRowSchema = dueRowSchema
  .extend({
    customer: orgRef.extend({ access: accessEnum }),
    lastReadingAgeDays: z
      .number()
      .nullable()
      .openapi({ description: 'whole days since the last reading; null without readings' }),
  })
  .openapi('BoardRow');

const partLine = z.object({
  partNumber: z.string(),
  description: z.string(),
  quantity: z.number(),
  machines: z.number(),
  services: z.number(),
  firstNeededOn: z.string(),
});
const fluidLine = z.object({
  kind: z.string(),
  unit: z.string(),
  volume: z.number(),
  machines: z.number(),
  services: z.number(),
  firstNeededOn: z.string(),
});
export const partsForecastSchema = z
  .object({
    asOf: z.string(),
    horizon: z.number(),
    services: z.number(),
    undated: z.number(),
    customers: z.array(orgRef.extend({ access: accessEnum })),
    parts: z.array(partLine),
    fluids: z.array(fluidLine),
    byCustomer: z.array(
      z.object({ customer: orgRef, parts: z.array(partLine), fluids: z.array(fluidLine) }),
    ),
  })
  .openapi('PartsForecast');

export const bookingSchema = z
  .object({
    id: z.string(),
    status: z.enum(BOOKING_STATUSES),
    proposedFor: z.string(),
    note: z.string(),
    responseNote: z.string(),
    customer: orgRef,
    dealer: orgRef,
    proposedBy: personSchema.nullable(),
    decidedBy: personSchema.nullable(),
    decidedAt: z.string().nullable(),
    createdAt: z.string(),
    items: z.array(
      z.object({
        machine: z.object({ id: z.string(), fleetNumber: z.string(), name: z.string() }),
        tasks: z.array(z.object({ taskId: z.string(), name: z.string() })),
        serviceRecordId: z.string().nullable(),
      }),
    ),
    abilities: z.object({ accept: z.boolean(), decline: z.boolean(), cancel: z.boolean() }),
  })
  .openapi('ServiceBooking');

export async function presentBookings(
  bookings: ServiceBooking[],
  names: Map<string, string>,
  abilities: (b: ServiceBooking) => { accept: boolean; decline: boolean; cancel: boolean },
) {
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
      tasks: i.tasks,
      serviceRecordId: i.serviceRecordId,
    })),
    abilities: abilities(b),
  }));
}

export const auditEventSchema = z
  .object({
    id: z.string(),
    action: z.string(),
    entityType: z.string(),
    entityId: z.string().nullable(),
    path: z.string().nullable(),
    actor: personSchema.nullable(),
    dealer: orgRef.nullable().openapi({
      description: 'the dealer the actor acted for (null: the farm’s own people)',
    }),
    createdAt: z.string(),
  })
  .openapi('AuditEvent');
