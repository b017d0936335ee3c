// Due points: hand-worked examples (each computed in its comment) and edge cases.
import { describe, expect, it } from 'vitest';
import { dayNumberFromIso } from '../../shared/domain/calendar';
import { computeDuePoint, projectDateForValue } from '../../shared/domain/due-point';
import { toLifetimeValue } from '../../shared/domain/lifetime';
import { estimateUsage } from '../../shared/domain/usage';
import type { UsageEstimate } from '../../shared/domain/types';
import { readingsFrom, referenceAddDays, task } from './fixtures';

/** A trend estimate of `rate` units/day whose last reading is (asOf, value). */
function steady(asOfIso: string, value: number, rate: number): UsageEstimate {
  const readings = readingsFrom(asOfIso, [
    [-20, value - 20 * rate],
    [-10, value - 10 * rate],
    [0, value],
  ]);
  return estimateUsage(readings, dayNumberFromIso(asOfIso));
}

const none = estimateUsage([], 0);
const asOf = '2025-06-02';

describe('due point — meter', () => {
  it('due point — 250 h interval, 5 h/day — due in 10 days', () => {
    // Last done at 1,000 h; meter now 1,200 h; 50 h left at 5 h/day = 10 days → 2025-06-12.
    const due = computeDuePoint(
      task({ intervalMeter: 250, lastDoneMeter: 1000 }),
      steady(asOf, 1200, 5),
      asOf,
      1200,
    );
    expect(due.dueMeter).toBe(1250);
    expect(due.remainingMeter).toBe(50);
    expect(due.projectedDate).toBe(referenceAddDays(asOf, 10));
    expect(due.governs).toBe('meter');
    expect(due.effectiveDate).toBe('2025-06-12');
    expect(due.remainingDays).toBeNull();
    expect(due.dueDate).toBeNull();
    // 50 h left is above the default warning of 10 % of 250 h = 25 h, and there is no days window.
    expect(due.status).toBe('ok');
  });

  it('due point — 250 h interval, 5 h/day, 20 h left — due soon (inside the 25 h default window)', () => {
    const due = computeDuePoint(
      task({ intervalMeter: 250, lastDoneMeter: 1000 }),
      steady(asOf, 1230, 5),
      asOf,
      1230,
    );
    expect(due.status).toBe('due_soon');
    expect(due.projectedDate).toBe(referenceAddDays(asOf, 4));
  });

  it('due point — reading exactly at the due value — due soon (due now), not overdue', () => {
    const due = computeDuePoint(
      task({ intervalMeter: 250, lastDoneMeter: 1000, warnMeter: 0 }),
      steady(asOf, 1250, 5),
      asOf,
      1250,
    );
    expect(due.remainingMeter).toBe(0);
    expect(due.status).toBe('due_soon');
    expect(due.projectedDate).toBeNull();
    expect(due.governs).toBe('meter');
    expect(due.effectiveDate).toBe(asOf);
  });

  it('due point — meter 1 h past the due value — overdue, decided by the meter', () => {
    const due = computeDuePoint(
      task({
        intervalMeter: 250,
        intervalDays: 365,
        lastDoneMeter: 1000,
        lastDoneOn: '2025-03-01',
      }),
      steady(asOf, 1251, 5),
      asOf,
      1251,
    );
    expect(due.status).toBe('overdue');
    expect(due.remainingMeter).toBe(-1);
    expect(due.projectedDate).toBeNull();
    expect(due.governs).toBe('meter');
  });

  it('due point — first-service point 50 h, never done, 30 h now at 5 h/day — due in 4 days', () => {
    const due = computeDuePoint(
      task({ intervalMeter: 500, firstServiceMeter: 50 }),
      steady(asOf, 30, 5),
      asOf,
      30,
    );
    expect(due.basis).toBe('first_service');
    expect(due.dueMeter).toBe(50);
    expect(due.projectedDate).toBe(referenceAddDays(asOf, 4));
    // 20 h left is inside the default 10 % of 500 h = 50 h.
    expect(due.status).toBe('due_soon');
  });

  it('due point — never done, no first service — assumed at the next multiple at or above the meter', () => {
    const t = task({ intervalMeter: 250 });
    expect(computeDuePoint(t, none, asOf, 510).dueMeter).toBe(750);
    expect(computeDuePoint(t, none, asOf, 500).dueMeter).toBe(500);
    expect(computeDuePoint(t, none, asOf, 0).dueMeter).toBe(250);
    expect(computeDuePoint(t, none, asOf, null).dueMeter).toBe(250);
    expect(computeDuePoint(t, none, asOf, 510).basis).toBe('assumed');
  });

  it('due point — meter-only task, usage none — no forecast', () => {
    const t = task({ intervalMeter: 250, lastDoneMeter: 1000 });
    const due = computeDuePoint(t, estimateUsage([{ day: 20000, value: 1100 }], 20000), asOf, 1100);
    expect(due.status).toBe('no_forecast');
    expect(due.governs).toBeNull();
    expect(due.effectiveDate).toBeNull();
    expect(computeDuePoint(t, none, asOf, null).status).toBe('no_forecast');
  });

  it('due point — meter-only task, idle machine (rate 0) — no forecast: nothing dates it, not "ok"', () => {
    const due = computeDuePoint(
      task({ intervalMeter: 250, lastDoneMeter: 1000 }),
      steady(asOf, 1100, 0),
      asOf,
      1100,
    );
    expect(due.projectedDate).toBeNull();
    expect(due.status).toBe('no_forecast');
  });

  it('due point — 0.05 h/day with 200 h left (11 years) — no projected date beyond 3 years', () => {
    const due = computeDuePoint(
      task({ intervalMeter: 250, lastDoneMeter: 1000 }),
      steady(asOf, 1050, 0.05),
      asOf,
      1050,
    );
    expect(due.projectedDate).toBeNull();
    expect(due.status).toBe('ok');
  });

  it('due point — meter replaced at 4,950 h, new meter from 0 — lifetime values keep the forecast', () => {
    const ms = (iso: string) => Date.parse(`${iso}T12:00:00Z`);
    const replacements = [
      { replacedAtMs: ms('2025-05-13'), oldFinalValue: 4950, newStartValue: 0 },
    ];
    const raw: Array<[string, number, number]> = [
      ['2025-05-03', 4900, 0],
      ['2025-05-13', 4950, -60_000], // the old meter's last reading, a minute before the swap
      ['2025-05-23', 50, 0], // new meter: 5,000 lifetime
      ['2025-06-02', 100, 0], // 5,050 lifetime
    ];
    const readings = raw.map(([iso, value, shiftMs]) => ({
      day: dayNumberFromIso(iso) + 0.5,
      value: toLifetimeValue(value, ms(iso) + shiftMs, replacements),
    }));
    expect(readings.map((r) => r.value)).toEqual([4900, 4950, 5000, 5050]);
    const usage = estimateUsage(readings, dayNumberFromIso(asOf) + 0.5);
    expect(usage.rate).toBeCloseTo(5, 10);
    // Done at 4,900 h lifetime; due 5,150; 100 h from 5,050 at 5 h/day = 20 days.
    const due = computeDuePoint(
      task({ intervalMeter: 250, lastDoneMeter: 4900 }),
      usage,
      asOf,
      5050,
    );
    expect(due.dueMeter).toBe(5150);
    expect(due.projectedDate).toBe(referenceAddDays(asOf, 20));
  });
});

