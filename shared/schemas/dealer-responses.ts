import { z } from 'zod';
import { UNIT_SYSTEMS } from '../constants';
import { BOOKING_STATUSES, DEALER_ACCESS, DEALER_LINK_STATUSES } from './dealers';
import { dueCountsSchema, dueRowSchema } from './due';
import { orgRefSchema, pageMetaSchema, personRefSchema } from './refs';
import { plannedVisitSchema } from './service-record-responses';

// What the dealer endpoints answer (server/routes/dealers): links from either side, the board,
// the parts forecast, reminders, bookings and the farm's audit log.

const accessEnum = z.enum(DEALER_ACCESS);

/** A customer farm with the access its link gives. */
export const customerRefSchema = orgRefSchema.extend({ access: accessEnum });
export type CustomerRef = z.infer<typeof customerRefSchema>;

/** A link as the farm sees it: which dealer, what access, since when. */
export const farmDealerLinkSchema = z
  .object({
    id: z.string(),
    dealer: orgRefSchema,
    access: accessEnum,
    status: z.enum(DEALER_LINK_STATUSES),
    initiatedBy: z.enum(['dealer', 'farm']),
    acceptedAt: z.string().nullable(),
    revokedAt: z.string().nullable(),
    abilities: z.object({ update: z.boolean(), revoke: z.boolean() }),
  })
  .meta({ id: 'FarmDealerLink' });
export type FarmDealerLink = z.infer<typeof farmDealerLinkSchema>;
export const farmDealerLinkResponseSchema = z.object({ data: farmDealerLinkSchema });
export type FarmDealerLinkResponse = z.infer<typeof farmDealerLinkResponseSchema>;
export const farmDealerLinksResponseSchema = z.object({
  data: z.array(farmDealerLinkSchema),
  abilities: z.object({ invite: z.boolean() }),
});
export type FarmDealerLinks = z.infer<typeof farmDealerLinksResponseSchema>;

/** A link as the dealer sees it: a customer (active) or a request waiting for the farm. */
export const customerSchema = z
  .object({
    id: z.string(),
    status: z.enum(DEALER_LINK_STATUSES),
    customer: orgRefSchema.nullable(),
    access: accessEnum.nullable(),
    /** the farm's clock, money and number rule, for the advisor's pages of its machines (active) */
    farmSettings: z
      .object({ timeZone: z.string(), currency: z.string(), units: z.enum(UNIT_SYSTEMS) })
      .nullable(),
    invitedEmail: z.string(),
    machineCount: z.number(),
    acceptedAt: z.string().nullable(),
    expiresAt: z.string().nullable(),
    createdAt: z.string(),
  })
  .meta({ id: 'DealerCustomer' });
export type Customer = z.infer<typeof customerSchema>;
export const customerResponseSchema = z.object({ data: customerSchema });
export type CustomerResponse = z.infer<typeof customerResponseSchema>;
export const customersResponseSchema = z.object({
  data: z.array(customerSchema),
  abilities: z.object({ invite: z.boolean() }),
});
export type Customers = z.infer<typeof customersResponseSchema>;

/** A dealer's request for access, for the farm manager who opened the e-mailed link. */
export const dealerInvitationOutSchema = z.object({
  dealer: orgRefSchema,
  invitedEmail: z.string(),
  message: z.string(),
  expiresAt: z.string().nullable(),
  farms: z.array(orgRefSchema.extend({ linked: z.boolean() })),
});
export type DealerInvitation = z.infer<typeof dealerInvitationOutSchema>;
export const dealerInvitationResponseSchema = z.object({ data: dealerInvitationOutSchema });

/** One due task of one customer's machine on the dealer's board. */
export const boardRowSchema = dueRowSchema
  .extend({
    customer: customerRefSchema,
    /** whole days since the last reading; null without readings */
    lastReadingAgeDays: z.number().nullable(),
  })
  .meta({ id: 'BoardRow' });
export type BoardRow = z.infer<typeof boardRowSchema>;

export const boardResponseSchema = z.object({
  data: z.array(boardRowSchema),
  meta: pageMetaSchema.extend({
    asOf: z.string(),
    counts: dueCountsSchema,
    customers: z.array(customerRefSchema),
  }),
});
export type Board = z.infer<typeof boardResponseSchema>;

