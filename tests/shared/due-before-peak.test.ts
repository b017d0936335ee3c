// "Before the peak" (shared/domain/due-before-peak.ts) on a hand-built season: 50 days at 1 h/day,
// then 50 busy days at 8 h/day, then idle. Provenance: derived — the arithmetic is in each test;
// the busy share (half an average working day) and the 14-day season are the method's choices
// (common practice), not published figures. Dates against date-fns (referenceAddDays).
import { describe, expect, it } from 'vitest';
import { dayNumberFromIso } from '../../shared/domain/calendar';
import { computeDuePoint } from '../../shared/domain/due-point';
import { beforePeakText } from '../../shared/domain/due-words';
import type { UsageEstimate } from '../../shared/domain/types';
import { referenceAddDays, task } from './fixtures';

const asOfIso = '2027-06-01';
const asOf = dayNumberFromIso(asOfIso);
const profile = Array.from({ length: 365 }, (_, i) => (i < 50 ? 1 : i < 100 ? 8 : 0));
const usage = (startDay: number, startProfile = profile): UsageEstimate => ({
  method: 'season',
  rate: 1,
  low: 1,
  high: 1,
  readingCount: 800,
  lastDay: startDay,
  lastValue: 1000,
  anchorDay: startDay,
  anchorValue: 1000,
  profile: startProfile,
  profileFast: startProfile,
  profileSlow: startProfile,
  explanation: 'hand-built',
});

describe('before the peak — a task that would stop the machine in its busy season', () => {
  it('computeDuePoint — 250 h to go — due 25 days into the season: do it by day 49, 200 h early', () => {
    // 50 h by day 50 at 1 h/day, the other 200 h at 8 h/day: day 75, inside the busy run
    // (busy = half of the average working day (50 + 400) / 100 = 2.25 h: days 50–99).
    const due = computeDuePoint(
      task({ intervalMeter: 500, lastDoneMeter: 750 }),
      usage(asOf),
      asOfIso,
      1000,
    );
    expect(due.projectedDate).toBe(referenceAddDays(asOfIso, 75));
    expect(due.beforePeak).toEqual({ doBy: referenceAddDays(asOfIso, 49), earlyBy: 200 });
    expect(beforePeakText(due.beforePeak!, 'h')).toBe(
      'Do it before 20 Jul 2027: 200 h early, avoids a stop in the busy season',
    );
  });

  it('computeDuePoint — 30 h to go — due before the season: no advice', () => {
    const due = computeDuePoint(
      task({ intervalMeter: 500, lastDoneMeter: 530 }),
      usage(asOf),
      asOfIso,
      1000,
    );
    expect(due.projectedDate).toBe(referenceAddDays(asOfIso, 30));
    expect(due.beforePeak).toBeUndefined();
  });

  it('computeDuePoint — already in the season — too late to get ahead of it: no advice', () => {
    const inSeason = profile.slice(60).concat(profile.slice(0, 60));
    const due = computeDuePoint(
      task({ intervalMeter: 500, lastDoneMeter: 750 }),
      usage(asOf, inSeason),
      asOfIso,
      1000,
    );
    expect(due.beforePeak).toBeUndefined();
  });

  it('computeDuePoint — a trend estimate — no season, no advice', () => {
    const trend: UsageEstimate = { ...usage(asOf), method: 'trend', profile: undefined };
    const due = computeDuePoint(
      task({ intervalMeter: 500, lastDoneMeter: 750 }),
      trend,
      asOfIso,
      1000,
    );
    expect(due.beforePeak).toBeUndefined();
  });
});
