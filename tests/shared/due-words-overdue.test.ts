// An overdue task says that it is overdue and by how much, never a projection (shared/domain/
// due-words.ts projectionWords / dueSpreadText, used by the due list, the task's details, the
// dealer board, the digest and the dealer's reminder). Like the demo's S-01: a task past its
// calendar date whose meter is projected to reach its due value only in a later season, across
// an idle spell. Provenance: derived — the season is hand-built (60 working days a year at
// 4 h/day, then 305 idle, repeating) and the arithmetic is in each test; dates against date-fns.
import { describe, expect, it } from 'vitest';
import { computeDuePoint } from '../../shared/domain/due-point';
import {
  dueSpreadText,
  fallsDueText,
  projectionSaid,
  projectionWords,
} from '../../shared/domain/due-words';
import { IDLE_SEASON_AS_OF, idleSeasonUsage, referenceAddDays, task } from './fixtures';

const asOfIso = IDLE_SEASON_AS_OF;
const usage = idleSeasonUsage();
// 230 h to go (due at 1,230 h, meter 1,000 h): median 57.5 days, fast 46, slow day 381 — a range
// across the idle months (tests/shared/due-outcomes.test.ts) — and, with a last service on
// 2026-07-20 at a 365-day interval, a calendar limit of 2027-07-20: 12 days past on 1 Aug 2027.
const overdueByDate = computeDuePoint(
  task({ intervalMeter: 500, lastDoneMeter: 730, intervalDays: 365, lastDoneOn: '2026-07-20' }),
  usage,
  asOfIso,
  1000,
);

describe('an overdue task — overdue and by how much, no projection', () => {
  it('computeDuePoint — past its calendar limit by 12 days — overdue, though the meter projection has two outcomes', () => {
    expect(overdueByDate.status).toBe('overdue');
    expect(overdueByDate.remainingDays).toBe(-12);
    expect(overdueByDate.projectedHigh).toBe(referenceAddDays(asOfIso, 381));
    expect(overdueByDate.outcomes).toBeDefined();
  });

  it('projectionWords / dueSpreadText — nothing projected is said; fallsDueText says "overdue — 12 days over"', () => {
    expect(projectionSaid(overdueByDate)).toBe(false);
    expect(projectionWords(overdueByDate, 'h')).toBeNull();
    expect(dueSpreadText(overdueByDate)).toBeNull();
    expect(dueSpreadText(overdueByDate, undefined, { compact: true })).toBeNull();
    expect(fallsDueText(overdueByDate, 'h')).toBe('overdue — 12 days over');
  });

  it('the same task before its limit — the projection, its two outcomes and the likelier side are said', () => {
    // last service 2026-09-01: the limit 2027-09-01 is 31 days off, before the median (57.5
    // days), so the calendar governs; the meter's projection is still said with its outcomes.
    const due = computeDuePoint(
      task({ intervalMeter: 500, lastDoneMeter: 730, intervalDays: 365, lastDoneOn: '2026-09-01' }),
      usage,
      asOfIso,
      1000,
    );
    expect(due.status).not.toBe('overdue');
    expect(projectionWords(due, 'h')).toEqual({
      date: '27 Sept 2027',
      spread:
        'late this season (16 Sept – 29 Sept 2027) or early next (31 Jul – 16 Aug 2028), likelier this season',
      beforePeak: null,
    });
  });

  it('past its meter — overdue by 20 h — no projection: "overdue — 20 h over"', () => {
    const due = computeDuePoint(
      task({ intervalMeter: 500, lastDoneMeter: 480 }),
      usage,
      asOfIso,
      1000,
    );
    expect(due.status).toBe('overdue');
    expect(projectionWords(due, 'h')).toBeNull();
    expect(fallsDueText(due, 'h')).toBe('overdue — 20 h over');
  });
});