describe('due point — calendar', () => {
  it('due point — calendar-only task, 365 days from 2024-06-01 — ok, calendar governs', () => {
    const due = computeDuePoint(
      task({ intervalDays: 365, lastDoneOn: '2024-06-01' }),
      none,
      '2025-01-10',
      null,
    );
    expect(due.dueDate).toBe('2025-06-01');
    expect(due.dueMeter).toBeNull();
    expect(due.remainingDays).toBe(142);
    expect(due.status).toBe('ok');
    expect(due.governs).toBe('calendar');
    expect(due.effectiveDate).toBe('2025-06-01');
    expect(due.basis).toBe('recorded');
  });

  it('due point — calendar due today — due soon; due yesterday — overdue', () => {
    const t = task({ intervalDays: 30, lastDoneOn: '2025-05-03', warnDays: 0 });
    expect(computeDuePoint(t, none, '2025-06-02', null).status).toBe('due_soon');
    expect(computeDuePoint(t, none, '2025-06-03', null).status).toBe('overdue');
    expect(computeDuePoint(t, none, '2025-06-03', null).remainingDays).toBe(-1);
  });

  it('due point — never done — calendar counted from the machine’s start (assumed)', () => {
    const due = computeDuePoint(task({ intervalDays: 365 }), none, asOf, null, '2025-01-15');
    expect(due.dueDate).toBe('2026-01-15');
    expect(due.basis).toBe('assumed');
    expect(computeDuePoint(task({ intervalDays: 365 }), none, asOf, null).status).toBe(
      'no_forecast',
    );
  });

  it('due point — interval across Feb 29 — same date as date-fns addDays', () => {
    const due = computeDuePoint(
      task({ intervalDays: 180, lastDoneOn: '2023-12-20' }),
      none,
      '2024-01-02',
      null,
    );
    expect(due.dueDate).toBe(referenceAddDays('2023-12-20', 180));
    expect(due.dueDate).toBe('2024-06-17');
    const leap = computeDuePoint(
      task({ intervalDays: 365, lastDoneOn: '2024-02-29' }),
      none,
      '2024-03-02',
      null,
    );
    expect(leap.dueDate).toBe(referenceAddDays('2024-02-29', 365));
  });

  it('due point — calendar inside its default window (10 % of 180 = 18 days) — due soon', () => {
    const t = task({ intervalDays: 180, lastDoneOn: '2025-01-01' }); // due 2025-06-30
    expect(computeDuePoint(t, none, '2025-06-12', null).status).toBe('due_soon');
    expect(computeDuePoint(t, none, '2025-06-11', null).status).toBe('ok');
  });
});

describe('due point — projectDateForValue', () => {
  it('projectDateForValue — last reading 60 days old — never before asOf', () => {
    const usage = steady('2025-04-03', 1000, 5);
    // 1,100 h would be reached 20 days after the last reading, already past by 2025-06-02.
    expect(projectDateForValue(usage, 1100, dayNumberFromIso(asOf), 'point')).toBe(asOf);
  });

  it('projectDateForValue — low variant is the earliest date, high the latest', () => {
    const usage: UsageEstimate = {
      ...steady(asOf, 1000, 5),
      rate: 5,
      low: 4,
      high: 10,
    };
    const day = dayNumberFromIso(asOf);
    expect(projectDateForValue(usage, 1100, day, 'point')).toBe(referenceAddDays(asOf, 20));
    expect(projectDateForValue(usage, 1100, day, 'low')).toBe(referenceAddDays(asOf, 10));
    expect(projectDateForValue(usage, 1100, day, 'high')).toBe(referenceAddDays(asOf, 25));
    expect(projectDateForValue(none, 1100, day, 'point')).toBeNull();
  });
});
