import { z } from 'zod';
import { DUE_STATUSES, METER_KINDS } from '../constants';
import { SEASON_ANCHORS } from '../domain/season-dates';
import { lastReadingSchema, usageSchema } from './machines';
import { machineRefSchema } from './refs';

// The responses of due points and the due list. Their queries (dueQuerySchema…) live with the
// readings, which they are computed from.

/** A task's due point as shared/domain computes it (meter units, ISO local dates). */
export const duePointSchema = z
  .object({
    status: z.enum(DUE_STATUSES),
    /** which limit falls first: meter, calendar, or null when neither can be dated */
    governs: z.enum(['meter', 'calendar']).nullable(),
    dueMeter: z.number().nullable(),
    dueDate: z.string().nullable(),
    /** projected date the meter reaches dueMeter (point, earliest, latest); null when no forecast */
    projectedDate: z.string().nullable(),
    projectedLow: z.string().nullable(),
    projectedHigh: z.string().nullable(),
    /** the date the task falls due: the earlier of dueDate and projectedDate */
    effectiveDate: z.string().nullable(),
    remainingMeter: z.number().nullable(),
    remainingDays: z.number().nullable(),
    /**
     * 'recorded' when last done is known, 'first_service' for the break-in point, 'counted' from a
     * start someone set in place of an unknown history, 'unknown' while that history is
     * unanswered, 'assumed' otherwise
     */
    basis: z.enum(['recorded', 'first_service', 'assumed', 'counted', 'unknown']),
    /**
     * when the projected range crosses an idle spell of the machine's season: the two outcomes
     * (late this season, early next; ISO dates) and the likelier one
     */
    outcomes: z
      .object({
        thisSeason: z.object({ from: z.string(), to: z.string() }),
        nextSeason: z.object({ from: z.string(), to: z.string() }),
        likelier: z.enum(['this_season', 'next_season']),
      })
      .optional(),
    /**
     * when the task falls due inside a busy season that has not started yet: the last day before
     * it (ISO) and how much of the interval doing it then gives up (meter units)
     */
    beforePeak: z.object({ doBy: z.string(), earlyBy: z.number() }).optional(),
    /**
     * season services only: the season start ('before_start') or end ('after_end') the due date
     * follows, offsetDays before or after it; seasonDate null when the machine has no season months
     */
    season: z
      .object({
        anchor: z.enum(SEASON_ANCHORS),
        offsetDays: z.number(),
        seasonDate: z.string().nullable(),
      })
      .optional(),
  })
  .meta({ id: 'DuePoint' });

/** One task of one machine on the due list; reused by every response that carries due rows. */
export const dueRowSchema = z
  .object({
    taskId: z.string(),
    taskName: z.string(),
    hazards: z.array(z.string()),
    labourHours: z.number().nullable(),
    /** the machine; its meterUnit is the unit of the task's meter */
    machine: machineRefSchema,
    /** the meter the task counts on (a combine's separator hours, say), named where not primary */
    meter: z.object({
      id: z.string(),
      kind: z.enum(METER_KINDS),
      label: z.string(),
      isPrimary: z.boolean(),
    }),
    due: duePointSchema,
    /** last reading: value on the meter fitted now, and on the lifetime scale */
    lastReading: lastReadingSchema.nullable(),
    /** the due value as the meter fitted now shows it (differs after a meter replacement) */
    dueOnMeter: z.number().nullable(),
    usage: usageSchema.pick({ method: true, rate: true, low: true, high: true }).nullable(),
  })
  .meta({ id: 'DueRow' });
export type DueRow = z.infer<typeof dueRowSchema>;

export const dueCountsSchema = z.object({
  overdue: z.number(),
  due_soon: z.number(),
  history_unknown: z.number(),
  ok: z.number(),
  no_forecast: z.number(),
});
export type DueCounts = z.infer<typeof dueCountsSchema>;

/**
 * A machine whose meter is stale: the use that may have gone unrecorded at its current pace
 * matters (shared/domain/staleness.ts), or it has never been read in season.
 */
export const staleMeterSchema = z.object({
  machine: machineRefSchema.pick({ id: true, fleetNumber: true, name: true }),
  lastReadingAt: z.string().nullable(),
  daysSince: z.number().nullable(),
  /** use that may have gone unrecorded since the last reading at the current pace; null unread */
  unrecorded: z.number().nullable(),
  /** the meter's unit */
  unit: z.string(),
});
export type StaleMeter = z.infer<typeof staleMeterSchema>;

/** GET due (the farm) and GET a machine's due: rows, counts by status and stale meters. */
export const dueListResponseSchema = z.object({
  data: z.array(dueRowSchema),
  meta: z.object({
    /** the farm's today (ISO local date) the figures are computed for */
    asOf: z.string(),
    total: z.number(),
    page: z.number(),
    pageSize: z.number(),
    /** tasks per status across the whole fleet (category and machine filters only, any horizon) */
    counts: dueCountsSchema,
    /** machines in the fleet (not sold) the caller sees: 0 on a farm that has none yet */
    machines: z.number(),
    stale: z.array(staleMeterSchema),
  }),
});
export type DueList = z.infer<typeof dueListResponseSchema>;
