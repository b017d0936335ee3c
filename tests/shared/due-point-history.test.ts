// Due points of tasks whose last service is not known: hand-worked examples in the comments.
import { describe, expect, it } from 'vitest';
import { dayNumberFromIso } from '../../shared/domain/calendar';
import { computeDuePoint } from '../../shared/domain/due-point';
import { estimateUsage } from '../../shared/domain/usage';
import { readingsFrom, referenceAddDays, task } from './fixtures';

const asOf = '2025-06-02';
// 4,000 h twenty days ago, 4,210 h today: 10.5 h/day.
const usage = estimateUsage(
  readingsFrom(asOf, [
    [-20, 4000],
    [-10, 4105],
    [0, 4210],
  ]),
  dayNumberFromIso(asOf),
);

describe('due point — history unknown', () => {
  it('due point — used machine, never done, nobody answered — history unknown with no guessed figures', () => {
    // The old assumption would say "due at 4,500 h, 290 h left" for a 500 h interval.
    const due = computeDuePoint(
      task({ intervalMeter: 500, intervalDays: 365, historyUnknown: true }),
      usage,
      asOf,
      4210,
      '2025-05-13',
    );
    expect(due).toMatchObject({
      status: 'history_unknown',
      basis: 'unknown',
      dueMeter: null,
      dueDate: null,
      remainingMeter: null,
      effectiveDate: null,
      governs: null,
    });
  });

  it('due point — history unknown but a last service is recorded — the record counts (recorded)', () => {
    // Last done at 4,000 h: due 4,500 h, 290 h left.
    const due = computeDuePoint(
      task({ intervalMeter: 500, historyUnknown: true, lastDoneMeter: 4000, lastDoneOn: asOf }),
      usage,
      asOf,
      4210,
    );
    expect(due.status).toBe('ok');
    expect(due.dueMeter).toBe(4500);
    expect(due.basis).toBe('recorded');
  });

  it('due point — "start counting from now" at 4,210 h on 2 Jun — due at 4,710 h or a year on (counted)', () => {
    const due = computeDuePoint(
      task({
        intervalMeter: 500,
        intervalDays: 365,
        historyUnknown: true,
        countFromMeter: 4210,
        countFromOn: asOf,
      }),
      usage,
      asOf,
      4210,
    );
    expect(due.dueMeter).toBe(4710);
    expect(due.remainingMeter).toBe(500);
    expect(due.dueDate).toBe(referenceAddDays(asOf, 365));
    expect(due.basis).toBe('counted');
    // 500 h at 10.5 h/day ≈ 48 days: well before the calendar date; outside the 50 h window.
    expect(due.governs).toBe('meter');
    expect(due.status).toBe('ok');
  });

  it('due point — counted from 20 h with a break-in at 50 h — the break-in point still comes first', () => {
    const due = computeDuePoint(
      task({ intervalMeter: 500, firstServiceMeter: 50, countFromMeter: 20, countFromOn: asOf }),
      estimateUsage([], 0),
      asOf,
      20,
    );
    expect(due.dueMeter).toBe(50);
    expect(due.basis).toBe('first_service');
  });

  it('due point — no history flag (a machine tracked since new) — the old assumption stays', () => {
    // Next multiple of 500 at or above 4,210 h: 4,500 h.
    const due = computeDuePoint(task({ intervalMeter: 500 }), usage, asOf, 4210);
    expect(due.dueMeter).toBe(4500);
    expect(due.basis).toBe('assumed');
  });
});
