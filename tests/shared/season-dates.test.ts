// Season dates (shared/domain/season-dates.ts): a machine's season months as seasons, and the due
// date of a pre-season or storage service, against examples worked by hand in the comments (the
// month lengths of the Gregorian calendar; a year divisible by 4 and not by 100 is a leap year).
// Each date is also checked against the reference library (date-fns, CHECKS.md §3).
// The offsets (21 days before, 14 after) are common practice examples, not published figures.
import { describe, expect, it } from 'vitest';
import { seasonRuns, seasonServiceDue, seasonSpans } from '../../shared/domain/season-dates';
import { referenceAddDays } from './fixtures';

const COMBINE = [8, 9, 10]; // harvest August–October
const SPRAYER = [3, 4, 5, 9, 10, 11]; // spring and fall work: two seasons a year
const WINTER = [11, 12, 1, 2]; // a snow-clearing loader, November to February

const done = (lastDoneOn: string) => ({ lastDoneOn, countFrom: '2000-01-01' });
const never = (countFrom: string) => ({ lastDoneOn: null, countFrom });

describe('season runs — consecutive months, wrapping December → January', () => {
  it('season runs — spring and fall months — two runs', () => {
    expect(seasonRuns(SPRAYER)).toEqual([
      [3, 4, 5],
      [9, 10, 11],
    ]);
  });

  it('season runs — November to February, given out of order with a repeat — one winter run', () => {
    expect(seasonRuns([2, 1, 12, 11, 1])).toEqual([[11, 12, 1, 2]]);
  });

  it('season runs — no months, or all twelve — all year: no run', () => {
    expect(seasonRuns([])).toEqual([]);
    expect(seasonRuns([1, 2, 3, 4, 5, 6, 7, 8, 9, 10, 11, 12])).toEqual([]);
  });

  it('season spans — winter season starting Nov 2027 — ends on 29 Feb 2028 (leap year)', () => {
    // 2028 = 4 × 507 and not a century: February has 29 days.
    expect(seasonSpans(WINTER, 2027, 2027)).toEqual([{ start: '2027-11-01', end: '2028-02-29' }]);
    // 2027 is not divisible by 4: February 2027 has 28 days.
    expect(seasonSpans(WINTER, 2026, 2026)).toEqual([{ start: '2026-11-01', end: '2027-02-28' }]);
  });

  it('season spans — one month (July) — 1 Jul to 31 Jul', () => {
    expect(seasonSpans([7], 2026, 2026)).toEqual([{ start: '2026-07-01', end: '2026-07-31' }]);
  });
});

describe('pre-season service — combine, August–October, 21 days before the start', () => {
  // The 2027 season starts 1 Aug 2027; 21 days before: 1 Aug − 1 day = 31 Jul, − 21 days = 11 Jul.
  const due2027 = '2027-07-11';

  it('pre-season — done early, in January 2026 between seasons — covers 2026: due 11 Jul 2027', () => {
    const due = seasonServiceDue(COMBINE, 'before_start', 21, done('2026-01-15'));
    expect(due).toEqual({ dueDate: due2027, season: { start: '2027-08-01', end: '2027-10-31' } });
    expect(referenceAddDays('2027-08-01', -21)).toBe(due2027);
  });

  it('pre-season — done late, 20 Aug 2026 inside the season — covers 2026: due 11 Jul 2027', () => {
    expect(seasonServiceDue(COMBINE, 'before_start', 21, done('2026-08-20'))?.dueDate).toBe(
      due2027,
    );
  });

  it('pre-season — done on time, 10 Jul 2025 — 2026 is next: due 11 Jul 2026', () => {
    expect(seasonServiceDue(COMBINE, 'before_start', 21, done('2025-07-10'))?.dueDate).toBe(
      '2026-07-11',
    );
  });

  it('pre-season — never done, counted from 10 Mar 2026 — the 2026 season: due 11 Jul 2026', () => {
    expect(seasonServiceDue(COMBINE, 'before_start', 21, never('2026-03-10'))?.dueDate).toBe(
      '2026-07-11',
    );
  });

  it('pre-season — never done, counted from 15 Aug 2026 (season under way) — due 11 Jul 2027', () => {
    expect(seasonServiceDue(COMBINE, 'before_start', 21, never('2026-08-15'))?.dueDate).toBe(
      due2027,
    );
  });

  it('pre-season — offset 0 — due on the first day of the season', () => {
    expect(seasonServiceDue(COMBINE, 'before_start', 0, done('2026-01-15'))?.dueDate).toBe(
      '2027-08-01',
    );
  });

  it('pre-season — leap year — 21 days before 1 Mar 2028 is 9 Feb; before 1 Mar 2027, 8 Feb', () => {
    // 1 Mar 2028 − 1 day = 29 Feb, − 21 days = 9 Feb; in 2027 (28 days): 28 Feb − 20 = 8 Feb.
    expect(seasonServiceDue([3, 4], 'before_start', 21, done('2027-04-10'))?.dueDate).toBe(
      '2028-02-09',
    );
    expect(seasonServiceDue([3, 4], 'before_start', 21, done('2026-04-10'))?.dueDate).toBe(
      '2027-02-08',
    );
    expect(referenceAddDays('2028-03-01', -21)).toBe('2028-02-09');
  });
});