export const partLineSchema = z.object({
  partNumber: z.string(),
  description: z.string(),
  quantity: z.number(),
  machines: z.number(),
  services: z.number(),
  firstNeededOn: z.string(),
});
/** A fluid summed in its stock unit (L / US gal, kg / lb), or apart in a unit not known. */
export const fluidLineSchema = z.object({
  kind: z.string(),
  unit: z.string(),
  volume: z.number(),
  /** false: a unit the converter does not know, summed only with itself */
  converted: z.boolean(),
  /** the units the services gave it in */
  summedFrom: z.array(z.string()),
  machines: z.number(),
  services: z.number(),
  firstNeededOn: z.string(),
});
/** A wear part to inspect — replaced when worn — on the machines named; never a quantity. */
export const wearLineSchema = z.object({
  partNumber: z.string(),
  description: z.string(),
  machines: z.array(z.object({ id: z.string(), fleetNumber: z.string(), name: z.string() })),
  services: z.number(),
  firstNeededOn: z.string(),
});
export type PartLine = z.infer<typeof partLineSchema>;
export type FluidLine = z.infer<typeof fluidLineSchema>;
export type WearLine = z.infer<typeof wearLineSchema>;

export const partsForecastSchema = z
  .object({
    asOf: z.string(),
    horizon: z.number(),
    /** the dealer's unit system, which picks the stock units (metric: L, kg; imperial: US gal, lb) */
    units: z.enum(UNIT_SYSTEMS),
    services: z.number(),
    undated: z.number(),
    customers: z.array(customerRefSchema),
    parts: z.array(partLineSchema),
    fluids: z.array(fluidLineSchema),
    wearParts: z.array(wearLineSchema),
    byCustomer: z.array(
      z.object({
        customer: orgRefSchema,
        parts: z.array(partLineSchema),
        fluids: z.array(fluidLineSchema),
        wearParts: z.array(wearLineSchema),
      }),
    ),
  })
  .meta({ id: 'PartsForecast' });
export type PartsForecast = z.infer<typeof partsForecastSchema>;
export const partsForecastResponseSchema = z.object({ data: partsForecastSchema });

export const reminderDraftSchema = z.object({
  customer: orgRefSchema,
  subject: z.string(),
  body: z.string(),
  recipients: z.array(z.object({ name: z.string() })),
});
export type ReminderDraft = z.infer<typeof reminderDraftSchema>;
export const reminderDraftResponseSchema = z.object({ data: reminderDraftSchema });
/** `duplicate`: the same requestId was sent before; nothing new was queued. */
export const reminderSentSchema = z.object({
  recipients: z.number(),
  queued: z.number(),
  duplicate: z.boolean(),
});
export type ReminderSent = z.infer<typeof reminderSentSchema>;
export const reminderSentResponseSchema = z.object({ data: reminderSentSchema });

export const bookingSchema = z
  .object({
    id: z.string(),
    status: z.enum(BOOKING_STATUSES),
    proposedFor: z.string(),
    note: z.string(),
    responseNote: z.string(),
    customer: orgRefSchema,
    dealer: orgRefSchema,
    proposedBy: personRefSchema.nullable(),
    decidedBy: personRefSchema.nullable(),
    decidedAt: z.string().nullable(),
    createdAt: z.string(),
    items: z.array(
      z.object({
        machine: z.object({ id: z.string(), fleetNumber: z.string(), name: z.string() }),
        tasks: z.array(z.object({ taskId: z.string(), name: z.string() })),
        serviceRecordId: z.string().nullable(),
        /**
         * the farm's open plans of this machine on the same date or covering one of these tasks,
         * while the proposal waits for the farm's answer (the dealer's view: always empty)
         */
        plannedVisits: z.array(plannedVisitSchema),
      }),
    ),
    abilities: z.object({ accept: z.boolean(), decline: z.boolean(), cancel: z.boolean() }),
  })
  .meta({ id: 'ServiceBooking' });
export type Booking = z.infer<typeof bookingSchema>;
export const bookingResponseSchema = z.object({ data: bookingSchema });
export type BookingResponse = z.infer<typeof bookingResponseSchema>;
export const bookingsResponseSchema = z.object({
  data: z.array(bookingSchema),
  abilities: z.object({ propose: z.boolean() }),
});
export type Bookings = z.infer<typeof bookingsResponseSchema>;

export const auditEventSchema = z
  .object({
    id: z.string(),
    action: z.string(),
    entityType: z.string(),
    entityId: z.string().nullable(),
    path: z.string().nullable(),
    actor: personRefSchema.nullable(),
    /** the dealer the actor acted for (null: the farm's own people) */
    dealer: orgRefSchema.nullable(),
    createdAt: z.string(),
  })
  .meta({ id: 'AuditEvent' });
export type AuditEvent = z.infer<typeof auditEventSchema>;

export const auditLogResponseSchema = z.object({
  data: z.array(auditEventSchema),
  meta: pageMetaSchema,
  dealers: z.array(orgRefSchema),
});
export type AuditLog = z.infer<typeof auditLogResponseSchema>;
