// Usage estimates: hand-worked examples of the trend and season methods (see shared/domain/usage.ts).
import { describe, expect, it } from 'vitest';
import { dayNumberFromIso } from '../../shared/domain/calendar';
import { estimateUsage } from '../../shared/domain/usage';
import { weightedQuantile, weightedSlope } from '../../shared/domain/usage-trend';
import type { ReadingPoint } from '../../shared/domain/types';
import { inHarvest, readingsFrom, seasonalReadings } from './fixtures';

describe('usage — too little data', () => {
  it('usage — no readings — method none, rate 0', () => {
    const usage = estimateUsage([], 100);
    expect(usage).toMatchObject({ method: 'none', rate: 0, low: 0, high: 0, lastDay: null });
  });

  it('usage — one reading — method none, keeps the last value', () => {
    const usage = estimateUsage([{ day: 100, value: 812 }], 100);
    expect(usage).toMatchObject({ method: 'none', rate: 0, low: 0, high: 0, readingCount: 1 });
    expect(usage.lastValue).toBe(812);
  });

  it('usage — two readings 6 hours apart — method none (span under a day)', () => {
    const usage = estimateUsage(
      [
        { day: 100.25, value: 812 },
        { day: 100.5, value: 818 },
      ],
      101,
    );
    expect(usage.method).toBe('none');
    expect(usage.rate).toBe(0);
  });
});

describe('usage — trend', () => {
  it('usage — readings out of order — sorted before use (5 h/day)', () => {
    const usage = estimateUsage(
      readingsFrom('2024-01-01', [
        [20, 200],
        [0, 100],
        [10, 150],
      ]),
      dayNumberFromIso('2024-01-21'),
    );
    expect(usage.rate).toBeCloseTo(5, 10);
    expect(usage.lastValue).toBe(200);
  });

  it('usage — idle machine, meter unmoved for 60 days — rate 0, low 0, high 0', () => {
    const usage = estimateUsage(
      readingsFrom('2024-01-01', [
        [0, 740],
        [30, 740],
        [60, 740],
      ]),
      dayNumberFromIso('2024-03-01'),
    );
    expect(usage).toMatchObject({ method: 'trend', rate: 0, low: 0, high: 0 });
  });

  it('usage — no reading in the 90-day window — the last two readings overall (10 h/day)', () => {
    const readings = readingsFrom('2024-01-01', [
      [0, 100],
      [10, 200],
      [20, 300],
    ]);
    const usage = estimateUsage(readings, dayNumberFromIso('2024-01-01') + 200);
    expect(usage.method).toBe('trend');
    expect(usage.readingCount).toBe(2);
    expect(usage.rate).toBeCloseTo(10, 10);
    expect(usage.explanation).toContain('too few');
  });

  it('usage — readings outside the window do not count (window 30 days: 2 h/day, not 10)', () => {
    const readings = readingsFrom('2024-01-01', [
      [0, 0],
      [50, 500],
      [80, 560],
      [100, 600],
    ]);
    const usage = estimateUsage(readings, dayNumberFromIso('2024-01-01') + 100, {
      windowDays: 30,
    });
    expect(usage.readingCount).toBe(2);
    expect(usage.rate).toBeCloseTo(2, 10);
  });

  it('usage — a busy week (10 h/day) then idle weeks — trend falls back toward 0', () => {
    const busyWeek: Array<[number, number]> = Array.from({ length: 8 }, (_, d) => [
      d,
      100 + 10 * d,
    ]);
    const idleWeeks: Array<[number, number]> = Array.from({ length: 8 }, (_, w) => [
      14 + 7 * w,
      170,
    ]);
    const readings = readingsFrom('2024-04-01', [...busyWeek, ...idleWeeks]);
    const start = dayNumberFromIso('2024-04-01');
    const fourWeeksOn = estimateUsage(
      readings.filter((r) => r.day <= start + 35),
      start + 35,
    );
    const eightWeeksOn = estimateUsage(readings, start + 63);
    expect(fourWeeksOn.rate).toBeLessThan(2.5);
    expect(eightWeeksOn.rate).toBeLessThan(fourWeeksOn.rate);
    expect(eightWeeksOn.rate).toBeLessThan(1);
    expect(eightWeeksOn.low).toBe(0);
    // Neither end of the range keeps the busy week's pace.
    expect(eightWeeksOn.high).toBeGreaterThanOrEqual(eightWeeksOn.rate);
    expect(eightWeeksOn.high).toBeLessThan(5);
  });

  it('usage — recent weeks weigh more: a pace that doubled recently lies nearer the new pace', () => {
    // 2 h/day for 60 days, then 4 h/day for 30 days; readings every 10 days.
    const pairs: Array<[number, number]> = [];
    for (let d = 0; d <= 90; d += 10) pairs.push([d, d <= 60 ? 2 * d : 120 + 4 * (d - 60)]);
    const readings = readingsFrom('2024-01-01', pairs);
    const asOf = dayNumberFromIso('2024-01-01') + 90;
    const ols = estimateUsage(readings, asOf, { halfLifeDays: Infinity });
    const weighted = estimateUsage(readings, asOf);
    expect(weighted.rate).toBeGreaterThan(ols.rate);
    expect(weighted.rate).toBeLessThan(4);
    // Percentiles of the interval rates: low 2 h/day, high 4 h/day.
    expect(weighted.low).toBeCloseTo(2, 10);
    expect(weighted.high).toBeCloseTo(4, 10);
  });

  it('usage — weighted slope of an exact line is its slope; equal weights = OLS', () => {
    const points: ReadingPoint[] = [0, 3, 9, 10].map((day) => ({ day, value: 7 + 2.5 * day }));
    expect(weightedSlope(points, [1, 5, 0.1, 2])).toBeCloseTo(2.5, 12);
    // OLS by hand: x̄ = 1, ȳ = 2; Sxy = (−1)(−2)+(0)(1)+(1)(1) = 3; Sxx = 2 → 1.5.
    const scatter: ReadingPoint[] = [
      { day: 0, value: 0 },
      { day: 1, value: 3 },
      { day: 2, value: 3 },
    ];
    expect(weightedSlope(scatter, [1, 1, 1])).toBeCloseTo(1.5, 12);
  });

  it('usage — weighted quantile — 20th/80th of five equal weights are the 1st and 4th values', () => {
    const values = [5, 1, 4, 2, 3];
    const ones = [1, 1, 1, 1, 1];
    expect(weightedQuantile(values, ones, 0.2)).toBe(1);
    expect(weightedQuantile(values, ones, 0.8)).toBe(4);
    expect(weightedQuantile(values, [0, 0, 0, 0, 1], 0.2)).toBe(3);
  });
});

