import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { QueryTypes } from 'sequelize';
import { resetDatabase } from '../support/db';
import { caughtMail, clearMail, setMailAccepting } from '../support/mail';
import { startHangingSmtp } from '../support/hanging-smtp';
import * as deliverMail from '../../jobs/deliver-mail';
import { Notification } from '../../server/models';
import { sequelize } from '../../server/db';
import { env } from '../../server/env';
import {
  backoffMinutes,
  claimNextMessage,
  createMailTransport,
  queueMessage,
  transmit,
} from '../../server/infra/mailer';

// The delivery policy, pinned here rather than imported: 6 attempts in all, waiting 2, 4, 8, 16
// and 32 minutes after the 1st to 5th failures (2^n minutes, capped at 60).
const ATTEMPTS = 6;
const WAITS_MINUTES = [2, 4, 8, 16, 32];
const LEASE_MS = env.MAIL_CLAIM_LEASE_SECONDS * 1000;
const APP_HOST = new URL(process.env.APP_URL ?? 'http://127.0.0.1:4310').hostname;
const at = (date: Date, ms: number) => new Date(date.getTime() + ms);

async function queue(subject: string, periodKey = subject) {
  const row = await queueMessage({
    organizationId: null,
    recipient: 'someone@test.example',
    kind: 'test',
    periodKey,
    subject,
    text: 'Hello',
  });
  // the queue's clock is PostgreSQL's (microseconds): the first run at or after it
  return { row: row!, due: at(row!.nextAttemptAt, 1) };
}

const withSubject = async (subject: string) =>
  (await caughtMail()).filter((m) => m.subject === subject);

describe('mail delivery — attempts and backoff', () => {
  beforeEach(async () => {
    await resetDatabase();
    await clearMail();
    await setMailAccepting(true);
  });
  afterEach(() => setMailAccepting(true));

  it('backoff — 2, 4, 8, 16, 32 minutes after the 1st to 5th failure, capped at 60 beyond', () => {
    expect([1, 2, 3, 4, 5, 6, 7].map(backoffMinutes)).toEqual([2, 4, 8, 16, 32, 60, 60]);
  });

  it('SMTP down — each attempt waits its backoff (nothing sooner); the 6th failure marks it failed; no 7th', async () => {
    const { row, due } = await queue('Doomed');
    await setMailAccepting(false);
    let now = due;
    for (let attempt = 1; attempt <= ATTEMPTS; attempt++) {
      const result = await deliverMail.perform(now);
      await row.reload();
      expect(row.attempts).toBe(attempt);
      expect(row.lastError).toMatch(/421|not available/i);
      if (attempt === ATTEMPTS) {
        expect(result).toEqual({ sent: 0, failed: 1, retrying: 0 });
        expect(row.status).toBe('failed');
        break;
      }
      expect(result).toEqual({ sent: 0, failed: 0, retrying: 1 });
      expect(row.status).toBe('queued');
      const next = at(now, WAITS_MINUTES[attempt - 1] * 60_000);
      expect(row.nextAttemptAt).toEqual(next);
      // a millisecond early: not yet
      expect(await deliverMail.perform(at(next, -1))).toEqual({ sent: 0, failed: 0, retrying: 0 });
      now = next;
    }
    await setMailAccepting(true);
    expect((await deliverMail.perform(at(now, 86_400_000))).sent).toBe(0);
    expect((await row.reload()).attempts).toBe(ATTEMPTS);
    expect(await withSubject('Doomed')).toHaveLength(0);
  });

  it('SMTP down — the run stops after the failed connection: the other messages keep their attempts for the next run', async () => {
    const first = await queue('First');
    const others = [await queue('Second'), await queue('Third')];
    await setMailAccepting(false);
    expect(await deliverMail.perform(others[1].due)).toEqual({ sent: 0, failed: 0, retrying: 1 });
    expect((await first.row.reload()).attempts).toBe(1);
    for (const { row } of others) expect((await row.reload()).attempts).toBe(0);
    await setMailAccepting(true);
    expect((await deliverMail.perform(others[1].due)).sent).toBe(2);
  });
});

