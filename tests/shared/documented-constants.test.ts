// The documented constants of the forecast (shared/domain/usage.ts, usage-season.ts,
// due-point.ts), each pinned by an example worked by hand here, so that changing one fails a
// test: the projection limit (three years and a day), the range percentiles (20th / 80th), the
// season history needed (a year of readings) and, for the previous method the accuracy benchmark
// compares with, its comparison window (28 days) and lower scale clamp (×0.5). Provenance: derived — the arithmetic is in each
// test; the constants themselves are the method's choices (common practice), not published.
import { describe, expect, it } from 'vitest';
import { dayNumberFromIso } from '../../shared/domain/calendar';
import { projectDateForValue } from '../../shared/domain/due-point';
import { estimateUsage } from '../../shared/domain/usage';
import type { UsageEstimate } from '../../shared/domain/types';
import { readingsFrom, referenceAddDays } from './fixtures';

const START = '2024-01-01';
const startDay = dayNumberFromIso(START);

describe('projection limit — three years and a day (1,096 days) after asOf', () => {
  // 1 h/day from 0 h at asOf: the meter reaches n h exactly n days on.
  const asOfIso = '2025-06-02';
  const asOfDay = dayNumberFromIso(asOfIso);
  const trend: UsageEstimate = {
    method: 'trend',
    rate: 1,
    low: 1,
    high: 1,
    readingCount: 2,
    lastDay: asOfDay,
    lastValue: 0,
    explanation: 'hand-built',
  };
  // The season walk: a year of 1 h/day, repeated past its end.
  const season: UsageEstimate = {
    ...trend,
    method: 'season',
    anchorDay: asOfDay,
    anchorValue: 0,
    profile: Array.from({ length: 365 }, () => 1),
    scale: 1,
  };

  it('projectDateForValue — trend, 1,096 h at 1 h/day — dated 1,096 days on (2028-06-02)', () => {
    expect(projectDateForValue(trend, 1096, asOfDay, 'point')).toBe(
      referenceAddDays(asOfIso, 1096),
    );
    expect(referenceAddDays(asOfIso, 1096)).toBe('2028-06-02');
  });

  it('projectDateForValue — trend, 1,097 h at 1 h/day — 1,097 days on is past the limit: null', () => {
    expect(projectDateForValue(trend, 1097, asOfDay, 'point')).toBeNull();
  });

  it('projectDateForValue — season profile, 1,096 h — dated; 1,097 h — null', () => {
    expect(projectDateForValue(season, 1096, asOfDay, 'point')).toBe(
      referenceAddDays(asOfIso, 1096),
    );
    expect(projectDateForValue(season, 1097, asOfDay, 'point')).toBeNull();
  });
});

describe('range percentiles — low = 20th, high = 80th of the interval rates', () => {
  // Ordinary least squares (half-life Infinity): an interval's weight is its length in days.

  it('usage — five 10-day intervals at 4, 6, 2, 8, 5 h/day — rate 5, low 2, high 6', () => {
    // Readings (0, 0), (10, 40), (20, 100), (30, 120), (40, 200), (50, 250).
    // Slope: x̄ = 25, ȳ = 710 / 6; Sxy = 8,750, Sxx = 1,750 → 5 h/day.
    // Rates sorted 2, 4, 5, 6, 8, a fifth of the weight each: the 20th percentile is reached at
    // the first (1/5), the 80th at the fourth (4/5). A lower-than-20th would still give 2, a
    // higher one 4; an 80th moved below 3/5 gives 5, above 4/5 gives 8.
    const usage = estimateUsage(
      readingsFrom(START, [
        [0, 0],
        [10, 40],
        [20, 100],
        [30, 120],
        [40, 200],
        [50, 250],
      ]),
      startDay + 50,
      { halfLifeDays: Infinity },
    );
    expect(usage.rate).toBeCloseTo(5, 10);
    expect(usage.low).toBeCloseTo(2, 10);
    expect(usage.high).toBeCloseTo(6, 10);
  });

  it('usage — the 2 h/day interval 39 days, the 8 h/day one 41 (of 200) — low 4, high 8', () => {
    // Readings (0, 0), (40, 160), (80, 400), (119, 478), (160, 806), (200, 1,006): rates 4, 6, 2,
    // 8, 5 over 40, 40, 39, 41, 40 days. Sorted with cumulative weight: 2 (39/200 = 0.195),
    // 4 (0.395), 5 (0.595), 6 (0.795), 8 (1). The 20th percentile is past 0.195 → 4; the 80th
    // past 0.795 → 8. With the first set this pins the low percentile in (0.195, 0.2] and the
    // high one in (0.795, 0.8]: a 19th gives 2, a 79th 6.
    // Slope: x̄ = 599 / 6, ȳ = 475; Sxy = 140,917, Sxx = 167,765 / 6 → 5.0398 h/day.
    const usage = estimateUsage(
      readingsFrom(START, [
        [0, 0],
        [40, 160],
        [80, 400],
        [119, 478],
        [160, 806],
        [200, 1006],
      ]),
      startDay + 200,
      { halfLifeDays: Infinity, windowDays: 250 },
    );
    expect(usage.readingCount).toBe(6);
    expect(usage.rate).toBeCloseTo(5.0398, 4);
    expect(usage.low).toBeCloseTo(4, 10);
    expect(usage.high).toBeCloseTo(8, 10);
  });
});

