import { z } from 'zod';
import { CARE_STATES } from '../domain/daily-care';
import { uuid } from './common';
import { machineRefSchema } from './refs';
import { HAZARDS } from './schedule';

// Daily care (issue 11): grease rounds and daily items the operator signs off inside the
// walkaround. The walkaround's request and response carry these; the dashboard's board lists them.

/** What a walkaround signs off: ids of the machine's daily-care tasks, each once. */
export const careDoneSchema = z
  .array(uuid, { error: 'Daily care done must be a list of task ids' })
  .max(40, { error: 'At most 40 daily-care tasks' })
  .default([]);

/** One daily-care task of a machine, as the walkaround and the dashboard show it. */
export const dailyCareItemSchema = z
  .object({
    taskId: z.string(),
    name: z.string(),
    intervalMeter: z.number().nullable(),
    intervalDays: z.number().nullable(),
    instructions: z.string(),
    hazards: z.array(z.enum(HAZARDS)),
    /** lifetime meter value and ISO local date it was last done (null: never signed off) */
    lastDoneMeter: z.number().nullable(),
    lastDoneOn: z.string().nullable(),
    /** meter run since it was last done (the latest reading minus last done); null when unknown */
    sinceMeter: z.number().nullable(),
    state: z.enum(CARE_STATES),
  })
  .meta({ id: 'DailyCareItem' });
export type DailyCareItem = z.infer<typeof dailyCareItemSchema>;

/** A daily-care task a walkaround signed off; `reset: false` when it had been done since. */
export const careSignedOffSchema = z
  .object({ taskId: z.string(), name: z.string(), reset: z.boolean() })
  .meta({ id: 'CareSignedOff' });
export type CareSignedOff = z.infer<typeof careSignedOffSchema>;

/** GET daily-care: each machine the caller sees that has daily care, most pressing first. */
export const dailyCareBoardResponseSchema = z.object({
  data: z.array(
    z.object({
      machine: machineRefSchema,
      tasks: z.array(dailyCareItemSchema),
      counts: z.object({ overdue: z.number(), not_today: z.number(), done_today: z.number() }),
    }),
  ),
  meta: z.object({
    /** the farm's today (ISO local date) */
    asOf: z.string(),
  }),
});
export type DailyCareBoard = z.infer<typeof dailyCareBoardResponseSchema>;