describe('mail delivery — claim, send outside any transaction, then record', () => {
  beforeEach(async () => {
    await resetDatabase();
    await clearMail();
    await setMailAccepting(true);
  });

  it('claim — committed as sending (attempts + 1, a lease) before the SMTP conversation, with no transaction open during it', async () => {
    const { row } = await queue('Claimed');
    const hang = await startHangingSmtp();
    try {
      const connected = hang.nextConnection();
      const run = deliverMail.perform(undefined, { transport: createMailTransport(hang.url) });
      await connected; // the worker is now talking to (waiting on) the mail server
      await row.reload();
      expect(row.status).toBe('sending');
      expect(row.attempts).toBe(1);
      expect(row.claimedUntil!.getTime() - row.claimedAt!.getTime()).toBe(LEASE_MS);
      const [open] = await sequelize.query<{ n: number }>(
        `SELECT count(*)::int AS n FROM pg_stat_activity
         WHERE datname = current_database() AND state LIKE 'idle in transaction%'`,
        { type: QueryTypes.SELECT },
      );
      expect(open.n).toBe(0);
      hang.dropAll();
      expect(await run).toEqual({ sent: 0, failed: 0, retrying: 1 });
      expect((await row.reload()).status).toBe('queued');
      expect(row.claimedUntil).toBeNull();
    } finally {
      await hang.close();
    }
  });

  it('crash between sending and recording — the claim expires and the message is sent again with the same Message-ID; never lost', async () => {
    const { row, due } = await queue('At least once');
    const claimed = (await claimNextMessage(due))!;
    expect(claimed.id).toBe(row.id);
    await transmit(claimed); // … and the worker dies before recording `sent`
    expect(await deliverMail.perform(at(due, LEASE_MS - 1))).toEqual({
      sent: 0,
      failed: 0,
      retrying: 0,
    });
    expect((await row.reload()).status).toBe('sending');
    expect((await deliverMail.perform(at(due, LEASE_MS))).sent).toBe(1);
    expect(await row.reload()).toMatchObject({ status: 'sent', attempts: 2 });
    const copies = await withSubject('At least once');
    expect(copies).toHaveLength(2);
    expect(copies.map((m) => m.headers['message-id'])).toEqual([
      `<${row.id}@${APP_HOST}>`,
      `<${row.id}@${APP_HOST}>`,
    ]);
  });

  it('crash after the claim, before sending — sent once when the lease has passed', async () => {
    const { row, due } = await queue('Picked up again');
    await claimNextMessage(due); // the worker dies before the SMTP conversation
    expect((await deliverMail.perform(at(due, LEASE_MS))).sent).toBe(1);
    expect(await row.reload()).toMatchObject({ status: 'sent', attempts: 2 });
    expect(await withSubject('Picked up again')).toHaveLength(1);
  });

  it('an interrupted last attempt — failed with the reason, not retried a 7th time', async () => {
    const { row, due } = await queue('Last try');
    await row.update({ attempts: ATTEMPTS - 1 });
    await claimNextMessage(due);
    expect(await deliverMail.perform(at(due, LEASE_MS))).toEqual({
      sent: 0,
      failed: 0,
      retrying: 0,
    });
    expect(await row.reload()).toMatchObject({ status: 'failed', attempts: ATTEMPTS });
    expect(row.lastError).toMatch(/interrupted/);
    expect(await withSubject('Last try')).toHaveLength(0);
  });

  it('three workers at once — twelve messages, each sent exactly once (SKIP LOCKED claims)', async () => {
    for (let i = 0; i < 12; i++) await queue(`Parallel ${i}`);
    const runs = await Promise.all([
      deliverMail.perform(),
      deliverMail.perform(),
      deliverMail.perform(),
    ]);
    expect(runs.reduce((n, r) => n + r.sent, 0)).toBe(12);
    const mail = (await caughtMail()).filter((m) => m.subject.startsWith('Parallel '));
    expect(mail).toHaveLength(12);
    expect(new Set(mail.map((m) => m.headers['message-id'])).size).toBe(12);
    const rows = await Notification.findAll();
    expect(rows.every((r) => r.status === 'sent' && r.attempts === 1)).toBe(true);
  });
});