describe("usage — the previous season method (last year's weeks × the 28-day scale; the accuracy benchmark's baseline)", () => {
  it('usage — two years of steady 5 h/day — season method, rate 5, scale 1', () => {
    const readings = seasonalReadings('2024-01-01', '2025-12-31', 7, 0, () => 5);
    const usage = estimateUsage(readings, dayNumberFromIso('2026-01-01'), { method: 'previous' });
    expect(usage.method).toBe('season');
    expect(usage.scale).toBeCloseTo(1, 6);
    expect(usage.rate).toBeCloseTo(5, 6);
    expect(usage.low).toBeCloseTo(4, 6);
    expect(usage.high).toBeCloseTo(6, 6);
    expect(usage.profile).toHaveLength(400);
  });

  it('usage — combine used Aug–Oct only, asOf in May — idle next 30 days, harvest ahead in the profile', () => {
    const readings = seasonalReadings('2024-05-06', '2026-05-04', 7, 1500, (d) =>
      inHarvest(d) ? 4 : 0,
    );
    const asOf = dayNumberFromIso('2026-05-10');
    const usage = estimateUsage(readings, asOf, { method: 'previous' });
    expect(usage.method).toBe('season');
    expect(usage.explanation).toContain('Same weeks last year');
    // Idle spring against idle spring: scale ≈ 1, not 0/0 and not clamped.
    expect(usage.scale).toBeCloseTo(1, 6);
    expect(usage.rate).toBe(0);
    const profile = usage.profile!;
    // Index i = the (i+1)-th day after asOf; 2026-08-15 is 97 days after 2026-05-10.
    const mid = dayNumberFromIso('2026-08-15') - asOf - 1;
    expect(profile[mid]).toBeCloseTo(4, 6);
    expect(profile.slice(0, 60).every((u) => u < 1e-9)).toBe(true);
  });

  it('usage — this spring twice as busy as last spring — scale above 1, clamped at 2', () => {
    // 2 h/day until 2026-01-01, then 8 h/day: the last 28 days compare 8 against 2 (+ c on both).
    const readings = seasonalReadings('2024-06-01', '2026-05-01', 1, 0, (d) =>
      d < dayNumberFromIso('2026-01-01') ? 2 : 8,
    );
    const usage = estimateUsage(readings, dayNumberFromIso('2026-05-01'), { method: 'previous' });
    expect(usage.method).toBe('season');
    expect(usage.scale).toBe(2);
    expect(usage.rate).toBeCloseTo(4, 6); // last year's 2 h/day × 2
    expect(usage.low).toBeCloseTo(2 * 0.8, 6);
    expect(usage.high).toBeCloseTo(2 * 2 * 1.2, 6);
  });

  it('usage — method "trend" requested — no season even with two years of history', () => {
    const readings = seasonalReadings('2024-01-01', '2025-12-31', 7, 0, () => 5);
    const usage = estimateUsage(readings, dayNumberFromIso('2026-01-01'), { method: 'trend' });
    expect(usage.method).toBe('trend');
    expect(usage.rate).toBeCloseTo(5, 6);
  });

  it('usage — 300 days of history — not enough for season, trend instead', () => {
    const readings = seasonalReadings('2025-03-01', '2025-12-26', 7, 0, () => 5);
    expect(estimateUsage(readings, dayNumberFromIso('2025-12-27')).method).toBe('trend');
  });
});
