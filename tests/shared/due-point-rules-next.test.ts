// computeDuePoint (shared/domain/due-point.ts): the rules of the due point, one at a time, on
// hand-built usage so each figure is worked by hand in the test (dates by date-fns addDays,
// CHECKS.md §3). Warning windows default to 10 % of the interval (the method's choice).
import { describe, expect, it } from 'vitest';
import { computeDuePoint } from '../../shared/domain/due-point';
import { task } from './fixtures';
import { asOf, none, on, trend } from './due-point-rules-fixture';

describe('due point — intervals that are not intervals', () => {
  it('due point — meter interval 0 — no due meter (not "due at the last service")', () => {
    const due = computeDuePoint(
      task({ intervalMeter: 0, lastDoneMeter: 1000 }),
      trend(1100, 5),
      asOf,
      1100,
    );
    expect(due.dueMeter).toBeNull();
    expect(due.remainingMeter).toBeNull();
  });

  it('due point — calendar interval 0 — no due date', () => {
    const due = computeDuePoint(
      task({ intervalDays: 0, lastDoneOn: '2025-05-01' }),
      none,
      asOf,
      null,
    );
    expect(due.dueDate).toBeNull();
    expect(due.remainingDays).toBeNull();
    expect(due.status).toBe('no_forecast');
  });

  it('due point — no interval at all, a meter and a trend — no forecast, nothing dated', () => {
    const due = computeDuePoint(task(), trend(1100, 5), asOf, 1100);
    expect(due).toEqual({
      status: 'no_forecast',
      governs: null,
      dueMeter: null,
      dueDate: null,
      projectedDate: null,
      projectedLow: null,
      projectedHigh: null,
      effectiveDate: null,
      remainingMeter: null,
      remainingDays: null,
      basis: 'assumed',
    });
  });
});

describe('due point — where the next meter value comes from', () => {
  it('due point — break-in point 0 — not a break-in: the next multiple of 250 above 510 h, 750 h', () => {
    const due = computeDuePoint(
      task({ intervalMeter: 250, firstServiceMeter: 0 }),
      none,
      asOf,
      510,
    );
    expect(due.dueMeter).toBe(750);
    expect(due.basis).toBe('assumed');
  });

  it('due point — a start counted from while a last date is known — the count is not used (4,500 h, not 4,710)', () => {
    const due = computeDuePoint(
      task({ intervalMeter: 500, countFromMeter: 4210, lastDoneOn: '2025-01-01' }),
      none,
      asOf,
      4210,
    );
    expect(due.dueMeter).toBe(4500);
  });

  it('due point — counted from 50 h with the break-in also at 50 h — counted: 50 + 500 = 550 h', () => {
    const due = computeDuePoint(
      task({ intervalMeter: 500, firstServiceMeter: 50, countFromMeter: 50 }),
      none,
      asOf,
      50,
    );
    expect(due.dueMeter).toBe(550);
    expect(due.basis).toBe('counted');
  });

  it('due point — counted from 100 h past a break-in at 50 h — counted: 600 h', () => {
    const due = computeDuePoint(
      task({ intervalMeter: 500, firstServiceMeter: 50, countFromMeter: 100 }),
      none,
      asOf,
      100,
    );
    expect(due.dueMeter).toBe(600);
  });
});

describe('due point — where the next calendar date comes from', () => {
  it('due point — last done by the meter only, a start date to count from — the machine’s start counts, not the count', () => {
    // 365 days from the machine's start 2024-06-01 → 2025-06-01.
    const due = computeDuePoint(
      task({ intervalDays: 365, lastDoneMeter: 100, countFromOn: '2025-01-01' }),
      none,
      asOf,
      null,
      '2024-06-01',
    );
    expect(due.dueDate).toBe('2025-06-01');
  });
});

describe('due point — basis', () => {
  it.each([
    [
      'meter-only, last done recorded',
      task({ intervalMeter: 250, lastDoneMeter: 1000 }),
      'recorded',
    ],
    [
      'meter and calendar, only the meter recorded',
      task({ intervalMeter: 250, intervalDays: 365, lastDoneMeter: 1000 }),
      'assumed',
    ],
    [
      'meter interval, only a date recorded',
      task({ intervalMeter: 250, lastDoneOn: '2025-05-01' }),
      'assumed',
    ],
    [
      'last done by meter, a count-from date beside it',
      task({ intervalMeter: 250, lastDoneMeter: 1000, countFromOn: '2025-01-01' }),
      'recorded',
    ],
  ])('due point — basis — %s — %s', (_name, t, basis) => {
    expect(computeDuePoint(t, none, asOf, 1100).basis).toBe(basis);
  });
});

describe('due point — history unknown, and what answers it', () => {
  it('due point — history unknown, last done by the meter only — the record counts (due 4,500 h)', () => {
    const due = computeDuePoint(
      task({ intervalMeter: 500, historyUnknown: true, lastDoneMeter: 4000 }),
      none,
      asOf,
      4210,
    );
    expect(due.status).not.toBe('history_unknown');
    expect(due.dueMeter).toBe(4500);
  });

  it('due point — history unknown, last done on a date only — the record counts (due 2026-05-01)', () => {
    const due = computeDuePoint(
      task({ intervalDays: 365, historyUnknown: true, lastDoneOn: '2025-05-01' }),
      none,
      asOf,
      null,
    );
    expect(due.dueDate).toBe('2026-05-01');
    expect(due.basis).toBe('recorded');
  });

  it('due point — history unknown, counted from a meter value only — counted (4,210 + 500 = 4,710 h)', () => {
    const due = computeDuePoint(
      task({ intervalMeter: 500, historyUnknown: true, countFromMeter: 4210 }),
      none,
      asOf,
      4210,
    );
    expect(due.dueMeter).toBe(4710);
    expect(due.basis).toBe('counted');
  });

  it('due point — history unknown, counted from a date only — counted (a year on, 2026-06-02)', () => {
    const due = computeDuePoint(
      task({ intervalDays: 365, historyUnknown: true, countFromOn: asOf }),
      none,
      asOf,
      null,
    );
    expect(due.dueDate).toBe(on(365));
    expect(due.basis).toBe('counted');
  });
});
