import { z } from 'zod';
import { DUE_STATUSES, MACHINE_CATEGORIES } from '../constants';
import { email, isoDate, pagingFields, PLAN_DATES, plainText, uuid } from './common';

// Dealer links, the dealer's board and parts forecast, reminders and bookings. The client's forms
// use these schemas with react-hook-form; the server validates with the same ones.

export const DEALER_ACCESS = ['view', 'service'] as const;
export type DealerAccess = (typeof DEALER_ACCESS)[number];
export const DEALER_ACCESS_LABELS: Record<DealerAccess, string> = {
  view: 'View',
  service: 'Service',
};
/** What each access allows, in the words the farm manager reads before choosing. */
export const DEALER_ACCESS_DESCRIPTIONS: Record<DealerAccess, string> = {
  view: 'Sees machines, hour-meter readings and what is coming due. No service history, no changes.',
  service:
    'Also sees service history and may plan and record services on your machines (a recorded service resets its tasks).',
};

export const DEALER_LINK_STATUSES = ['pending', 'active', 'revoked'] as const;
export type DealerLinkStatus = (typeof DEALER_LINK_STATUSES)[number];

export const BOOKING_STATUSES = ['proposed', 'accepted', 'declined', 'cancelled'] as const;
export type BookingStatus = (typeof BOOKING_STATUSES)[number];
export const BOOKING_STATUS_LABELS: Record<BookingStatus, string> = {
  proposed: 'Awaiting the farm',
  accepted: 'Accepted',
  declined: 'Declined',
  cancelled: 'Withdrawn',
};

const accessSchema = z.enum(DEALER_ACCESS, { error: 'Access must be view or service' });
const note = plainText(1000, { multiline: true }).default('');

/** A dealer asks a farm for access: the farm manager's e-mail gets a single-use link. */
export const customerInvitationSchema = z.object({ email, message: note });
export type CustomerInvitationInput = z.infer<typeof customerInvitationSchema>;

/** A farm manager grants a dealer access, naming one of the dealer's service advisors. */
export const dealerInvitationSchema = z.object({ email, access: accessSchema });
export type DealerInvitationInput = z.infer<typeof dealerInvitationSchema>;

/** Only the access; an unknown field is refused by name. */
export const dealerLinkUpdateSchema = z.object({ access: accessSchema }).strict();
export type DealerLinkUpdateInput = z.infer<typeof dealerLinkUpdateSchema>;

/** The farm manager accepts a dealer's request for one of the farms they manage. */
export const dealerInvitationAcceptSchema = z.object({
  organizationId: uuid,
  access: accessSchema,
});
export type DealerInvitationAcceptInput = z.infer<typeof dealerInvitationAcceptSchema>;

const horizon = z.coerce
  .number()
  .int()
  .refine((n) => [7, 30, 90].includes(n), { error: 'Horizon must be 7, 30 or 90 days' })
  .default(30);

/** Filters of the dealer's board (and of its CSV export). */
export const boardQuerySchema = z.object({
  horizon,
  customerId: uuid.optional(),
  category: z
    .enum(MACHINE_CATEGORIES, {
      error: `Category must be one of: ${MACHINE_CATEGORIES.join(', ')}`,
    })
    .optional(),
  task: plainText(100).optional(),
  status: z
    .enum(DUE_STATUSES, { error: `Status must be one of: ${DUE_STATUSES.join(', ')}` })
    .optional(),
  ...pagingFields(25, 200),
});
export type BoardQuery = z.infer<typeof boardQuerySchema>;

export const partsForecastQuerySchema = z.object({ horizon, customerId: uuid.optional() });
export type PartsForecastQuery = z.infer<typeof partsForecastQuerySchema>;

const taskIds = z
  .array(uuid, { error: 'Choose at least one service' })
  .min(1, { error: 'Choose at least one service' })
  .max(50, { error: 'At most 50 services at once' });

/** A reminder e-mail to a customer's managers about due services; the advisor edits the text. */
export const reminderSchema = z.object({
  taskIds,
  subject: plainText(200, { required: 'Enter a subject' }),
  body: plainText(5000, { required: 'Enter the message', multiline: true }),
  /** made when the dialog opens: a second click of the same dialog sends nothing more */
  requestId: uuid,
});
export type ReminderInput = z.infer<typeof reminderSchema>;

export const bookingItemSchema = z.object({
  machineId: uuid,
  taskIds: z
    .array(uuid, { error: 'Tasks must be a list of ids' })
    .max(50, { error: 'At most 50 tasks per machine' })
    .default([]),
});

export const bookingCreateSchema = z.object({
  customerId: uuid,
  proposedFor: isoDate('Proposed date', PLAN_DATES),
  items: z
    .array(bookingItemSchema, { error: 'Choose at least one machine' })
    .min(1, { error: 'Choose at least one machine' })
    .max(20, { error: 'At most 20 machines in one booking' }),
  note,
});
export type BookingCreateInput = z.infer<typeof bookingCreateSchema>;

export const bookingDecisionSchema = z.object({ note });
export type BookingDecisionInput = z.infer<typeof bookingDecisionSchema>;

export const bookingListQuerySchema = z.object({
  status: z.enum(BOOKING_STATUSES).optional(),
  customerId: uuid.optional(),
});

export const auditQuerySchema = z.object({
  /** only what this dealer's people did */
  dealerOrganizationId: uuid.optional(),
  /** 'dealer': everything done through a dealer link */
  via: z.enum(['dealer']).optional(),
  ...pagingFields(50, 200),
});
export type AuditQuery = z.infer<typeof auditQuerySchema>;
