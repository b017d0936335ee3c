// Which season a plan feeds (shared/domain/season-use.ts): planYear names the plan the forecast
// takes on a date, planCountsFrom the first date a plan for a year is taken. Provenance: derived —
// the README's rule ("this year's while its season months have not all passed, then next year's; a
// machine without season months: the calendar year"); days walked with date-fns.
import { addDays, format, parseISO } from 'date-fns';
import { describe, expect, it } from 'vitest';
import { planCountsFrom, planYear } from '../../shared/domain/season-use';

const SEASONS: Record<string, number[]> = {
  'all year (no months)': [],
  'harvest Aug–Oct': [8, 9, 10],
  'spring Mar–May': [3, 4, 5],
  'to December Sep–Dec': [9, 10, 11, 12],
};

describe('planCountsFrom — when a plan for a year starts to feed the forecast', () => {
  it('all year — a 2027 plan from 1 January 2027 (the calendar year), never in autumn 2026', () => {
    expect(planCountsFrom(2027, [])).toBe('2027-01-01');
    expect(planYear('2026-12-31', [])).toBe(2026);
    expect(planYear('2027-01-01', [])).toBe(2027);
  });

  it('harvest Aug–Oct — a 2027 plan from 1 November 2026, once the 2026 harvest is over', () => {
    expect(planCountsFrom(2027, [8, 9, 10])).toBe('2026-11-01');
    expect(planYear('2026-10-31', [8, 9, 10])).toBe(2026);
  });

  it.each(Object.entries(SEASONS))(
    '%s — on every day of 2026–2027 planYear is the year whose planCountsFrom is the latest not after it',
    (_name, months) => {
      for (let d = parseISO('2026-01-01'); d < parseISO('2028-01-01'); d = addDays(d, 1)) {
        const iso = format(d, 'yyyy-MM-dd');
        const year = planYear(iso, months);
        expect(planCountsFrom(year, months) <= iso, iso).toBe(true);
        expect(planCountsFrom(year + 1, months) > iso, iso).toBe(true);
      }
    },
  );
});
