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
import { localDaysSince, staleCutoff } from '../../server/services/stale-meters';
import { staleMachines } from '../../server/services/due-list';
import * as staleMeterNudge from '../../jobs/stale-meter-nudge';
import * as deliverMail from '../../jobs/deliver-mail';
import { MachineOperator } from '../../server/models';
import { STALE_READING_DAYS } from '../../shared/constants';

// 08:00 CDT (UTC−5) on Tuesday 7 April 2026 in Chicago.
const NOW = new Date('2026-04-07T13:00:00Z');
// 21:30 CDT on Tuesday 24 March: 14 of the farm's calendar days before NOW, but only 13.4 × 24 h
// (on UTC dates it is 25 March, 13 days).
const LATE_EVENING = new Date('2026-03-25T02:30:00Z');
// 00:30 CDT on Wednesday 25 March: 13 local days before NOW.
const AFTER_MIDNIGHT = new Date('2026-03-25T05:30:00Z');
const daysAgo = (instant: Date) => (NOW.getTime() - instant.getTime()) / 86_400_000;

describe('stale meters — days since the last reading count the farm’s calendar days', () => {
  it('localDaysSince — Monday 21:00 in Chicago is one day old on Tuesday morning (0 on UTC dates)', () => {
    const mondayEvening = new Date('2026-04-07T02:00:00Z'); // Mon 6 April 21:00 CDT
    expect(localDaysSince(mondayEvening, 'America/Chicago', NOW)).toBe(1);
    expect(localDaysSince(mondayEvening, 'UTC', NOW)).toBe(0);
    expect(localDaysSince(LATE_EVENING, 'America/Chicago', NOW)).toBe(14);
  });

  it('staleCutoff — local midnight of the first fresh day, across the March DST change', () => {
    // 14 days: 7 April − 13 = 25 March, which begins at 05:00 UTC in CDT.
    expect(staleCutoff('America/Chicago', NOW, 14).toISOString()).toBe('2026-03-25T05:00:00.000Z');
    // 31 days: 8 March − … = 8 March begins in CST (UTC−6), before the 02:00 change.
    expect(staleCutoff('America/Chicago', NOW, 31).toISOString()).toBe('2026-03-08T06:00:00.000Z');
    expect(staleCutoff('UTC', NOW, 1).toISOString()).toBe('2026-04-07T00:00:00.000Z');
  });

  describe('with the database', () => {
    beforeEach(async () => {
      await resetDatabase();
      await clearMail();
      await setMailAccepting(true);
    });

    it('due list — a reading late in the evening 14 Chicago days ago is stale, 14 days; one after midnight is not', async () => {
      expect(STALE_READING_DAYS).toBe(14);
      const org = await createOrganization({ timeZone: 'America/Chicago' });
      const { user } = await createMember(org, 'manager');
      const late = await createMachine(org, { fleetNumber: 'LATE' });
      const next = await createMachine(org, { fleetNumber: 'NEXT' });
      await addReadings(late, [{ daysAgo: daysAgo(LATE_EVENING), value: 100 }], NOW);
      await addReadings(next, [{ daysAgo: daysAgo(AFTER_MIDNIGHT), value: 100 }], NOW);
      const access = {
        organization: org,
        userId: user.id,
        role: 'manager' as const,
        via: 'member' as const,
      };
      const stale = await staleMachines(access, '2026-04-07', NOW);
      expect(stale.map((s) => [s.machine.fleetNumber, s.daysSince])).toEqual([['LATE', 14]]);
    });

    it('nudge job — the late-evening reading 14 Chicago days ago is nudged as "14 days"', async () => {
      const org = await createOrganization({ timeZone: 'America/Chicago' });
      const op = await createMember(org, 'operator');
      const late = await createMachine(org, { fleetNumber: 'LATE', name: 'Yard loader' });
      const next = await createMachine(org, { fleetNumber: 'NEXT' });
      await addReadings(late, [{ daysAgo: daysAgo(LATE_EVENING), value: 100 }], NOW);
      await addReadings(next, [{ daysAgo: daysAgo(AFTER_MIDNIGHT), value: 100 }], NOW);
      for (const m of [late, next])
        await MachineOperator.create({
          organizationId: org.id,
          machineId: m.id,
          userId: op.user.id,
        });
      expect(await staleMeterNudge.perform(NOW, 14)).toEqual({ queued: 1 });
      await deliverMail.perform();
      const mail = await caughtMail();
      expect(mail.map((m) => m.subject)).toEqual(['Log the hours of LATE · Yard loader']);
      expect(mail[0].text).toContain('no hour-meter reading for 14 days');
    });

    it('due list — by hours at risk: a combine at 10 h/day unread 3 days is stale (≈ 30 h); a tractor at 0.5 h/day unread 20 days is not (10 h < 12.5 h)', async () => {
      // Both have a 250 h task: 5 % of it, 12.5 h, is what may go unrecorded (staleness.ts).
      const org = await createOrganization({ timeZone: 'UTC' });
      const { user } = await createMember(org, 'manager');
      const busy = await createMachine(org, { fleetNumber: 'BUSY' });
      const slow = await createMachine(org, { fleetNumber: 'SLOW' });
      await createTask(busy);
      await createTask(slow);
      await addReadings(
        busy,
        Array.from({ length: 28 }, (_, i) => ({ daysAgo: 30 - i, value: 1000 + 10 * i })),
      );
      await addReadings(
        slow,
        Array.from({ length: 15 }, (_, i) => ({ daysAgo: 118 - 7 * i, value: 500 + 3.5 * i })),
      );
      const access = {
        organization: org,
        userId: user.id,
        role: 'manager' as const,
        via: 'member' as const,
      };
      const stale = await staleMachines(access, new Date().toISOString().slice(0, 10));
      expect(stale.map((s) => s.machine.fleetNumber)).toEqual(['BUSY']);
      expect(stale[0].unrecorded).toBeGreaterThan(25);
      expect(stale[0].unrecorded).toBeLessThan(35);
      expect(stale[0].unit).toBe('h');
    });
  });
});
