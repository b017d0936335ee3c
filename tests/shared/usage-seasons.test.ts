// The season method (shared/domain/usage-seasons.ts, usage-bands.ts, usage-first-year.ts) on
// examples worked by hand here. Provenance: derived — the arithmetic is in each test; the spreads
// (14 days of season start, 0.2 of pace, a pace floor of 0.15) are the method's choices from
// common practice (season starts move one to three weeks with the weather), not published
// figures. Dates are checked against date-fns (referenceAddDays), a general-purpose library.
import { describe, expect, it } from 'vitest';
import { dayNumberFromIso, isoFromDayNumber } from '../../shared/domain/calendar';
import { computeDuePoint, projectDateForValue } from '../../shared/domain/due-point';
import { estimateUsage } from '../../shared/domain/usage';
import { analogSum, analogYears, paceSpread, shiftSpread } from '../../shared/domain/usage-seasons';
import type { ReadingPoint } from '../../shared/domain/types';
import { inHarvest, referenceAddDays, seasonalReadings, task } from './fixtures';

/** Daily readings at noon from startIso to endIso, use(day) units each day. */
function daily(startIso: string, endIso: string, use: (day: number) => number, from = 1000) {
  const points: ReadingPoint[] = [];
  let value = from;
  for (let d = dayNumberFromIso(startIso); d <= dayNumberFromIso(endIso); d++) {
    points.push({ day: d + 0.5, value });
    value += use(d);
  }
  return points;
}

describe('season method — the parts', () => {
  // 729 days of readings: one whole past year before the last
  const steady = seasonalReadings('2024-01-01', '2025-12-30', 1, 0, () => 2);

  it('analogYears — two years of readings — one whole past year, 2 h/day: 730 h, 1,460 over two', () => {
    const years = analogYears(steady);
    expect(years).toHaveLength(1);
    expect(years[0].total).toBeCloseTo(730, 6);
    // the year repeats past its end: two years of it are 1,460 h
    expect(analogSum(years[0], 0, 730)).toBeCloseTo(1460, 6);
  });

  it('spreads — one past year — the priors: 14 days of season start, 0.2 of pace', () => {
    // shift sd = √((0 + 2 × 14²) / (0 + 2)) = 14; pace sd = √((0 + 2 × 0.2²) / (0 + 2)) = 0.2
    const years = analogYears(steady);
    expect(shiftSpread(years)).toBeCloseTo(14, 10);
    expect(paceSpread(years)).toBeCloseTo(0.2, 10);
  });
});

describe('season method — steady use', () => {
  it('usage — two years of steady 5 h/day — rate 5, range 5 × e^(∓0.15·√2)', () => {
    // Every scenario runs at 5 h/day. This year's six weeks match (pace 1); with 210 h seen
    // against 14 days × 5 h of pseudo-use, the pace spread left is 0.2 × √(70 / 280) = 0.1,
    // below the 0.15 floor. The three paces e^(−0.2121), 1, e^(+0.2121) carry ¼, ½, ¼: the 10th
    // percentile is the slow one (5 × 0.80886 = 4.0443), the 90th the fast one (6.1816).
    const readings = seasonalReadings('2024-01-01', '2025-12-31', 7, 0, () => 5);
    const usage = estimateUsage(readings, dayNumberFromIso('2026-01-01'));
    expect(usage.method).toBe('season');
    expect(usage.rate).toBeCloseTo(5, 3);
    expect(usage.low).toBeCloseTo(5 * Math.exp(-0.15 * Math.SQRT2), 3);
    expect(usage.high).toBeCloseTo(5 * Math.exp(0.15 * Math.SQRT2), 3);
  });

  it('projectDateForValue — 50 h ahead at 5 h/day — 10 days after the last reading (date-fns)', () => {
    const readings = daily('2024-01-01', '2025-12-31', () => 5);
    const last = readings[readings.length - 1];
    const usage = estimateUsage(readings, last.day);
    const date = projectDateForValue(usage, last.value + 50, Math.floor(last.day), 'point');
    expect(date).toBe(referenceAddDays('2025-12-31', 10));
  });
});

