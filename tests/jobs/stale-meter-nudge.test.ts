import { beforeEach, describe, expect, it } from 'vitest';
import { resetDatabase } from '../support/db';
import { addReadings, createMachine, createMember, createOrganization } from '../support/factories';
import { caughtMail, clearMail, setMailAccepting } from '../support/mail';
import * as staleMeterNudge from '../../jobs/stale-meter-nudge';
import * as deliverMail from '../../jobs/deliver-mail';
import { loadJobSchedule } from '../../jobs/schedule';
import { Machine, MachineOperator, Notification } from '../../server/models';
import type { Organization } from '../../server/models';
import { setDigestHour } from '../../server/services/reminders';

const APP_URL = process.env.APP_URL ?? 'http://127.0.0.1:4310';
// 8:00 on Tuesday 7 April 2026 in Chicago
const NOW = new Date('2026-04-07T13:00:00Z');
/** One run of the job (it returns null only when another worker holds its lock). */
const runNudge = async (now: Date, n: number) => (await staleMeterNudge.perform(now, n))!;
const days = (n: number) => new Date(NOW.getTime() + n * 86_400_000);

async function assigned(org: Organization, machine: Machine, userId: string) {
  await MachineOperator.create({ organizationId: org.id, machineId: machine.id, userId });
}

describe('stale-meter nudge — operators of machines in season with no reading for N days', () => {
  beforeEach(async () => {
    await resetDatabase();
    await clearMail();
    await setMailAccepting(true);
  });

  it('schedule — STALE_NUDGE_DAYS defaults to 14 and must be a whole number', () => {
    expect(loadJobSchedule({}).STALE_NUDGE_DAYS).toBe(14);
    expect(loadJobSchedule({ STALE_NUDGE_DAYS: '21' }).STALE_NUDGE_DAYS).toBe(21);
    expect(() => loadJobSchedule({ STALE_NUDGE_DAYS: 'often' })).toThrow(/STALE_NUDGE_DAYS/);
    expect(() => loadJobSchedule({ DUE_DIGEST_CRON: 'hourly' })).toThrow(
      /DUE_DIGEST_CRON must be a node-cron expression/,
    );
    expect(loadJobSchedule({}).DUE_DIGEST_CRON).toBe('5 * * * *');
  });

  it('nudge — only the assigned operator of the stale, in-season, in-service machine; a link to log hours; once per run of N days', async () => {
    const org = await createOrganization({ timeZone: 'America/Chicago' });
    const op = await createMember(org, 'operator', { name: 'Olive Operator' });
    const other = await createMember(org, 'operator');
    await createMember(org, 'manager');
    const stale = await createMachine(org, { fleetNumber: 'T-01', name: 'North tractor' });
    const offSeason = await createMachine(org, { fleetNumber: 'C-01', seasonMonths: [8, 9] });
    const tagged = await createMachine(org, { fleetNumber: 'T-02', status: 'tagged_out' });
    const fresh = await createMachine(org, { fleetNumber: 'T-03' });
    const unassigned = await createMachine(org, { fleetNumber: 'T-04' });
    for (const m of [stale, offSeason, tagged, unassigned])
      await addReadings(m, [{ daysAgo: 20, value: 1234 }], NOW);
    await addReadings(fresh, [{ daysAgo: 3, value: 50 }], NOW);
    for (const m of [stale, offSeason, tagged, fresh]) await assigned(org, m, op.user.id);

    expect(await runNudge(NOW, 14)).toEqual({ queued: 1 });
    expect(await runNudge(NOW, 14)).toEqual({ queued: 0 });
    expect(await runNudge(days(3), 14)).toEqual({ queued: 0 });
    await deliverMail.perform();
    const mail = await caughtMail();
    expect(mail).toHaveLength(1);
    expect(mail[0].to[0]).toBe(op.user.email);
    expect(mail.some((m) => m.to[0] === other.user.email)).toBe(false);
    expect(mail[0].subject).toBe('Log the hours of T-01 · North tractor');
    expect(mail[0].text).toContain('no hour-meter reading for 20 days');
    expect(mail[0].text).toContain('The last reading was 1,234 h on');
    expect(mail[0].text).toContain(`${APP_URL}/o/${org.id}/log-hours`);

    // still nothing logged 14 days later: one reminder more; a reading then ends the nudges
    expect((await runNudge(days(8), 14)).queued).toBe(1);
    await addReadings(stale, [{ daysAgo: -9, value: 1300 }], NOW);
    expect((await runNudge(days(10), 14)).queued).toBe(0);
  });

  it('nudge — waits for the farm’s digest hour; N comes from the argument (STALE_NUDGE_DAYS)', async () => {
    const org = await createOrganization({ timeZone: 'America/Chicago' });
    await setDigestHour(org.id, 9);
    const op = await createMember(org, 'operator');
    const m = await createMachine(org);
    await addReadings(m, [{ daysAgo: 10, value: 100 }], NOW);
    await assigned(org, m, op.user.id);
    expect((await runNudge(NOW, 14)).queued).toBe(0); // 10 days: not stale at 14
    expect((await runNudge(NOW, 7)).queued).toBe(0); // stale at 7, but 08:00 < 09:00
    expect((await runNudge(new Date('2026-04-07T14:00:00Z'), 7)).queued).toBe(1);
    expect(await Notification.count({ where: { kind: 'stale_nudge' } })).toBe(1);
  });
});
