// When a season's plan starts to count, as the Season hours page says it where the plan is
// entered (src/features/season-hours/lib/plan-start.ts). Dates given as ISO to read the rule
// apart from the browser's date format; expected strings written by hand from the README's rule.
import { describe, expect, it } from 'vitest';
import { planStartNote } from '../../src/features/season-hours/lib/plan-start';

const iso = (d: string) => d;

describe('planStartNote — when a plan feeds the forecast, in plain words', () => {
  it('all-year machine, next year planned in autumn — counts only from 1 January', () => {
    expect(planStartNote(2027, [], '2026-10-15', iso)).toBe(
      'This machine works all year, so its season is the calendar year: a 2027 plan counts in ' +
        'its forecast only from 2027-01-01. Until then its due dates go by 2026.',
    );
  });

  it('all twelve months — the same as no months', () => {
    const all = [1, 2, 3, 4, 5, 6, 7, 8, 9, 10, 11, 12];
    expect(planStartNote(2027, all, '2026-10-15', iso)).toContain('only from 2027-01-01');
  });

  it('harvest Aug–Oct planned in September — counts from 1 November, once this harvest is over', () => {
    expect(planStartNote(2027, [8, 9, 10], '2026-09-10', iso)).toBe(
      'A 2027 plan counts in its forecast from 2026-11-01, once the 2026 season is over. Until ' +
        'then its due dates go by the 2026 season.',
    );
  });

  it('a plan that counts already (this year; next year once this season is past) — nothing to say', () => {
    expect(planStartNote(2026, [], '2026-10-15', iso)).toBeNull();
    expect(planStartNote(2027, [8, 9, 10], '2026-11-01', iso)).toBeNull();
    expect(planStartNote(2027, [], '2027-01-01', iso)).toBeNull();
  });
});
