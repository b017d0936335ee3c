import { validate } from 'node-cron';
import { z } from 'zod';

/** Job schedules (node-cron syntax) from the environment, validated with a clear error at start. */
const cron = (name: string, fallback: string) =>
  z
    .string()
    .default(fallback)
    .refine((v) => validate(v), {
      error: `${name} must be a node-cron expression, e.g. "*/5 * * * *"`,
    });

export const JOB_NAMES = [
  'deliver-mail',
  'refresh-forecasts',
  'due-digest',
  'stale-meter-nudge',
  'overdue-escalation',
] as const;
export type JobName = (typeof JOB_NAMES)[number];

const JOBS_ERROR = `WORKER_JOBS is "all" or a comma-separated list of: ${JOB_NAMES.join(', ')}`;

export const jobScheduleSchema = z.object({
  // Which jobs this worker runs (the browser tests run only deliver-mail, so no digest arrives
  // in the middle of a test).
  WORKER_JOBS: z
    .string()
    .default('all')
    .transform((v) =>
      v.trim() === 'all' ? [...JOB_NAMES] : v.split(',').map((name) => name.trim()),
    )
    .refine((names) => names.length > 0 && names.every((n) => JOB_NAMES.includes(n as JobName)), {
      error: JOBS_ERROR,
    })
    .transform((names) => names as JobName[]),
  DELIVER_MAIL_CRON: cron('DELIVER_MAIL_CRON', '* * * * *'),
  REFRESH_FORECASTS_CRON: cron('REFRESH_FORECASTS_CRON', '15 * * * *'),
  // Hourly: each run sends to the farms whose local hour has reached their digest hour.
  DUE_DIGEST_CRON: cron('DUE_DIGEST_CRON', '5 * * * *'),
  STALE_NUDGE_CRON: cron('STALE_NUDGE_CRON', '35 * * * *'),
  OVERDUE_ESCALATION_CRON: cron('OVERDUE_ESCALATION_CRON', '25 * * * *'),
  STALE_NUDGE_DAYS: z.coerce
    .number({ error: 'STALE_NUDGE_DAYS must be a whole number of days, e.g. 14' })
    .int({ error: 'STALE_NUDGE_DAYS must be a whole number of days, e.g. 14' })
    .min(1, { error: 'STALE_NUDGE_DAYS must be at least 1' })
    .default(14),
});

export function loadJobSchedule(source: NodeJS.ProcessEnv = process.env) {
  const parsed = jobScheduleSchema.safeParse(source);
  if (!parsed.success) {
    throw new Error(
      `Invalid job schedule:\n${parsed.error.issues.map((i) => `  ${i.path.join('.')}: ${i.message}`).join('\n')}`,
    );
  }
  return parsed.data;
}
