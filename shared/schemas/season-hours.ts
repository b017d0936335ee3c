import { z } from 'zod';
import { boundedNumber } from './common';
import { machineRefSchema } from './refs';

// Season hours (issue 17): each machine's use in its season this year against last year's, and
// the manager's plan for a season (shared/domain/season-use.ts), which the forecast then uses.

/** A plan as entered: a meter value, or an area with the rate it is worked at; both → 422. */
export const seasonPlanInputSchema = z
  .object({
    value: boundedNumber('Planned use', { min: 0, max: 1_000_000 }).optional(),
    area: boundedNumber('Planned area', { min: 0, max: 1_000_000, exclusiveMin: true }).optional(),
    areaUnit: z.enum(['ha', 'ac'], { error: 'Area unit must be ha or ac' }).optional(),
    areaPerHour: boundedNumber('Work rate', { min: 0, max: 1000, exclusiveMin: true }).optional(),
  })
  .strict()
  .superRefine((plan, ctx) => {
    const byArea = plan.area !== undefined || plan.areaPerHour !== undefined || plan.areaUnit;
    if (plan.value !== undefined && byArea) {
      ctx.addIssue({
        code: 'custom',
        path: ['value'],
        message: 'Give planned use or an area with its work rate, not both',
      });
      return;
    }
    if (plan.value === undefined && !byArea)
      ctx.addIssue({ code: 'custom', path: ['value'], message: 'Enter planned use or an area' });
    if (byArea)
      for (const key of ['area', 'areaUnit', 'areaPerHour'] as const)
        if (plan[key] === undefined)
          ctx.addIssue({
            code: 'custom',
            path: [key],
            message: 'An area plan needs the area, its unit and the work rate (area per hour)',
          });
  });
export type SeasonPlanInput = z.infer<typeof seasonPlanInputSchema>;

export const seasonPlanSchema = z.object({
  year: z.number(),
  value: z.number().nullable(),
  area: z.number().nullable(),
  areaUnit: z.enum(['ha', 'ac']).nullable(),
  areaPerHour: z.number().nullable(),
  /** the season's planned use in the meter's units (an area plan worked out), null if not sayable */
  plannedUse: z.number().nullable(),
  unit: z.string(),
});
export type SeasonPlanJson = z.infer<typeof seasonPlanSchema>;

/** PUT …/season-plans/:year answers the plan as stored. */
export const seasonPlanResponseSchema = z.object({ data: seasonPlanSchema });
export type SeasonPlanResponse = z.infer<typeof seasonPlanResponseSchema>;

export const seasonHoursRowSchema = z.object({
  machine: machineRefSchema.pick({ id: true, fleetNumber: true, name: true }),
  unit: z.string(),
  seasonMonths: z.array(z.number()),
  /** use in this year's season up to today, meter units */
  thisSeason: z.number(),
  /** use in last year's season up to the same date */
  lastSeasonToDate: z.number(),
  /** last year's whole season */
  lastSeason: z.number(),
  plan: seasonPlanSchema.nullable(),
});

export const seasonHoursResponseSchema = z.object({
  data: z.array(seasonHoursRowSchema),
  meta: z.object({ year: z.number(), asOf: z.string() }),
});
export type SeasonHoursRow = z.infer<typeof seasonHoursRowSchema>;
