import { z } from 'zod';
import { DUE_STATUSES, UNIT_SYSTEMS } from '../constants';
import { uuid } from './common';
import {
  customerRefSchema,
  fluidLineSchema,
  partLineSchema,
  wearLineSchema,
} from './dealer-responses';
import { orgRefSchema } from './refs';

// The shop's next weeks (issue 17, "What it tells people"): per week from this Monday, the
// services the stored forecast brings due, their labour and the parts they call for, beside what
// is already planned. The farm's shop asks for its own farm; a dealer's advisor for its customers.

export const OUTLOOK_WEEKS = { min: 1, max: 26, default: 16 } as const;

const weeks = z.coerce
  .number({ error: 'Weeks must be a number' })
  .int({ error: 'Weeks must be a whole number' })
  .min(OUTLOOK_WEEKS.min, { error: `Weeks must be ${OUTLOOK_WEEKS.min} to ${OUTLOOK_WEEKS.max}` })
  .max(OUTLOOK_WEEKS.max, { error: `Weeks must be ${OUTLOOK_WEEKS.min} to ${OUTLOOK_WEEKS.max}` })
  .default(OUTLOOK_WEEKS.default);

export const shopOutlookQuerySchema = z.object({ weeks });
export type ShopOutlookQuery = z.infer<typeof shopOutlookQuerySchema>;

/** The dealer's variant: every linked customer, or one of them. */
export const dealerOutlookQuerySchema = z.object({ weeks, customerId: uuid.optional() });
export type DealerOutlookQuery = z.infer<typeof dealerOutlookQuerySchema>;

const outlookMachine = z.object({ id: z.string(), fleetNumber: z.string(), name: z.string() });

/** One service the forecast brings due in the week (overdue ones in the first week). */
export const outlookServiceSchema = z.object({
  taskId: z.string(),
  taskName: z.string(),
  machine: outlookMachine,
  /** the farm, on the dealer's outlook; null on the farm's own */
  customer: orgRefSchema.nullable(),
  status: z.enum(DUE_STATUSES),
  /** the date it falls due (ISO, the farm's local date); overdue ones may be before the week */
  dueOn: z.string().nullable(),
  /** the task's labour estimate (hours); null when the schedule gives none */
  labourHours: z.number().nullable(),
  /** the open plan that already covers it (any date), or null */
  plannedOn: z.string().nullable(),
});
export type OutlookService = z.infer<typeof outlookServiceSchema>;

/**
 * A planned visit (an open plan, accepted bookings included) dated in the week; or, in `proposed`,
 * one machine of a booking the farm has not decided yet (its id is the booking's).
 */
export const outlookPlanSchema = z.object({
  id: z.string(),
  plannedFor: z.string(),
  machine: outlookMachine,
  customer: orgRefSchema.nullable(),
  tasks: z.number(),
  /** the sum of its tasks' labour estimates (hours), tasks without one left out */
  labourHours: z.number(),
  /** its tasks without a labour estimate */
  labourUnknown: z.number(),
});
export type OutlookPlan = z.infer<typeof outlookPlanSchema>;

export const outlookWeekSchema = z.object({
  /** ISO 8601 week, e.g. 2026-W49 */
  isoWeek: z.string(),
  /** Monday and Sunday of the week (ISO dates) */
  start: z.string(),
  end: z.string(),
  services: z.array(outlookServiceSchema),
  /** the services' labour estimates summed (hours) */
  labourHours: z.number(),
  /** services without a labour estimate, not in labourHours */
  labourUnknown: z.number(),
  /** labour of the services no open plan covers yet (hours) */
  unplannedLabourHours: z.number(),
  parts: z.array(partLineSchema),
  fluids: z.array(fluidLineSchema),
  wearParts: z.array(wearLineSchema),
  planned: z.array(outlookPlanSchema),
  plannedLabourHours: z.number(),
  plannedLabourUnknown: z.number(),
  /** a dealer's bookings proposed for the week and not yet decided by the farm: one per machine */
  proposed: z.array(outlookPlanSchema),
  proposedLabourHours: z.number(),
});
export type OutlookWeek = z.infer<typeof outlookWeekSchema>;

export const shopOutlookSchema = z
  .object({
    asOf: z.string(),
    start: z.string(),
    end: z.string(),
    /** the unit system that picks the fluids' stock units */
    units: z.enum(UNIT_SYSTEMS),
    /** services that cannot be dated (no forecast, history unknown): in no week */
    undated: z.number(),
    weeks: z.array(outlookWeekSchema),
  })
  .meta({ id: 'ShopOutlook' });
export type ShopOutlook = z.infer<typeof shopOutlookSchema>;
export const shopOutlookResponseSchema = z.object({ data: shopOutlookSchema });

export const dealerOutlookSchema = shopOutlookSchema
  .extend({ customers: z.array(customerRefSchema) })
  .meta({ id: 'DealerOutlook' });
export type DealerOutlook = z.infer<typeof dealerOutlookSchema>;
export const dealerOutlookResponseSchema = z.object({ data: dealerOutlookSchema });
