// computeDuePoint (shared/domain/due-point.ts): the rules of the due point, one at a time, on
// hand-built usage so each figure is worked by hand in the test (dates by date-fns addDays,
// CHECKS.md §3). Warning windows default to 10 % of the interval (the method's choice).
import { describe, expect, it } from 'vitest';
import { computeDuePoint } from '../../shared/domain/due-point';
import { task } from './fixtures';
import { asOf, none, on, trend } from './due-point-rules-fixture';

describe('due point — remaining figures and projections only where they apply', () => {
  it('due point — calendar-only task with a meter reading — no remaining meter, no projection', () => {
    const due = computeDuePoint(
      task({ intervalDays: 365, lastDoneOn: '2024-06-01' }),
      trend(500, 5),
      '2025-01-10',
      500,
    );
    expect(due.remainingMeter).toBeNull();
    expect(due.projectedDate).toBeNull();
    expect(due.projectedLow).toBeNull();
    expect(due.projectedHigh).toBeNull();
    expect(due.status).toBe('ok');
  });

  it('due point — meter task, no reading at all — no remaining meter, no forecast', () => {
    const due = computeDuePoint(
      task({ intervalMeter: 250, lastDoneMeter: 1000 }),
      none,
      asOf,
      null,
    );
    expect(due.remainingMeter).toBeNull();
    expect(due.status).toBe('no_forecast');
  });

  it('due point — a trend estimate without a last value, no current meter — no forecast', () => {
    const usage = { ...trend(0, 5), lastDay: null, lastValue: null };
    const due = computeDuePoint(
      task({ intervalMeter: 250, lastDoneMeter: 1000 }),
      usage,
      asOf,
      null,
    );
    expect(due.status).toBe('no_forecast');
  });
});

describe('due point — which date it falls due', () => {
  it('due point — meter 10 h over, calendar date passed a month ago — effective the calendar date', () => {
    // Done 2025-04-01 at 1,000 h, 250 h or 30 days: due 1,250 h or 2025-05-01.
    const due = computeDuePoint(
      task({ intervalMeter: 250, intervalDays: 30, lastDoneMeter: 1000, lastDoneOn: '2025-04-01' }),
      trend(1260, 5),
      asOf,
      1260,
    );
    expect(due.governs).toBe('meter');
    expect(due.effectiveDate).toBe('2025-05-01');
    expect(due.status).toBe('overdue');
  });

  it('due point — meter 1 h over, calendar date still ahead — effective today', () => {
    const due = computeDuePoint(
      task({
        intervalMeter: 250,
        intervalDays: 365,
        lastDoneMeter: 1000,
        lastDoneOn: '2025-03-01',
      }),
      trend(1251, 5),
      asOf,
      1251,
    );
    expect(due.effectiveDate).toBe(asOf);
    expect(due.projectedDate).toBeNull();
  });

  it('due point — meter and calendar both due in exactly 10 days — the calendar governs', () => {
    // 50 h left at 5 h/day = 10 days (2025-06-12); done 2025-05-23 + 20 days = 2025-06-12.
    const due = computeDuePoint(
      task({ intervalMeter: 250, intervalDays: 20, lastDoneMeter: 1000, lastDoneOn: '2025-05-23' }),
      trend(1200, 5),
      asOf,
      1200,
    );
    expect(due.projectedDate).toBe('2025-06-12');
    expect(due.dueDate).toBe('2025-06-12');
    expect(due.governs).toBe('calendar');
  });
});

describe('due point — warning windows', () => {
  it('due point — warning window given as 0 h, 20 h left — ok (not the default 25 h)', () => {
    const due = computeDuePoint(
      task({ intervalMeter: 250, lastDoneMeter: 1000, warnMeter: 0 }),
      trend(1230, 1),
      asOf,
      1230,
    );
    expect(due.status).toBe('ok');
  });

  it('due point — meter-only task, 30 h left (window 25 h) at 100 h/day — projected today, still ok (no days window)', () => {
    const due = computeDuePoint(
      task({ intervalMeter: 250, lastDoneMeter: 1000, warnMeter: 25 }),
      trend(1220, 100),
      asOf,
      1220,
    );
    expect(due.projectedDate).toBe(asOf);
    expect(due.status).toBe('ok');
  });

  it('due point — calendar interval 0 beside the meter — no days window either: ok', () => {
    const due = computeDuePoint(
      task({ intervalMeter: 250, intervalDays: 0, lastDoneMeter: 1000, warnMeter: 25 }),
      trend(1220, 100),
      asOf,
      1220,
    );
    expect(due.status).toBe('ok');
  });

  it('due point — projected in exactly 10 days with a 10-day window — due soon', () => {
    // 50 h left at 5 h/day; the calendar (365 days) far off; the meter window 25 h not reached.
    const due = computeDuePoint(
      task({
        intervalMeter: 250,
        intervalDays: 365,
        lastDoneMeter: 1000,
        lastDoneOn: '2025-05-01',
        warnMeter: 25,
        warnDays: 10,
      }),
      trend(1200, 5),
      asOf,
      1200,
    );
    expect(due.projectedDate).toBe(on(10));
    expect(due.status).toBe('due_soon');
  });
});
