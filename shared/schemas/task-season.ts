import { z } from 'zod';
import { MAX_SEASON_OFFSET_DAYS, SEASON_ANCHORS, type SeasonAnchor } from '../domain/season-dates';
import { boundedNumber } from './common';

// A task's season service fields (issue 11) and the rules that tie a task's timing together:
// a season service takes its date from the machine's season months in place of a day interval,
// and may keep a meter interval (whichever comes first). The rules are checked on the whole task
// by the create schema (a new task, a template's tasks) and, by the PATCH service, on the task as
// it would stand once the fields sent are merged into the stored ones.

/** Days before the start or after the end: whole days, 0 to about four months (the column's check). */
export const SEASON_OFFSET_BOUNDS = { min: 0, max: MAX_SEASON_OFFSET_DAYS, int: true } as const;

/** The two fields, without defaults (an update changes only the fields it names). */
export const seasonTaskFields = {
  seasonAnchor: z
    .enum(SEASON_ANCHORS, {
      error: `Season service must be one of: ${SEASON_ANCHORS.join(', ')} (or null for none)`,
    })
    .nullable(),
  seasonOffsetDays: boundedNumber('Season days', SEASON_OFFSET_BOUNDS).nullable(),
};

/** The same fields as a new task takes them: no season service unless given. */
export const seasonTaskDefaults = {
  seasonAnchor: seasonTaskFields.seasonAnchor.default(null),
  seasonOffsetDays: seasonTaskFields.seasonOffsetDays.default(null),
};

/** As stored and sent. */
export const storedSeasonFields = {
  /** season service: due seasonOffsetDays before the season starts or after it ends; or null */
  seasonAnchor: z.enum(SEASON_ANCHORS).nullable(),
  seasonOffsetDays: z.number().nullable(),
};

/** What the timing rules look at. */
export interface TaskTiming {
  intervalMeter: number | null;
  intervalDays: number | null;
  seasonAnchor: SeasonAnchor | null;
  seasonOffsetDays: number | null;
}

export const TIMING_RULES = {
  noInterval: 'Give a meter interval, a day interval, or both — or make it a season service',
  anchorWithoutDays: 'Give the days before the season starts or after it ends (0–120)',
  daysWithoutAnchor: 'Choose before the season starts or after it ends, or clear the season days',
  seasonAndDays:
    "A season service takes its date from the machine's season months: clear the day interval (a meter interval may stay, whichever comes first)",
} as const;

/** Each broken timing rule, by the field to correct; {} when the task's timing holds together. */
export function taskTimingProblems(t: TaskTiming): Partial<Record<keyof TaskTiming, string>> {
  const problems: Partial<Record<keyof TaskTiming, string>> = {};
  if (t.seasonAnchor !== null && t.seasonOffsetDays === null)
    problems.seasonOffsetDays = TIMING_RULES.anchorWithoutDays;
  if (t.seasonAnchor === null && t.seasonOffsetDays !== null)
    problems.seasonAnchor = TIMING_RULES.daysWithoutAnchor;
  if (t.seasonAnchor !== null && t.intervalDays !== null)
    problems.intervalDays = TIMING_RULES.seasonAndDays;
  if (t.intervalMeter === null && t.intervalDays === null && t.seasonAnchor === null)
    problems.intervalMeter = TIMING_RULES.noInterval;
  return problems;
}

/** The timing rules as a zod check on a whole task (one issue per field to correct). */
export function checkTaskTiming(t: TaskTiming, ctx: z.RefinementCtx): void {
  for (const [field, message] of Object.entries(taskTimingProblems(t)))
    ctx.addIssue({ code: 'custom', message, path: [field] });
}
