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

  it('usage — OLS (half-life Infinity) — slope 4.97 h/day, intercept 1000.6', () => {
    const usage = estimateUsage(busy, asOfDay, { halfLifeDays: Infinity });
    expect(usage.method).toBe('trend');
    expect(usage.rate).toBeCloseTo(4.97, 2);
    // Intercept at day 0 = weighted mean value − slope × mean day (mean day 20, mean value 1,100).
    const intercept = 1100 - usage.rate * 20;
    expect(intercept).toBeCloseTo(1000.6, 2);
    expect(usage.low).toBeLessThanOrEqual(usage.rate);
    expect(usage.high).toBeGreaterThanOrEqual(usage.rate);
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
    expect(due.projectedLow! <= due.projectedDate!).toBe(true);
    expect(due.projectedHigh! >= due.projectedDate!).toBe(true);
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
    expect(usage.rate).toBeCloseTo(0.67, 2);
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
