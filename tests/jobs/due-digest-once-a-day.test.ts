import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { resetDatabase } from '../support/db';
import { createMember, createOrganization } from '../support/factories';
import { caughtMail, clearMail, setMailAccepting } from '../support/mail';
import * as dueDigest from '../../jobs/due-digest';
import * as deliverMail from '../../jobs/deliver-mail';
import { Notification } from '../../server/models';
import { handWorkedFarm } from './reminders-fixture';
import { hours, mailFor, NOW, runDigest, sendAll } from './due-digest-fixture';

describe('due digest — once per day, whatever runs', () => {
  beforeEach(async () => {
    await resetDatabase();
    await clearMail();
    await setMailAccepting(true);
  });
  afterEach(() => setMailAccepting(true));

  it('two runs on one day send one message; the next day sends the next one', async () => {
    const org = await createOrganization();
    await handWorkedFarm(org, NOW);
    const { user } = await createMember(org, 'manager');
    expect((await runDigest(NOW)).queued).toBe(1);
    expect((await runDigest(NOW)).queued).toBe(0);
    expect((await runDigest(hours(3))).queued).toBe(0);
    await sendAll();
    await sendAll();
    expect(mailFor(await caughtMail(), user.email)).toHaveLength(1);
    expect((await runDigest(hours(24))).queued).toBe(1);
  });

  it('two workers started together send one message (advisory lock + unique outbox key)', async () => {
    const org = await createOrganization();
    await handWorkedFarm(org, NOW);
    const { user } = await createMember(org, 'manager');
    const [a, b] = await Promise.all([dueDigest.perform(NOW), dueDigest.perform(NOW)]);
    // the second either skipped on the lock (null) or found the message queued already
    expect((a?.queued ?? 0) + (b?.queued ?? 0)).toBe(1);
    const [s1, s2] = await Promise.all([deliverMail.perform(), deliverMail.perform()]);
    expect(s1.sent + s2.sent).toBe(1);
    expect(mailFor(await caughtMail(), user.email)).toHaveLength(1);
    expect(await Notification.count({ where: { kind: 'due_digest' } })).toBe(1);
  });

  it('SMTP down then up: the digest waits in the outbox, is retried and arrives once', async () => {
    const org = await createOrganization();
    await handWorkedFarm(org, NOW);
    const { user } = await createMember(org, 'manager');
    await setMailAccepting(false);
    await dueDigest.perform(NOW);
    expect(await sendAll()).toEqual({ sent: 0, failed: 0, retrying: 1 });
    expect((await runDigest(hours(1))).queued).toBe(0); // a later run adds nothing
    const row = (await Notification.findOne({ where: { kind: 'due_digest' } }))!;
    expect(row.status).toBe('queued');
    expect(row.lastError).toBeTruthy();
    await setMailAccepting(true);
    await row.update({ nextAttemptAt: new Date() }); // the backoff has passed
    expect((await sendAll()).sent).toBe(1);
    expect((await sendAll()).sent).toBe(0);
    expect(mailFor(await caughtMail(), user.email)).toHaveLength(1);
    expect((await row.reload()).status).toBe('sent');
  });
});
