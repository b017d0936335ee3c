// The running summary's pure steps (server/services/daily-summary.ts) on hand-worked examples.
// Day numbers count local days from 1970-01-01: 3 Nov 2024 is day 20030 (Date.UTC(2024, 10, 3) /
// 86,400,000). America/Chicago falls back at 02:00 CDT that day (US rule since 2007: first Sunday
// of November, Energy Policy Act of 2005 §110; IANA tz "US" rules), so 01:30 local comes twice:
// 06:30 UTC (CDT, UTC−5) and 07:30 UTC (CST, UTC−6).
import { describe, expect, it } from 'vitest';
import {
  addReadings,
  addReopenedDays,
  emptySummary,
  reopenedDays,
  SUMMARY_DAYS,
  summaryOf,
  withinWindow,
  type SummaryReading,
} from '../../server/services/daily-summary';

const TZ = 'America/Chicago';
const at = (iso: string, lifetimeValue: number): SummaryReading => ({
  takenAt: new Date(iso),
  lifetimeValue,
  value: lifetimeValue,
});

describe('daily summary — incremental steps', () => {
  it('a new reading later that local day replaces the day point; an earlier one leaves it (14:00 CST = day 20030 + 14/24)', () => {
    const start = summaryOf([at('2024-11-03T15:00:00Z', 100)], TZ); // 09:00 CST
    expect(start.daily).toEqual([{ day: 20030 + 9 / 24, value: 100 }]);
    const later = addReadings(start, [at('2024-11-03T20:00:00Z', 104)], TZ);
    expect(later.recheck.size).toBe(0);
    expect(later.summary.daily).toEqual([{ day: 20030 + 14 / 24, value: 104 }]);
    expect(later.summary.readingCount).toBe(2);
    expect(later.summary.last?.lifetimeValue).toBe(104);
    const earlier = addReadings(start, [at('2024-11-03T13:00:00Z', 98)], TZ); // 07:00 CST
    expect(earlier.summary.daily).toEqual(start.daily);
    expect(earlier.summary.first?.lifetimeValue).toBe(98);
  });

  it('01:30 CST ties the stored 01:30 CDT point: that day is handed back to be read again, not guessed', () => {
    const start = summaryOf([at('2024-11-03T06:30:00Z', 100)], TZ);
    expect(start.daily).toEqual([{ day: 20030 + 1.5 / 24, value: 100 }]);
    const { summary, recheck } = addReadings(start, [at('2024-11-03T07:30:00Z', 100.5)], TZ);
    expect([...recheck]).toEqual([20030]);
    // the last reading in time is still known without reading back
    expect(summary.last?.takenAt.toISOString()).toBe('2024-11-03T07:30:00.000Z');
  });

  it(`window — a point ${SUMMARY_DAYS} days before the last stays, one a day older goes`, () => {
    const points = [
      { day: 100, value: 1 },
      { day: 101, value: 2 },
      { day: 101 + SUMMARY_DAYS, value: 3 },
    ];
    expect(withinWindow(points)).toEqual(points.slice(1));
  });

  it('removing the last point reopens the days between the new and old cutoffs (last 2000 → 1990: days 895…905)', () => {
    const before = [
      { day: 1990.5, value: 10 },
      { day: 2000.5, value: 11 },
    ];
    const after = [{ day: 1990.5, value: 10 }];
    const reopened = reopenedDays(before, after)!;
    expect(reopened).toEqual({ fromKey: 895, toKey: 905, cutoff: 1990.5 - SUMMARY_DAYS });
    const back = addReopenedDays(
      after,
      new Map([
        [895, { day: 895.25, value: 1 }], // before the new cutoff (895.5): stays out
        [900, { day: 900.5, value: 2 }],
      ]),
      reopened.cutoff,
    );
    expect(back).toEqual([{ day: 900.5, value: 2 }, ...after]);
    expect(reopenedDays(before, before)).toBeNull();
  });

  it('an empty summary takes its first reading as first and last', () => {
    const { summary } = addReadings(emptySummary(), [at('2024-03-10T12:00:00Z', 5)], TZ);
    expect(summary.first?.lifetimeValue).toBe(5);
    expect(summary.last?.lifetimeValue).toBe(5);
    expect(summary.readingCount).toBe(1);
  });
});
