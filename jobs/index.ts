// The cron worker: runs beside the API as its own process (npm start starts it).
import cron from 'node-cron';
import { logger } from '../server/logger';
import { sequelize } from '../server/db';
import '../server/models';
import { loadJobSchedule } from './schedule';
import * as deliverMail from './deliver-mail';
import * as refreshForecasts from './refresh-forecasts';
import * as dueDigest from './due-digest';
import * as staleMeterNudge from './stale-meter-nudge';
import * as overdueEscalation from './overdue-escalation';

const schedule = loadJobSchedule();

const jobs = [
  {
    name: 'deliver-mail',
    expression: schedule.DELIVER_MAIL_CRON,
    perform: () => deliverMail.perform(),
  },
  {
    name: 'refresh-forecasts',
    expression: schedule.REFRESH_FORECASTS_CRON,
    perform: () => refreshForecasts.perform(),
  },
  {
    name: 'due-digest',
    expression: schedule.DUE_DIGEST_CRON,
    perform: () => dueDigest.perform(),
  },
  {
    name: 'stale-meter-nudge',
    expression: schedule.STALE_NUDGE_CRON,
    perform: () => staleMeterNudge.perform(new Date(), schedule.STALE_NUDGE_DAYS),
  },
  {
    name: 'overdue-escalation',
    expression: schedule.OVERDUE_ESCALATION_CRON,
    perform: () => overdueEscalation.perform(),
  },
];

const tasks = jobs.map((job) =>
  cron.schedule(
    job.expression,
    async () => {
      try {
        const result = await job.perform();
        logger.info({ job: job.name, result }, 'job done');
      } catch (err) {
        logger.error({ job: job.name, err }, 'job failed');
      }
    },
    { name: job.name, noOverlap: true },
  ),
);
logger.info(`worker: ${jobs.map((j) => `${j.name} (${j.expression})`).join(', ')}`);

async function shutdown() {
  for (const t of tasks) await t.stop();
  await sequelize.close();
  process.exit(0);
}
process.on('SIGTERM', () => void shutdown());
process.on('SIGINT', () => void shutdown());
