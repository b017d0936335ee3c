import { beforeEach, describe, expect, it } from 'vitest';
import { resetDatabase } from '../support/db';
import { createMember, createMachine, createOrganization, createTask } from '../support/factories';
import { clearMail } from '../support/mail';
import * as dueDigest from '../../jobs/due-digest';
import { Notification } from '../../server/models';
import { localClock, setDigestHour } from '../../server/services/reminders';
import { runDigest } from './due-digest-fixture';

describe('due digest — the farm’s time zone decides the local hour (DST changes included)', () => {
  beforeEach(async () => {
    await resetDatabase();
    await clearMail();
  });

  it('local clock — Europe/Dublin on the first day of summer time (29 Mar 2026, Sunday, ISO week 13)', () => {
    expect(localClock('Europe/Dublin', new Date('2026-03-29T05:30:00Z'))).toEqual({
      date: '2026-03-29',
      hour: 6, // IST = UTC+1 since 01:00 UTC
      month: 3,
      isoWeekday: 7,
      isoWeek: '2026-W13',
    });
    expect(localClock('America/Chicago', new Date('2026-03-08T07:30:00Z')).hour).toBe(1); // CST
    expect(localClock('America/Chicago', new Date('2026-03-08T08:30:00Z')).hour).toBe(3); // CDT
  });

  it('America/Chicago and Europe/Dublin at digest hour 6: the same UTC time sends before a DST change and not after, or the reverse', async () => {
    const chicago = await createOrganization({ timeZone: 'America/Chicago' });
    const dublin = await createOrganization({ timeZone: 'Europe/Dublin' });
    for (const org of [chicago, dublin]) {
      await setDigestHour(org.id, 6);
      await createMember(org, 'manager');
      const m = await createMachine(org);
      // calendar-only task, overdue all through March 2026
      await createTask(m, { intervalMeter: null, intervalDays: 30, lastDoneOn: '2026-01-01' });
    }
    const periods = async (orgId: string) =>
      (await Notification.findAll({ where: { organizationId: orgId, kind: 'due_digest' } }))
        .map((n) => n.periodKey)
        .sort();

    // Chicago: 11:30 UTC is 05:30 CST on 7 March — before the hour
    await dueDigest.perform(new Date('2026-03-07T11:30:00Z'));
    expect(await periods(chicago.id)).toEqual([]);
    // 12:30 UTC is 06:30 CST — sent for 7 March
    await dueDigest.perform(new Date('2026-03-07T12:30:00Z'));
    expect(await periods(chicago.id)).toEqual(['daily:2026-03-07']);
    // 05:30 UTC on 8 March is still 23:30 on 7 March in Chicago: nothing new
    await dueDigest.perform(new Date('2026-03-08T05:30:00Z'));
    expect(await periods(chicago.id)).toEqual(['daily:2026-03-07']);
    // after the change to CDT (UTC−5), 11:30 UTC is 06:30: sent for 8 March
    await dueDigest.perform(new Date('2026-03-08T11:30:00Z'));
    expect(await periods(chicago.id)).toEqual(['daily:2026-03-07', 'daily:2026-03-08']);

    // Dublin: 05:30 UTC is 05:30 GMT on 28 March — before the hour
    await dueDigest.perform(new Date('2026-03-28T05:30:00Z'));
    expect((await periods(dublin.id)).includes('daily:2026-03-28')).toBe(false);
    // on 29 March (IST, UTC+1) the same 05:30 UTC is 06:30: sent
    await dueDigest.perform(new Date('2026-03-29T05:30:00Z'));
    expect((await periods(dublin.id)).includes('daily:2026-03-29')).toBe(true);
    // Dublin's 7 March digest went out at 11:30 UTC (already 11:30 there)
    expect((await periods(dublin.id)).includes('daily:2026-03-07')).toBe(true);
  });

  it('a later digest hour set by the manager holds the digest back until then', async () => {
    const org = await createOrganization({ timeZone: 'Europe/Dublin' });
    await setDigestHour(org.id, 9);
    await createMember(org, 'manager');
    const m = await createMachine(org);
    await createTask(m, { intervalMeter: null, intervalDays: 30, lastDoneOn: '2026-01-01' });
    // 07:30 UTC on 10 March = 07:30 GMT
    expect((await runDigest(new Date('2026-03-10T07:30:00Z'))).queued).toBe(0);
    expect((await runDigest(new Date('2026-03-10T09:00:00Z'))).queued).toBe(1);
  });
});
