import { beforeEach, describe, expect, it } from 'vitest';
import { resetDatabase } from '../support/db';
import { createMember, createOrganization, createTask } from '../support/factories';
import { caughtMail, clearMail, setMailAccepting } from '../support/mail';
import * as overdueEscalation from '../../jobs/overdue-escalation';
import { handWorkedFarm } from './reminders-fixture';
import { mailFor, NOW, runDigest, sendAll } from './due-digest-fixture';

// Daily care sends no mail (issue 11): on the hand-worked farm of reminders-fixture.ts (T-01 at
// 1,300 h, 10 h a day) two daily-care tasks are added that, as service tasks, would be in every
// mail — a grease round greased at 1,280 h every 10 h (due 1,290 h: 10 h over, overdue) and a
// radiator screen done at 1,292 h (due 1,302 h: 2 h left, due soon). The digest and the overdue
// escalation carry exactly what they carried without them.
async function farmWithDailyCare() {
  const org = await createOrganization({ name: 'Test Farm', timeZone: 'America/Chicago' });
  const { user } = await createMember(org, 'manager', { name: 'Ann Manager' });
  const farm = await handWorkedFarm(org, NOW);
  await createTask(farm.tractor, {
    name: 'Daily grease points',
    intervalMeter: 10,
    warnMeter: 5,
    lastDoneMeter: 1280,
    dailyCare: true,
  });
  await createTask(farm.tractor, {
    name: 'Radiator screen: blow out',
    intervalMeter: 10,
    warnMeter: 5,
    lastDoneMeter: 1292,
    dailyCare: true,
  });
  return { org, user, ...farm };
}

describe('daily care — no overdue e-mails', () => {
  beforeEach(async () => {
    await resetDatabase();
    await clearMail();
    await setMailAccepting(true);
  });

  it('digest — the daily-care tasks are left out: the same counts and rows as the hand-worked list', async () => {
    const { user } = await farmWithDailyCare();
    expect(await runDigest(NOW)).toEqual({ organizations: 1, queued: 1 });
    await sendAll();
    const [mail] = mailFor(await caughtMail(), user.email);
    // as in due-digest-content.test.ts, without the two daily-care tasks
    expect(mail.subject).toBe('Due list: Test Farm — 1 overdue, 2 due soon, 2 coming up');
    expect(mail.text).toContain('Overdue: Engine oil and filter');
    expect(mail.text).not.toContain('Daily grease points');
    expect(mail.text).not.toContain('Radiator screen');
    expect(mail.html).not.toContain('Daily grease points');
  });

  it('overdue escalation — alerts the manager of the overdue oil change only, never of the grease round 10 h over', async () => {
    const { user } = await farmWithDailyCare();
    expect(await overdueEscalation.perform(NOW)).toEqual({ queued: 1 });
    await sendAll();
    const mail = mailFor(await caughtMail(), user.email);
    expect(mail.map((m) => m.subject)).toEqual(['Overdue: T-01 · Engine oil and filter']);
  });
});
