import { beforeEach, describe, expect, it } from 'vitest';
import { resetDatabase } from '../support/db';
import {
  addReadings,
  createMachine,
  createMember,
  createOrganization,
  createTask,
} from '../support/factories';
import { caughtMail, clearMail, setMailAccepting } from '../support/mail';
import * as overdueEscalation from '../../jobs/overdue-escalation';
import * as deliverMail from '../../jobs/deliver-mail';
import { Notification, ServiceTask } from '../../server/models';
import { refreshMachineForecast } from '../../server/services/forecast';

const APP_URL = process.env.APP_URL ?? 'http://127.0.0.1:4310';
const NOW = new Date('2026-04-07T13:00:00Z');
/** One run of the job (it returns null only when another worker holds its lock). */
const runEscalation = async (now: Date) => (await overdueEscalation.perform(now))!;
const days = (n: number) => new Date(NOW.getTime() + n * 86_400_000);

describe('overdue escalation — one message to managers the day a task becomes overdue', () => {
  beforeEach(async () => {
    await resetDatabase();
    await clearMail();
    await setMailAccepting(true);
  });

  it('escalation — nothing while due soon; the run after the reading that makes it overdue alerts each manager once; never again for that due point', async () => {
    const org = await createOrganization({ timeZone: 'America/Chicago' });
    const a = await createMember(org, 'manager');
    const b = await createMember(org, 'manager');
    const tech = await createMember(org, 'technician');
    const m = await createMachine(org, { fleetNumber: 'T-01', name: 'North tractor' });
    // 10 h/day, at 1,240 h; oil due at 1,250 h (done at 1,000): 10 h to go → due soon
    await addReadings(
      m,
      [30, 20, 10, 0].map((d) => ({ daysAgo: d, value: 1240 - d * 10 })),
      NOW,
    );
    const task = await createTask(m, {
      name: 'Engine oil and filter',
      intervalMeter: 250,
      lastDoneMeter: 1000,
      warnMeter: 25,
    });
    expect(await runEscalation(NOW)).toEqual({ queued: 0 });

    // the next day's reading passes 1,250 h: overdue
    await addReadings(m, [{ daysAgo: -1, value: 1252 }], NOW);
    expect(await runEscalation(days(1))).toEqual({ queued: 2 });
    await deliverMail.perform();
    const mail = await caughtMail();
    expect(mail).toHaveLength(2);
    expect(mail.map((x) => x.to[0]).sort()).toEqual([a.user.email, b.user.email].sort());
    expect(mail.some((x) => x.to[0] === tech.user.email)).toBe(false);
    expect(mail[0].subject).toBe('Overdue: T-01 · Engine oil and filter');
    expect(mail[0].text).toContain('Due at 1,250 h — 2 h over');
    expect(mail[0].text).toContain(`${APP_URL}/o/${org.id}/machines/${m.id}`);
    const row = (await Notification.findOne({ where: { kind: 'overdue' } }))!;
    expect(row.periodKey).toBe(`${task.id}:1250:`);

    // later the same day, the next days, after another reading: still overdue, no second alert
    expect((await runEscalation(days(1.2))).queued).toBe(0);
    await addReadings(m, [{ daysAgo: -2, value: 1262 }], NOW);
    expect((await runEscalation(days(2))).queued).toBe(0);
    expect((await runEscalation(days(5))).queued).toBe(0);

    // done at 1,262 h → next due 1,512 h; when that one passes it is a new due point
    await ServiceTask.update({ lastDoneMeter: 1262 }, { where: { id: task.id } });
    await addReadings(m, [{ daysAgo: -30, value: 1520 }], NOW);
    await refreshMachineForecast(m.id, org.id);
    expect((await runEscalation(days(30))).queued).toBe(2);
    expect(await Notification.count({ where: { kind: 'overdue' } })).toBe(4);
  });

  it('escalation — two workers at once queue each alert once', async () => {
    const org = await createOrganization();
    await createMember(org, 'manager');
    const m = await createMachine(org);
    await createTask(m, { intervalMeter: null, intervalDays: 30, lastDoneOn: '2026-01-01' });
    const [x, y] = await Promise.all([
      overdueEscalation.perform(NOW),
      overdueEscalation.perform(NOW),
    ]);
    expect((x?.queued ?? 0) + (y?.queued ?? 0)).toBe(1);
    expect(await Notification.count({ where: { kind: 'overdue' } })).toBe(1);
  });
});