describe('previous method — season comparison window — the last 28 days against the same 28 days a year earlier', () => {
  it('usage — 2 h/day for 372 days, then 4 h/day for the last 28 — scale 114.14 / 58.14', () => {
    // Readings (0, 0), (372, 744), (400, 856); asOf day 400. One average day = 856 / 400 = 2.14.
    // This year's last 28 days: 856 − 744 = 112; the same 28 days a year before (days 7…35):
    // 2 × 28 = 56. Scale = (112 + 2.14) / (56 + 2.14) = 1.963192. (A 27-day window gives
    // 110.14 / 56.14 = 1.961881, a 29-day one 116.14 / 60.14 = 1.931161.)
    // Last year's next 30 days (days 35…65) ran at 2 h/day: rate 2 × 1.963192 = 3.926385,
    // low 2 × 1 × 0.8 = 1.6, high 2 × 1.963192 × 1.2 = 4.711662.
    const usage = estimateUsage(
      readingsFrom(START, [
        [0, 0],
        [372, 744],
        [400, 856],
      ]),
      startDay + 400,
      { method: 'previous' },
    );
    expect(usage.method).toBe('season');
    expect(usage.scale).toBeCloseTo(1.963192, 6);
    expect(usage.rate).toBeCloseTo(3.926385, 6);
    expect(usage.low).toBeCloseTo(1.6, 10);
    expect(usage.high).toBeCloseTo(4.711662, 6);
    expect(usage.explanation).toBe("Same weeks last year, scaled ×1.96 to this year's recent use");
  });
});

describe('minimum season history — readings spanning a year (365 days)', () => {
  // 2 h/day throughout; only which method answers changes.
  const steady = (lastDay: number) =>
    readingsFrom(START, [
      [0, 0],
      [lastDay, 2 * lastDay],
    ]);

  it('usage — readings spanning 364 days — trend (no whole past year to repeat)', () => {
    expect(estimateUsage(steady(364), startDay + 364).method).toBe('trend');
  });

  it('usage — readings spanning 365 days — season', () => {
    expect(estimateUsage(steady(365), startDay + 365).method).toBe('season');
  });

  it('usage — previous method: readings spanning 392 days (asOf 400) — trend: no year-earlier 28 days', () => {
    // 365 + 28 = 393 days of readings were needed to compare the last 28 with a year earlier.
    expect(estimateUsage(steady(392), startDay + 400, { method: 'previous' }).method).toBe('trend');
    expect(estimateUsage(steady(393), startDay + 400, { method: 'previous' }).method).toBe(
      'season',
    );
  });
});

describe('previous method — lower scale clamp — a quiet year is scaled by ×0.5 at the least', () => {
  it('usage — 4 h/day for 372 days, then 1 h/day for the last 28 — raw 0.2745, clamped to 0.5', () => {
    // Readings (0, 0), (372, 1,488), (400, 1,516); asOf day 400. One average day = 3.79.
    // Raw scale = (28 + 3.79) / (4 × 28 + 3.79) = 31.79 / 115.79 = 0.2745, below 0.5: ×0.5.
    // Last year's next 30 days ran at 4 h/day: rate 4 × 0.5 = 2; low 4 × 0.5 × 0.8 = 1.6;
    // high 4 × max(0.5, 1) × 1.2 = 4.8.
    const usage = estimateUsage(
      readingsFrom(START, [
        [0, 0],
        [372, 1488],
        [400, 1516],
      ]),
      startDay + 400,
      { method: 'previous' },
    );
    expect(usage.method).toBe('season');
    expect(usage.scale).toBe(0.5);
    expect(usage.rate).toBeCloseTo(2, 10);
    expect(usage.low).toBeCloseTo(1.6, 10);
    expect(usage.high).toBeCloseTo(4.8, 10);
  });
});
