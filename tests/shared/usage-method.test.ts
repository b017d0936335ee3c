// The usage methods' details (shared/domain/usage.ts, usage-trend.ts, usage-season.ts), each on
// readings small enough to work by hand in the test. Provenance: derived (arithmetic shown).
import { describe, expect, it } from 'vitest';
import { dayNumberFromIso } from '../../shared/domain/calendar';
import { estimateUsage } from '../../shared/domain/usage';
import { lifetimeValueAt } from '../../shared/domain/usage-season';
import { recencyWeight, weightedQuantile, weightedSlope } from '../../shared/domain/usage-trend';
import { readingsFrom } from './fixtures';

const START = '2024-01-01';
const startDay = dayNumberFromIso(START);

describe('usage — which readings count', () => {
  it('usage — a reading with no day and one with no value — left out: 5 h/day from the other two', () => {
    const usage = estimateUsage(
      [
        { day: Number.NaN, value: 5 },
        { day: startDay, value: 0 },
        { day: startDay + 5, value: Number.NaN },
        { day: startDay + 10, value: 50 },
      ],
      startDay + 10,
    );
    expect(usage.readingCount).toBe(2);
    expect(usage.rate).toBeCloseTo(5, 10);
  });

  it('usage — two readings on the same day, listed higher first — the higher one is the last', () => {
    const usage = estimateUsage(
      [
        { day: startDay + 10, value: 60 },
        { day: startDay + 10, value: 50 },
        { day: startDay, value: 0 },
      ],
      startDay + 10,
    );
    expect(usage.lastValue).toBe(60);
  });

  it('usage — exactly two readings 10 days apart — trend, 5 h/day', () => {
    const usage = estimateUsage(
      readingsFrom(START, [
        [0, 100],
        [10, 150],
      ]),
      startDay + 10,
    );
    expect(usage.method).toBe('trend');
    expect(usage.rate).toBeCloseTo(5, 10);
  });

  it('usage — two readings exactly one day apart — enough: trend, 8 h/day', () => {
    const usage = estimateUsage(
      readingsFrom(START, [
        [0, 100],
        [1, 108],
      ]),
      startDay + 1,
    );
    expect(usage.method).toBe('trend');
    expect(usage.rate).toBeCloseTo(8, 10);
  });

  it('usage — explanations — one reading; two readings six hours apart', () => {
    expect(estimateUsage([{ day: startDay, value: 1 }], startDay).explanation).toBe(
      'Not enough readings yet: two readings at least a day apart are needed',
    );
    expect(
      estimateUsage(
        [
          { day: startDay + 0.25, value: 1 },
          { day: startDay + 0.5, value: 2 },
        ],
        startDay + 1,
      ).explanation,
    ).toBe('Readings span less than a day: too short to estimate use');
  });
});

describe('usage — trend window', () => {
  it('usage — in-window OLS trend — explanation names the count, the window and the weighting', () => {
    const usage = estimateUsage(
      readingsFrom(START, [
        [0, 0],
        [10, 50],
        [20, 100],
      ]),
      startDay + 20,
      { halfLifeDays: Infinity },
    );
    expect(usage.explanation).toBe(
      'Trend of 3 readings over the last 90 days, all readings weighted equally',
    );
  });

  it('usage — default weighting — "recent weeks weighted most"', () => {
    const usage = estimateUsage(
      readingsFrom(START, [
        [0, 0],
        [10, 50],
      ]),
      startDay + 10,
    );
    expect(usage.explanation).toBe(
      'Trend of 2 readings over the last 90 days, recent weeks weighted most',
    );
  });

  it('usage — the window holds two readings 0.2 days apart — reaches back one: 3 readings', () => {
    // Window of 30 days before day 100: the readings of day 99.8 and 100 span less than a day.
    const usage = estimateUsage(
      readingsFrom(START, [
        [0, 0],
        [50, 300],
        [99.8, 400],
        [100, 401],
      ]),
      startDay + 100,
      { windowDays: 30 },
    );
    expect(usage.readingCount).toBe(3);
    expect(usage.explanation).toBe(
      'Trend of the last 3 readings (too few in the last 30 days), recent weeks weighted most',
    );
  });

  it('usage — the window holds two readings exactly a day apart — enough: 2 readings, 10 h/day', () => {
    const usage = estimateUsage(
      readingsFrom(START, [
        [0, 0],
        [99, 300],
        [100, 310],
      ]),
      startDay + 100,
      { windowDays: 30 },
    );
    expect(usage.readingCount).toBe(2);
    expect(usage.rate).toBeCloseTo(10, 10);
  });
});

