// CHECKS.md §3, derived, ordinary least squares: the hand-worked forecasting examples.
import { describe, expect, it } from 'vitest';
import { dayNumberFromIso } from '../../shared/domain/calendar';
import { computeDuePoint } from '../../shared/domain/due-point';
import { estimateUsage } from '../../shared/domain/usage';
import { readingsFrom, referenceAddDays, task } from './fixtures';

// Interval 250 h or 180 days; last service at 1,000 h on 2024-03-01 (day 0).
const schedule = task({
  intervalMeter: 250,
  intervalDays: 180,
  lastDoneMeter: 1000,
  lastDoneOn: '2024-03-01',
});
const busy = readingsFrom('2024-03-01', [
  [0, 1000],
  [10, 1052],
  [20, 1098],
  [30, 1151],
  [40, 1199],
]);
const serviceDay = '2024-03-01';
const light = readingsFrom('2024-03-01', [
  [0, 500],
  [30, 520],
  [60, 541],
  [90, 560],
]);
const lightSchedule = { ...schedule, lastDoneMeter: 500 };

describe('CHECKS.md §3, derived, ordinary least squares — 250 h / 180 days', () => {
  const asOfIso = referenceAddDays(serviceDay, 40); // 2024-04-10, the day of the last reading
  const asOfDay = dayNumberFromIso(asOfIso);

  it('usage — OLS (half-life Infinity) — slope 4.97 h/day, range 4.6…5.3 h/day', () => {
    // By hand: x̄ = 20, ȳ = 5,500 / 5 = 1,100; Sxy = (−20)(−100) + (−10)(−48) + 0 + (10)(51) +
    // (20)(99) = 4,970; Sxx = 400 + 100 + 0 + 100 + 400 = 1,000 → slope 4.97 exactly, and
    // intercept 1,100 − 4.97 × 20 = 1,000.6 (CHECKS.md §3). The code projects from the last
    // reading (1,199 h at day 40), not from the intercept: 40 + 51 / 4.97 = 50.26 against the
    // line's 50.18, the same day 50 (2024-04-20, next test).
    const usage = estimateUsage(busy, asOfDay, { halfLifeDays: Infinity });
    expect(usage.method).toBe('trend');
    expect(usage.rate).toBeCloseTo(4.97, 10);
    // Interval rates 5.2, 4.6, 5.3, 4.8 h/day over 10 days each (equal weights): sorted 4.6, 4.8,
    // 5.2, 5.3; the 20th percentile is the first (cumulative 1/4 ≥ 0.2), the 80th the last
    // (3/4 < 0.8), and both lie on either side of the slope.
    expect(usage.low).toBeCloseTo(4.6, 10);
    expect(usage.high).toBeCloseTo(5.3, 10);
    expect(usage.readingCount).toBe(5);
    expect(usage.lastValue).toBe(1199);
  });

  it('due point — 250 h interval, 4.97 h/day — projected 2024-04-20, calendar 2024-08-28, hours govern', () => {
    const usage = estimateUsage(busy, asOfDay, { halfLifeDays: Infinity });
    const due = computeDuePoint(schedule, usage, asOfIso, 1199);
    expect(due.dueMeter).toBe(1250);
    expect(due.projectedDate).toBe('2024-04-20');
    expect(due.dueDate).toBe('2024-08-28');
    expect(due.dueDate).toBe(referenceAddDays('2024-03-01', 180));
    expect(due.governs).toBe('meter');
    expect(due.effectiveDate).toBe('2024-04-20');
    expect(due.remainingMeter).toBe(51);
    expect(due.remainingDays).toBe(140);
    expect(due.basis).toBe('recorded');
    // 10 days ahead, inside the default warning window of 10 % of 180 days = 18 days.
    expect(due.status).toBe('due_soon');
    // Earliest at the high rate: 40 + 51 / 5.3 = 49.62 → day 49; latest at the low rate:
    // 40 + 51 / 4.6 = 51.09 → day 51.
    expect(due.projectedLow).toBe(referenceAddDays(serviceDay, 49));
    expect(due.projectedHigh).toBe(referenceAddDays(serviceDay, 51));
  });

  it('due point — same readings, default recency weighting — the same dates', () => {
    const usage = estimateUsage(busy, asOfDay);
    const due = computeDuePoint(schedule, usage, asOfIso, 1199);
    expect(due.projectedDate).toBe('2024-04-20');
    expect(due.dueDate).toBe('2024-08-28');
    expect(due.governs).toBe('meter');
    expect(due.effectiveDate).toBe('2024-04-20');
  });

  it('due point — light use 0.67 h/day — the 180-day calendar limit governs, due 2024-08-28', () => {
    const lightAsOf = referenceAddDays('2024-03-01', 90);
    const usage = estimateUsage(light, dayNumberFromIso(lightAsOf), { halfLifeDays: Infinity });
    // By hand: x̄ = 45, ȳ = 530.25; Sxy = (−45)(−30.25) + (−15)(−10.25) + (15)(10.75) +
    // (45)(29.75) = 3,015; Sxx = 2,025 + 225 + 225 + 2,025 = 4,500 → 0.67 exactly.
    expect(usage.rate).toBeCloseTo(0.67, 10);
    const due = computeDuePoint(lightSchedule, usage, lightAsOf, 560);
    expect(due.dueMeter).toBe(750);
    // 750 h near day 373 (from the last reading: 90 + 190 / 0.67 = 373.6) → 2025-03-09.
    expect(due.projectedDate).toBe(referenceAddDays('2024-03-01', 373));
    expect(due.governs).toBe('calendar');
    expect(due.effectiveDate).toBe('2024-08-28');
    expect(due.status).toBe('ok');
  });

  it('due point — light use, default recency weighting — calendar still governs, 2024-08-28', () => {
    const lightAsOf = referenceAddDays('2024-03-01', 90);
    const usage = estimateUsage(light, dayNumberFromIso(lightAsOf));
    const due = computeDuePoint(lightSchedule, usage, lightAsOf, 560);
    expect(due.governs).toBe('calendar');
    expect(due.effectiveDate).toBe('2024-08-28');
  });
});
