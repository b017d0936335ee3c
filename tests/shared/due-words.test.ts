// The one wording of due figures (shared/domain/due-words.ts): the due list, dealer board, shop
// week, machine page and e-mails all say these. Expected strings are written by hand.
import { describe, expect, it } from 'vitest';
import {
  dueRangeText,
  fallsDueText,
  fittedMeterText,
  overText,
  remainingDaysText,
  remainingMeterText,
  remainingText,
} from '../../shared/domain';

describe('due words', () => {
  it('remaining meter — 37.14 h left, 38 h past, exactly at the due meter', () => {
    expect(remainingMeterText(37.14, 'h')).toBe('37.1 h left');
    expect(remainingMeterText(-38, 'h')).toBe('38 h over');
    expect(remainingMeterText(0, 'h')).toBe('due now');
    expect(remainingMeterText(-1250, 'bales')).toBe('1,250 bales over');
  });

  it('remaining days — 12 days past is "over" (never "late"), one day singular, today', () => {
    expect(remainingDaysText(-12)).toBe('12 days over');
    expect(remainingDaysText(1)).toBe('1 day left');
    expect(remainingDaysText(0)).toBe('due today');
  });

  it('both figures — joined with a dot; none — null', () => {
    expect(remainingText({ remainingMeter: -38, remainingDays: 20 }, 'h')).toBe(
      '38 h over · 20 days left',
    );
    expect(remainingText({ remainingMeter: null, remainingDays: null }, 'h')).toBeNull();
  });

  it('how far over — only the figures past due; the meter exactly reached says "due now"', () => {
    expect(overText({ remainingMeter: -38, remainingDays: 20 }, 'h')).toBe('38 h over');
    expect(overText({ remainingMeter: 5, remainingDays: -12 }, 'h')).toBe('12 days over');
    expect(overText({ remainingMeter: 0, remainingDays: null }, 'h')).toBe('due now');
  });

  it('falls due — an overdue task says how far over, whatever date the projection gave', () => {
    const overdue = {
      status: 'overdue' as const,
      effectiveDate: '2026-05-12',
      remainingMeter: -38,
      remainingDays: null,
    };
    expect(fallsDueText(overdue, 'h')).toBe('overdue — 38 h over');
    expect(fallsDueText({ ...overdue, status: 'ok', remainingMeter: 40 }, 'h')).toBe('12 May 2026');
  });

  it('fitted meter — after a replacement the meter fitted now, lifetime in brackets', () => {
    expect(fittedMeterText(234, 1956.3, 'h')).toBe('234 h (1,956.3 h lifetime)');
    expect(fittedMeterText(1956.3, 1956.3, 'h')).toBe('1,956.3 h');
  });

  it('fitted meter — a due value from before the new meter was fitted (−38 on it) is said on the lifetime scale', () => {
    // meter fitted at 1,300 h lifetime reading 0: 1,262 h lifetime would be −38 on it
    expect(fittedMeterText(-38, 1262, 'h')).toBe('1,262 h lifetime (before the meter fitted now)');
  });

  it('range — the year said once within a year; across years both', () => {
    expect(dueRangeText('2026-12-22', '2026-12-29')).toBe('22 Dec – 29 Dec 2026');
    expect(dueRangeText('2026-12-29', '2027-01-14')).toBe('29 Dec 2026 – 14 Jan 2027');
    expect(dueRangeText(null, '2026-12-29')).toBeNull();
  });
});