describe('usage — weighted slope, quantile and recency weight', () => {
  it('weightedSlope — no points, zero weights, or all on one day — 0', () => {
    expect(weightedSlope([], [])).toBe(0);
    const line = [
      { day: 0, value: 0 },
      { day: 10, value: 50 },
    ];
    expect(weightedSlope(line, [0, 0])).toBe(0);
    expect(
      weightedSlope(
        [
          { day: 5, value: 1 },
          { day: 5, value: 9 },
        ],
        [1, 1],
      ),
    ).toBe(0);
  });

  it('weightedQuantile — no values, or only zero weights — 0', () => {
    expect(weightedQuantile([], [], 0.5)).toBe(0);
    expect(weightedQuantile([3, 4], [0, 0], 0.5)).toBe(0);
  });

  it('weightedQuantile — a zero-weight value — never chosen, not even for q = 0', () => {
    expect(weightedQuantile([1, 9], [0, 1], 0)).toBe(9);
  });

  it('weightedQuantile — q above 1 — the largest value', () => {
    expect(weightedQuantile([3, 1, 2], [1, 1, 1], 1.5)).toBe(3);
  });

  it('recencyWeight — 21 days old at a 21-day half-life — ½; 42 days — ¼; in the future — 1', () => {
    expect(recencyWeight(21, 21)).toBeCloseTo(0.5, 12);
    expect(recencyWeight(42, 21)).toBeCloseTo(0.25, 12);
    expect(recencyWeight(-5, 21)).toBe(1);
    expect(recencyWeight(1000, Infinity)).toBe(1);
  });
});

describe('usage — lifetimeValueAt (linear between readings, flat outside)', () => {
  const readings = [
    { day: 0, value: 0 },
    { day: 10, value: 100 },
    { day: 20, value: 150 },
    { day: 40, value: 250 },
  ];
  it.each([
    [-5, 0],
    [0, 0],
    [5, 50],
    [10, 100],
    [15, 125],
    [30, 200],
    [40, 250],
    [50, 250],
  ])('lifetimeValueAt — day %s — %s', (day, value) => {
    expect(lifetimeValueAt(readings, day)).toBeCloseTo(value, 10);
  });
});

describe("usage — the previous season method, details (the accuracy benchmark's baseline)", () => {
  it('usage — idle for 400 days — season, scale 1 (idle against idle), rate 0', () => {
    const usage = estimateUsage(
      readingsFrom(START, [
        [0, 500],
        [400, 500],
      ]),
      startDay + 400,
      { method: 'previous' },
    );
    expect(usage.method).toBe('season');
    expect(usage.scale).toBe(1);
    expect(usage.rate).toBe(0);
  });

  it('usage — the 2-then-4 h/day example starting at 1,000 h — the same scale, 114.14 / 58.14', () => {
    // As in documented-constants.test.ts, shifted by 1,000 h: one average day is still
    // (1,856 − 1,000) / 400 = 2.14, so the scale is still 1.963192.
    const usage = estimateUsage(
      readingsFrom(START, [
        [0, 1000],
        [372, 1744],
        [400, 1856],
      ]),
      startDay + 400,
      { method: 'previous' },
    );
    expect(usage.scale).toBeCloseTo(1.963192, 6);
  });

  it('usage — asOf 10 days after the last reading — the start moves to asOf, carried by last year’s use', () => {
    // Readings (0, 0), (372, 744), (400, 856); asOf day 410. Last year's days 35…45 ran at
    // 2 h/day: 20 h, scaled by 1.963192 → 39.2638 h; the projection starts at (410, 895.2638).
    const usage = estimateUsage(
      readingsFrom(START, [
        [0, 0],
        [372, 744],
        [400, 856],
      ]),
      startDay + 410,
      { method: 'previous' },
    );
    expect(usage.method).toBe('season');
    expect(usage.anchorDay).toBe(startDay + 410);
    expect(usage.anchorValue).toBeCloseTo(856 + 20 * 1.963192, 4);
    expect(usage.lastValue).toBe(856);
  });
});