describe('storage service — combine, August–October, 14 days after the end', () => {
  // The 2026 season ends 31 Oct 2026; 14 days after: 14 Nov 2026.

  it('storage — done 20 Nov 2025, after the 2025 season — 2026 is due: 14 Nov 2026', () => {
    const due = seasonServiceDue(COMBINE, 'after_end', 14, done('2025-11-20'));
    expect(due).toEqual({
      dueDate: '2026-11-14',
      season: { start: '2026-08-01', end: '2026-10-31' },
    });
    expect(referenceAddDays('2026-10-31', 14)).toBe('2026-11-14');
  });

  it('storage — done 25 Oct 2026, before the season ended — does not cover it: 14 Nov 2026', () => {
    expect(seasonServiceDue(COMBINE, 'after_end', 14, done('2026-10-25'))?.dueDate).toBe(
      '2026-11-14',
    );
  });

  it('storage — never done, counted from 1 Sep 2026 (in season) — 14 Nov 2026', () => {
    expect(seasonServiceDue(COMBINE, 'after_end', 14, never('2026-09-01'))?.dueDate).toBe(
      '2026-11-14',
    );
  });

  it('storage — never done, counted from 5 Nov 2026 (season over) — next season: 14 Nov 2027', () => {
    expect(seasonServiceDue(COMBINE, 'after_end', 14, never('2026-11-05'))?.dueDate).toBe(
      '2027-11-14',
    );
  });
});

describe('season services — two seasons a year (spring Mar–May, fall Sep–Nov)', () => {
  it('pre-season 14 days — done 20 Feb 2026, covers spring — fall is due: 18 Aug 2026', () => {
    // 1 Sep − 1 day = 31 Aug, − 14 days = 18 Aug.
    const due = seasonServiceDue(SPRAYER, 'before_start', 14, done('2026-02-20'));
    expect(due).toEqual({
      dueDate: '2026-08-18',
      season: { start: '2026-09-01', end: '2026-11-30' },
    });
  });

  it('pre-season 14 days — done 1 Jul 2026, covers fall — spring 2027: 15 Feb 2027', () => {
    // 1 Mar 2027 − 1 day = 28 Feb (2027 is not a leap year), − 14 days = 15 Feb.
    expect(seasonServiceDue(SPRAYER, 'before_start', 14, done('2026-07-01'))?.dueDate).toBe(
      '2027-02-15',
    );
    expect(referenceAddDays('2027-03-01', -14)).toBe('2027-02-15');
  });

  it('storage 10 days — done 5 Jun 2026, after spring — fall is due: 10 Dec 2026', () => {
    // Fall ends 30 Nov 2026; + 10 days = 10 Dec.
    expect(seasonServiceDue(SPRAYER, 'after_end', 10, done('2026-06-05'))?.dueDate).toBe(
      '2026-12-10',
    );
  });

  it('storage 10 days — done 2 Dec 2026, after fall — spring 2027 is due: 10 Jun 2027', () => {
    // Spring 2027 ends 31 May 2027; + 10 days = 10 Jun.
    expect(seasonServiceDue(SPRAYER, 'after_end', 10, done('2026-12-02'))?.dueDate).toBe(
      '2027-06-10',
    );
  });
});

describe('season services — a winter season wrapping December → January', () => {
  it('storage 14 days — done 5 Mar 2027 — the 2027–28 winter ends 29 Feb 2028: due 14 Mar 2028', () => {
    // 29 Feb 2028 + 1 day = 1 Mar, + 13 more = 14 Mar.
    expect(seasonServiceDue(WINTER, 'after_end', 14, done('2027-03-05'))?.dueDate).toBe(
      '2028-03-14',
    );
    expect(referenceAddDays('2028-02-29', 14)).toBe('2028-03-14');
  });

  it('storage 14 days — done 20 Jan 2028, inside that winter — the same winter: 14 Mar 2028', () => {
    expect(seasonServiceDue(WINTER, 'after_end', 14, done('2028-01-20'))?.dueDate).toBe(
      '2028-03-14',
    );
  });

  it('pre-season 30 days — done 10 Dec 2027, late inside the winter — next: 2 Oct 2028', () => {
    // The next winter starts 1 Nov 2028; − 1 day = 31 Oct, − 30 days = 2 Oct.
    expect(seasonServiceDue(WINTER, 'before_start', 30, done('2027-12-10'))?.dueDate).toBe(
      '2028-10-02',
    );
  });

  it('pre-season 30 days — done 15 Feb 2028, late in the same winter — still 2 Oct 2028', () => {
    expect(seasonServiceDue(WINTER, 'before_start', 30, done('2028-02-15'))?.dueDate).toBe(
      '2028-10-02',
    );
  });
});

describe('season services — a machine that works all year', () => {
  it('season service — no season months — no season date (null)', () => {
    expect(seasonServiceDue([], 'before_start', 21, done('2026-01-15'))).toBeNull();
    expect(seasonServiceDue([], 'after_end', 14, never('2026-01-15'))).toBeNull();
  });
});
