import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { resetDatabase } from '../support/db';
import { clearMail, caughtMail, setMailAccepting } from '../support/mail';
import { loadJobSchedule } from '../../jobs/schedule';
import * as deliverMail from '../../jobs/deliver-mail';
import * as refreshForecasts from '../../jobs/refresh-forecasts';
import { Notification } from '../../server/models';
import { queueMessage } from '../../server/infra/mailer';
import { withJobLock } from '../../jobs/lock';

describe('worker — schedules', () => {
  it('schedule — an invalid cron expression is refused naming the variable', () => {
    expect(() => loadJobSchedule({ DELIVER_MAIL_CRON: 'every minute' })).toThrow(
      /DELIVER_MAIL_CRON must be a node-cron expression/,
    );
    expect(loadJobSchedule({}).DELIVER_MAIL_CRON).toBe('* * * * *');
  });

  it('schedule — WORKER_JOBS picks the jobs a worker runs (all by default); an unknown name is refused listing the names', () => {
    expect(loadJobSchedule({}).WORKER_JOBS).toEqual([
      'deliver-mail',
      'refresh-forecasts',
      'due-digest',
      'stale-meter-nudge',
      'overdue-escalation',
    ]);
    expect(loadJobSchedule({ WORKER_JOBS: ' deliver-mail ' }).WORKER_JOBS).toEqual([
      'deliver-mail',
    ]);
    expect(() => loadJobSchedule({ WORKER_JOBS: 'deliver-mail,send-faxes' })).toThrow(
      /WORKER_JOBS is "all" or a comma-separated list of: deliver-mail, refresh-forecasts/,
    );
  });
});

describe('worker — mail delivery through the outbox', () => {
  beforeEach(async () => {
    await resetDatabase();
    await clearMail();
    await setMailAccepting(true);
  });
  afterEach(() => setMailAccepting(true));

  it('outbox — the same identity is queued once; a second run sends nothing more', async () => {
    const msg = {
      organizationId: null,
      recipient: 'a@test.example',
      kind: 'test',
      periodKey: '2026-12-01',
      subject: 'Hi',
      text: 'Hello',
    };
    expect(await queueMessage(msg)).not.toBeNull();
    expect(await queueMessage(msg)).toBeNull();
    expect((await deliverMail.perform()).sent).toBe(1);
    expect((await deliverMail.perform()).sent).toBe(0);
    expect((await caughtMail()).filter((m) => m.subject === 'Hi')).toHaveLength(1);
  });

  it('outbox — SMTP down: the message stays queued with its error; back up: sent once, nothing lost or doubled', async () => {
    await queueMessage({
      organizationId: null,
      recipient: 'b@test.example',
      kind: 'test',
      periodKey: 'p',
      subject: 'Queued',
      text: 'x',
    });
    await setMailAccepting(false);
    const down = await deliverMail.perform();
    expect(down).toEqual({ sent: 0, failed: 0, retrying: 1 });
    const row = (await Notification.findOne())!;
    expect(row.status).toBe('queued');
    expect(row.attempts).toBe(1);
    expect(row.lastError).toBeTruthy();
    await setMailAccepting(true);
    // the backoff (2 minutes, see mail-delivery.test.ts) has passed; +1 ms: PostgreSQL keeps µs
    const afterBackoff = new Date(row.nextAttemptAt.getTime() + 1);
    expect((await deliverMail.perform(afterBackoff)).sent).toBe(1);
    expect((await deliverMail.perform(afterBackoff)).sent).toBe(0);
    expect((await caughtMail()).filter((m) => m.subject === 'Queued')).toHaveLength(1);
    expect((await Notification.findOne())!.status).toBe('sent');
  });
});

describe('worker — locks', () => {
  beforeEach(resetDatabase);

  it('advisory lock — two workers at once: one runs the job, the other skips', async () => {
    let release!: () => void;
    let locked!: () => void;
    const held = new Promise<void>((r) => (release = r));
    const holding = new Promise<void>((r) => (locked = r));
    const first = withJobLock('test-job', async () => {
      locked();
      await held;
      return 'first';
    });
    await holding; // the first worker is inside the lock (no guess at how long that takes)
    const second = await withJobLock('test-job', async () => 'second');
    release();
    expect(await first).toBe('first');
    expect(second).toBeNull();
  });

  it('refresh-forecasts — runs over every farm', async () => {
    const { createOrganization } = await import('../support/factories');
    await createOrganization();
    await createOrganization({ kind: 'dealer' });
    expect(await refreshForecasts.perform()).toEqual({ organizations: 1 });
  });
});
