// Two outcomes across an idle spell (shared/domain/due-outcomes.ts), on a hand-built season:
// 60 working days a year, then 305 idle, repeating. Provenance: derived — the arithmetic is in
// each test (English dates as Intl prints them: "Sept"); the 30-day spell and the 5 % idle share are the method's choices (common practice).
import { describe, expect, it } from 'vitest';
import { addDaysIso } from '../../shared/domain/calendar';
import { computeDuePoint } from '../../shared/domain/due-point';
import { dueSpreadText } from '../../shared/domain/due-words';
import type { UsageEstimate } from '../../shared/domain/types';
import { IDLE_SEASON_AS_OF, idleSeasonUsage, referenceAddDays, task } from './fixtures';

const asOfIso = IDLE_SEASON_AS_OF;
const usage = idleSeasonUsage();

describe('two outcomes — a range across the idle months', () => {
  // 230 h to go. Median 4 h/day: 57.5 days, inside the season. Fast 5 h/day: 46 days. Slow
  // 3 h/day: 180 h by the season's end (day 60), the last 50 h at 3 h/day from day 365: 16.7 days
  // into the next season → day 381.7.
  const due = computeDuePoint(
    task({ intervalMeter: 500, lastDoneMeter: 730 }),
    usage,
    asOfIso,
    1000,
  );

  it('computeDuePoint — 230 h to go — two outcomes, likelier this season', () => {
    expect(due.projectedDate).toBe(referenceAddDays(asOfIso, 57));
    expect(due.projectedLow).toBe(referenceAddDays(asOfIso, 46));
    expect(due.projectedHigh).toBe(referenceAddDays(asOfIso, 381));
    expect(due.outcomes).toEqual({
      thisSeason: { from: referenceAddDays(asOfIso, 46), to: referenceAddDays(asOfIso, 59) },
      nextSeason: { from: referenceAddDays(asOfIso, 365), to: referenceAddDays(asOfIso, 381) },
      likelier: 'this_season',
    });
  });

  it('dueSpreadText — the two outcomes in words, not one stretched band', () => {
    expect(dueSpreadText(due)).toBe(
      'late this season (16 Sept – 29 Sept 2027) or early next (31 Jul – 16 Aug 2028), likelier this season',
    );
  });

  it('dueSpreadText compact — only the other side, for a narrow column beside the likelier date', () => {
    expect(dueSpreadText(due, undefined, { compact: true })).toBe('or early next season');
  });

  it('computeDuePoint — 250 h to go — the median is past the season: likelier next season', () => {
    // Median: 240 h by day 60, the last 10 h at 4 h/day from day 365 → day 367.5.
    const later = computeDuePoint(
      task({ intervalMeter: 500, lastDoneMeter: 750 }),
      usage,
      asOfIso,
      1000,
    );
    expect(later.projectedDate).toBe(addDaysIso(asOfIso, 367));
    expect(later.outcomes?.likelier).toBe('next_season');
  });

  it('computeDuePoint — 100 h to go — the whole range inside the season: one range', () => {
    // 20, 25 and 33.3 days: no idle spell between them.
    const soon = computeDuePoint(
      task({ intervalMeter: 500, lastDoneMeter: 600 }),
      usage,
      asOfIso,
      1000,
    );
    expect(soon.outcomes).toBeUndefined();
    expect(dueSpreadText(soon)).toBe('range 21 Aug – 3 Sept 2027');
  });

  it('computeDuePoint — a trend estimate — never two outcomes', () => {
    const trend: UsageEstimate = { ...usage, method: 'trend', profile: undefined };
    const due2 = computeDuePoint(
      task({ intervalMeter: 500, lastDoneMeter: 730 }),
      trend,
      asOfIso,
      1000,
    );
    expect(due2.outcomes).toBeUndefined();
  });
});
