import { beforeEach, describe, expect, it } from 'vitest';
import request from 'supertest';
import { resetDatabase } from '../support/db';
import { createMember, createOrganization } from '../support/factories';
import { caughtMail, clearMail, setMailAccepting } from '../support/mail';
import * as dueDigest from '../../jobs/due-digest';
import { MachineOperator, Notification, NotificationPreference } from '../../server/models';
import { localClock } from '../../server/services/reminders';
import { handWorkedFarm } from './reminders-fixture';
import { app, hours, listHeaders, mailFor, NOW, runDigest, sendAll } from './due-digest-fixture';

describe('due digest — each person’s preferences', () => {
  beforeEach(async () => {
    await resetDatabase();
    await clearMail();
    await setMailAccepting(true);
  });

  it('preferences — default daily for managers and technicians, off for operators; weekly on the chosen weekday; machine and category filters; off', async () => {
    const org = await createOrganization({ timeZone: 'America/Chicago' });
    const { tractor, baler } = await handWorkedFarm(org, NOW);
    const manager = await createMember(org, 'manager');
    const technician = await createMember(org, 'technician');
    const operator = await createMember(org, 'operator');
    const optedIn = await createMember(org, 'operator');
    const weeklyTuesday = await createMember(org, 'technician');
    const weeklyMonday = await createMember(org, 'technician');
    const balersOnly = await createMember(org, 'manager');
    const tractorOnly = await createMember(org, 'manager');
    const off = await createMember(org, 'manager');
    const pref = (m: { membership: { id: string } }, p: Partial<NotificationPreference>) =>
      NotificationPreference.create({
        membershipId: m.membership.id,
        organizationId: org.id,
        frequency: 'daily',
        ...p,
      });
    await pref(optedIn, { frequency: 'daily' });
    await pref(weeklyTuesday, { frequency: 'weekly', weekday: 2 });
    await pref(weeklyMonday, { frequency: 'weekly', weekday: 1 });
    await pref(balersOnly, { categories: ['baler'] });
    await pref(tractorOnly, { machineIds: [tractor.id] });
    await pref(off, { frequency: 'off' });
    // the opted-in operator runs the baler; the tractor is someone else's
    await MachineOperator.create({
      organizationId: org.id,
      machineId: baler.id,
      userId: optedIn.user.id,
    });
    await MachineOperator.create({
      organizationId: org.id,
      machineId: tractor.id,
      userId: operator.user.id,
    });

    expect(localClock(org.timeZone, NOW).isoWeekday).toBe(2); // a Tuesday
    await dueDigest.perform(NOW);
    await sendAll();
    const all = await caughtMail();
    const got = (m: { user: { email: string } }) => mailFor(all, m.user.email);

    expect(got(manager)).toHaveLength(1);
    expect(got(technician)).toHaveLength(1);
    expect(got(operator)).toHaveLength(0);
    expect(got(off)).toHaveLength(0);
    expect(got(weeklyMonday)).toHaveLength(0);
    expect(got(weeklyTuesday)).toHaveLength(1);
    expect(got(weeklyTuesday)[0].subject).toMatch(/^Weekly due list/);

    const [opMail] = got(optedIn);
    expect(opMail.text).toContain('Knotter grease');
    expect(opMail.text).not.toContain('T-01');
    const [balerMail] = got(balersOnly);
    expect(balerMail.text).toContain('B-02');
    expect(balerMail.text).not.toContain('T-01');
    const [tractorMail] = got(tractorOnly);
    expect(tractorMail.text).toContain('T-01');
    expect(tractorMail.text).not.toContain('B-02');

    const periods = await Notification.findAll({ where: { kind: 'due_digest' } });
    expect(new Set(periods.map((p) => p.periodKey))).toEqual(
      new Set(['daily:2026-04-07', 'weekly:2026-W15']),
    );
  });

  it('preferences — the one-click unsubscribe (POST to the List-Unsubscribe address) turns the digest off for the next day', async () => {
    const org = await createOrganization();
    await handWorkedFarm(org, NOW);
    const { user, membership } = await createMember(org, 'manager');
    await dueDigest.perform(NOW);
    await sendAll();
    const [mail] = mailFor(await caughtMail(), user.email);
    const url = new URL(listHeaders(mail).unsubscribe.url);
    const res = await request(app)
      .post(url.pathname)
      .type('form')
      .send('List-Unsubscribe=One-Click');
    expect(res.status).toBe(200);
    expect((await NotificationPreference.findByPk(membership.id))!.frequency).toBe('off');
    await clearMail();
    expect((await runDigest(hours(24))).queued).toBe(0);
  });
});
