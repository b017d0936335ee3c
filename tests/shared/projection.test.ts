// projectDateForValue (shared/domain/due-point.ts): the date the lifetime meter reaches a value,
// from hand-built usage estimates so every figure is worked by hand in the test. Dates from the
// reference library (date-fns addDays, CHECKS.md §3).
import { describe, expect, it } from 'vitest';
import { dayNumberFromIso } from '../../shared/domain/calendar';
import { projectDateForValue } from '../../shared/domain/due-point';
import type { UsageEstimate } from '../../shared/domain/types';
import { referenceAddDays } from './fixtures';

const asOfIso = '2025-06-02';
const asOfDay = dayNumberFromIso(asOfIso);
const on = (days: number) => referenceAddDays(asOfIso, days);

/** A trend estimate: `rate` (low…high) units a day from `value` at asOf. */
const trend = (rate: number, low: number, high: number, value = 0): UsageEstimate => ({
  method: 'trend',
  rate,
  low,
  high,
  readingCount: 3,
  lastDay: asOfDay,
  lastValue: value,
  explanation: 'hand-built',
});

/** A season estimate walking `profile` (scaled use per day after asOf) from 0 at asOf. */
const season = (profile: number[], scale?: number): UsageEstimate => ({
  ...trend(0, 0, 0),
  method: 'season',
  anchorDay: asOfDay,
  anchorValue: 0,
  profile,
  scale,
});
const ones = (n: number) => Array.from({ length: n }, () => 1);
const zeros = (n: number) => Array.from({ length: n }, () => 0);

describe('projectDateForValue — what it needs', () => {
  it('projectDateForValue — method none, even with a rate and a last reading — null', () => {
    expect(projectDateForValue({ ...trend(5, 5, 5), method: 'none' }, 50, asOfDay, 'point')).toBe(
      null,
    );
  });

  it('projectDateForValue — trend without a last day, or without a last value — null', () => {
    expect(projectDateForValue({ ...trend(5, 5, 5), lastDay: null }, 50, asOfDay, 'point')).toBe(
      null,
    );
    expect(projectDateForValue({ ...trend(5, 5, 5), lastValue: null }, 50, asOfDay, 'point')).toBe(
      null,
    );
  });

  it('projectDateForValue — anchor value 50 given beside a last value 100 — counted from 50 (10 days at 5/day to 100)', () => {
    const usage = { ...trend(5, 5, 5, 100), anchorDay: asOfDay, anchorValue: 50 };
    expect(projectDateForValue(usage, 100, asOfDay, 'point')).toBe(on(10));
  });
});

describe('projectDateForValue — trend: value + rate × days', () => {
  it('projectDateForValue — 50 h at 5 (4…10) h/day — point 10 days, earliest 5, latest 12', () => {
    // 50 / 5 = 10; earliest at the high rate 50 / 10 = 5; latest at the low rate 50 / 4 = 12.5.
    const usage = trend(5, 4, 10);
    expect(projectDateForValue(usage, 50, asOfDay, 'point')).toBe(on(10));
    expect(projectDateForValue(usage, 50, asOfDay, 'low')).toBe(on(5));
    expect(projectDateForValue(usage, 50, asOfDay, 'high')).toBe(on(12));
  });

  it('projectDateForValue — a season estimate with no profile — projected by its rate (20 / 4 = 5 days)', () => {
    const usage = { ...season([]), rate: 4, low: 4, high: 4 };
    expect(projectDateForValue(usage, 20, asOfDay, 'point')).toBe(on(5));
  });

  it('projectDateForValue — a trend estimate carrying a profile — the profile is not used', () => {
    // The idle profile would never get there; the trend's 2 h/day takes 10 days for 20 h.
    const usage = { ...trend(2, 2, 2), profile: zeros(400) };
    expect(projectDateForValue(usage, 20, asOfDay, 'point')).toBe(on(10));
  });
});

describe('projectDateForValue — season: walking the profile', () => {
  it('projectDateForValue — target already reached (below the anchor) — asOf, even on an idle profile', () => {
    expect(
      projectDateForValue({ ...season(zeros(400)), anchorValue: 30 }, 20, asOfDay, 'point'),
    ).toBe(asOfIso);
  });

  it('projectDateForValue — target equal to the anchor, profile idle for two days — asOf, not two days on', () => {
    const profile = [0, 0, ...ones(398)];
    expect(projectDateForValue({ ...season(profile), anchorValue: 20 }, 20, asOfDay, 'point')).toBe(
      asOfIso,
    );
  });

  it('projectDateForValue — idle for 365 days, then 1/day — 10 h reached 375 days on', () => {
    // Index i is day i + 1 after asOf: the 10th unit is used on index 374, day 375.
    const profile = [...zeros(365), ...ones(35)];
    expect(projectDateForValue(season(profile, 1), 10, asOfDay, 'point')).toBe(on(375));
  });

  it('projectDateForValue — a 30-day profile — nothing known past it: null for 40 h at 1/day', () => {
    expect(projectDateForValue(season(ones(30), 1), 40, asOfDay, 'point')).toBeNull();
    expect(projectDateForValue(season(ones(30), 1), 30, asOfDay, 'point')).toBe(on(30));
  });

  it('projectDateForValue — scale ×0.5 — earliest at ×1 × 1.2 / 0.5 = ×2.4, latest at ×0.5 × 0.8 / 0.5 = ×0.8', () => {
    // Profile = base × scale = 1/day. 10 h: point 10 days; earliest 10 / 2.4 = 4.17 → day 4;
    // latest 10 / 0.8 = 12.5 → day 12.
    const usage = season(ones(400), 0.5);
    expect(projectDateForValue(usage, 10, asOfDay, 'point')).toBe(on(10));
    expect(projectDateForValue(usage, 10, asOfDay, 'low')).toBe(on(4));
    expect(projectDateForValue(usage, 10, asOfDay, 'high')).toBe(on(12));
  });

  it('projectDateForValue — scale ×2 — earliest at ×2 × 1.2 / 2 = ×1.2, latest at ×1 × 0.8 / 2 = ×0.4', () => {
    // 10 h: earliest 10 / 1.2 = 8.33 → day 8; latest 10 / 0.4 = 25 → day 25.
    const usage = season(ones(400), 2);
    expect(projectDateForValue(usage, 10, asOfDay, 'low')).toBe(on(8));
    expect(projectDateForValue(usage, 10, asOfDay, 'high')).toBe(on(25));
  });

  it('projectDateForValue — no scale, or scale 0 — taken as ×1: earliest ×1.2 (day 8), latest ×0.8 (day 12)', () => {
    for (const scale of [undefined, 0]) {
      const usage = season(ones(400), scale);
      expect(projectDateForValue(usage, 10, asOfDay, 'low')).toBe(on(8));
      expect(projectDateForValue(usage, 10, asOfDay, 'high')).toBe(on(12));
    }
  });
});
