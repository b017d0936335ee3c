// The cron worker: runs beside the API as its own process (npm start starts it).
import cron from 'node-cron';
import { logger } from '../server/logger';
import { sequelize } from '../server/db';
import '../server/models';
import { loadJobSchedule, type JobName } from './schedule';
import { coalesced, listenForOutbox, type OutboxListener } from './outbox-wakeup';
import * as deliverMail from './deliver-mail';
import * as refreshForecasts from './refresh-forecasts';
import * as dueDigest from './due-digest';
import * as staleMeterNudge from './stale-meter-nudge';
import * as overdueEscalation from './overdue-escalation';

const schedule = loadJobSchedule();
const stopping = new AbortController();

async function logged(name: string, perform: () => Promise<unknown>) {
  try {
    const result = await perform();
    logger.info({ job: name, result }, 'job done');
  } catch (err) {
    logger.error({ job: name, err }, 'job failed');
  }
}

// One delivery run at a time in this process, whether the clock or a new message asked for it.
const deliverNow = coalesced(() =>
  logged('deliver-mail', () => deliverMail.perform(undefined, { signal: stopping.signal })),
);

const jobs: { name: JobName; expression: string; perform: () => Promise<unknown> }[] = [
  { name: 'deliver-mail', expression: schedule.DELIVER_MAIL_CRON, perform: deliverNow },
  {
    name: 'refresh-forecasts',
    expression: schedule.REFRESH_FORECASTS_CRON,
    perform: () => logged('refresh-forecasts', () => refreshForecasts.perform()),
  },
  {
    name: 'due-digest',
    expression: schedule.DUE_DIGEST_CRON,
    perform: () => logged('due-digest', () => dueDigest.perform()),
  },
  {
    name: 'stale-meter-nudge',
    expression: schedule.STALE_NUDGE_CRON,
    perform: () =>
      logged('stale-meter-nudge', () =>
        staleMeterNudge.perform(new Date(), schedule.STALE_NUDGE_DAYS),
      ),
  },
  {
    name: 'overdue-escalation',
    expression: schedule.OVERDUE_ESCALATION_CRON,
    perform: () => logged('overdue-escalation', () => overdueEscalation.perform()),
  },
];
const running = jobs.filter((job) => schedule.WORKER_JOBS.includes(job.name));

const tasks = running.map((job) =>
  cron.schedule(job.expression, () => job.perform(), { name: job.name, noOverlap: true }),
);

// New messages are sent as soon as their transaction commits (NOTIFY); the schedule above
// still runs retries, expired claims and anything sent while the listener was reconnecting.
let listener: OutboxListener | null = null;
if (schedule.WORKER_JOBS.includes('deliver-mail')) {
  listener = listenForOutbox(() => void deliverNow());
}
logger.info(
  `worker: ${running.map((j) => `${j.name} (${j.expression})`).join(', ')}${listener ? '; mail also on NOTIFY' : ''}`,
);

async function shutdown() {
  stopping.abort();
  for (const t of tasks) await t.stop();
  await listener?.stop();
  // Let a delivery in flight record its result (bounded by the SMTP timeouts).
  await deliverNow();
  await sequelize.close();
  process.exit(0);
}
process.on('SIGTERM', () => void shutdown());
process.on('SIGINT', () => void shutdown());
