import { z } from 'zod';

// The first-run checklist of a new farm's dashboard: each step is ticked from the farm's own
// data, so it is done when the work is, wherever it was done.

export const FIRST_RUN_STEPS = [
  'machines',
  'schedules',
  'lastDone',
  'team',
  'dealer',
  'digestHour',
] as const;
export type FirstRunStep = (typeof FIRST_RUN_STEPS)[number];

export const firstRunChecklistSchema = z.object({
  steps: z.array(
    z.object({
      key: z.enum(FIRST_RUN_STEPS),
      done: z.boolean(),
      /** how many are left (machines without a schedule, tasks without a last service), if counted */
      remaining: z.number().nullable(),
      /** the machine to open for this step (the first one still waiting), if any */
      machineId: z.string().nullable(),
    }),
  ),
  /** every step is done */
  complete: z.boolean(),
  /** this person put the checklist away */
  dismissed: z.boolean(),
  /** shown on the dashboard: a farm in its first run (no service recorded yet), not all done, not put away */
  offered: z.boolean(),
});
export type FirstRunChecklist = z.infer<typeof firstRunChecklistSchema>;

export const firstRunDismissalSchema = z.object({
  dismissed: z.boolean({ error: 'dismissed must be true or false' }),
});