describe('season method — when the season starts', () => {
  // Last year: harvest 1 Aug – 31 Oct at 4 h/day (the fixture's inHarvest).
  const lastYear = (d: number) => (d < dayNumberFromIso('2026-01-01') && inHarvest(d) ? 4 : 0);

  it('late start — ten days into a harvest 20 days later than last year — weeks away, not a year', () => {
    const start = dayNumberFromIso('2026-08-21');
    const readings = daily(
      '2024-06-01',
      '2026-08-31',
      (d) => lastYear(d) || (d >= start && d <= start + 70 ? 4 : 0),
    );
    const last = readings[readings.length - 1];
    const usage = estimateUsage(readings, last.day);
    expect(usage.explanation).toMatch(/later/);
    // 60 h left at 4 h/day: 15 days after 31 Aug → about 15 Sep.
    const due = computeDuePoint(
      task({ intervalMeter: 250, lastDoneMeter: last.value - 190 }),
      usage,
      '2026-08-31',
      last.value,
    );
    expect(due.projectedDate! >= '2026-09-11' && due.projectedDate! <= '2026-09-19').toBe(true);
    expect(due.projectedHigh! < '2026-11-01').toBe(true);
  });

  it('early start — ten days into a harvest 20 days earlier — the same pace, not twice it', () => {
    const start = dayNumberFromIso('2026-07-12');
    const readings = daily('2024-06-01', '2026-07-22', (d) => lastYear(d) || (d >= start ? 4 : 0));
    const usage = estimateUsage(readings, readings[readings.length - 1].day);
    expect(usage.explanation).toMatch(/earlier/);
    expect(usage.rate).toBeGreaterThan(3.5);
    expect(usage.rate).toBeLessThan(4.5);
  });
});

describe('season method — first year, from the season months', () => {
  // First read 2 March 2026, idle, then 4 h/day from 1 August; season months Aug–Oct entered.
  const use = (d: number) => (d >= dayNumberFromIso('2026-08-01') ? 4 : 0);
  const readings = daily('2026-03-02', '2026-08-20', use);
  const last = readings[readings.length - 1];

  it('usage — 20 days into its first season — the season months and the pace it has shown', () => {
    // 19 days × 4 h on season days (1–19 Aug) = 4 h/day; the stand-in year repeats it to 31 Oct.
    const usage = estimateUsage(readings, last.day, { seasonMonths: [8, 9, 10] });
    expect(usage.method).toBe('season');
    expect(usage.explanation).toMatch(
      /^First year: dated from the season months entered for it \(Aug–Oct\), not yet from a year of its own history; at the pace it has shown in its season so far/,
    );
    expect(usage.rate).toBeCloseTo(4, 0);
    // 40 h left: 10 days after 20 Aug (date-fns), give or take the pace spread
    const date = projectDateForValue(usage, last.value + 40, Math.floor(last.day), 'point');
    const expected = referenceAddDays('2026-08-20', 10);
    expect(Math.abs(dayNumberFromIso(date!) - dayNumberFromIso(expected))).toBeLessThanOrEqual(1);
  });

  it('usage — no season months — the trend, as before', () => {
    expect(estimateUsage(readings, last.day).method).toBe('trend');
  });

  it('usage — before a week of its season is seen — the trend: its pace is not known yet', () => {
    const spring = readings.filter((r) => r.day < dayNumberFromIso('2026-07-15'));
    const usage = estimateUsage(spring, spring[spring.length - 1].day, {
      seasonMonths: [8, 9, 10],
    });
    expect(usage.method).toBe('trend');
  });

  it('usage — a typical pace given — dated from the season months before any season day', () => {
    const spring = readings.filter((r) => r.day < dayNumberFromIso('2026-07-15'));
    const asOf = spring[spring.length - 1].day;
    const usage = estimateUsage(spring, asOf, { seasonMonths: [8, 9, 10], typicalRate: 4 });
    expect(usage.explanation).toMatch(/typical of its class/);
    // 40 h at 4 h/day from 1 August (the median start): about 10 August, in the season months.
    const date = projectDateForValue(usage, spring[spring.length - 1].value + 40, asOf, 'point');
    expect(date! >= '2026-08-01' && date! <= '2026-08-31').toBe(true);
    expect(isoFromDayNumber(Math.floor(asOf))).toBe('2026-07-14');
  });
});
