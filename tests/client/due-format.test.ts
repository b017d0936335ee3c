// The wording of the server's due figures (src/lib/due-format.ts: shared/domain/due-words.ts with
// the browser's number and date formats), used by the due list, dealer board, shop week and machine
// page. Numbers and dates follow the browser's language; the test fixes it to British English
// (en-GB) by giving Intl.NumberFormat and Intl.DateTimeFormat that default, so the expected strings
// are that locale's forms (thousands with a comma, a point before the one decimal, "29 Dec 2026"),
// written by hand from CLDR's en-GB patterns.
import { afterAll, beforeAll, describe, expect, it, vi } from 'vitest';

type DueFormat = typeof import('../../src/lib/due-format');
let due: DueFormat;

beforeAll(async () => {
  const { NumberFormat, DateTimeFormat } = Intl;
  // Intl's members are not enumerable: inherit them all, replacing only NumberFormat.
  vi.stubGlobal(
    'Intl',
    Object.assign(Object.create(Intl) as typeof Intl, {
      NumberFormat: function (locale: string | undefined, options?: Intl.NumberFormatOptions) {
        return new NumberFormat(locale ?? 'en-GB', options);
      },
      DateTimeFormat: function (locale: string | undefined, options?: Intl.DateTimeFormatOptions) {
        return new DateTimeFormat(locale ?? 'en-GB', options);
      },
    }),
  );
  vi.resetModules();
  due = await import('../../src/lib/due-format');
});

afterAll(() => {
  vi.unstubAllGlobals();
});

describe('remainingMeterText', () => {
  it('remainingMeterText — 120 h to the due meter — "120 h left"', () => {
    expect(due.remainingMeterText(120, 'h')).toBe('120 h left');
  });
  it('remainingMeterText — 38 h past the due meter (−38) — "38 h over"', () => {
    expect(due.remainingMeterText(-38, 'h')).toBe('38 h over');
  });
  it('remainingMeterText — exactly at the due meter (0) — "due now"', () => {
    expect(due.remainingMeterText(0, 'h')).toBe('due now');
  });
  it('remainingMeterText — 37.14 h — one decimal: "37.1 h left"', () => {
    expect(due.remainingMeterText(37.14, 'h')).toBe('37.1 h left');
  });
  it('remainingMeterText — 1250 bales past due — grouped: "1,250 bales over"', () => {
    expect(due.remainingMeterText(-1250, 'bales')).toBe('1,250 bales over');
  });
});

describe('remainingDaysText', () => {
  it('remainingDaysText — 39 days to the due date — "39 days left"', () => {
    expect(due.remainingDaysText(39)).toBe('39 days left');
  });
  it('remainingDaysText — one day to go — singular: "1 day left"', () => {
    expect(due.remainingDaysText(1)).toBe('1 day left');
  });
  it('remainingDaysText — 12 days past the due date (−12) — "12 days over"', () => {
    expect(due.remainingDaysText(-12)).toBe('12 days over');
  });
  it('remainingDaysText — one day past (−1) — singular: "1 day over"', () => {
    expect(due.remainingDaysText(-1)).toBe('1 day over');
  });
  it('remainingDaysText — the due date is today (0) — "due today"', () => {
    expect(due.remainingDaysText(0)).toBe('due today');
  });
});

describe('dueDateText', () => {
  it('dueDateText — 2026-12-29 — "29 Dec 2026"', () => {
    expect(due.dueDateText('2026-12-29')).toBe('29 Dec 2026');
  });
  it('dueDateText — 2027-04-01 — no leading zero: "1 Apr 2027"', () => {
    expect(due.dueDateText('2027-04-01')).toBe('1 Apr 2027');
  });
});

describe('remainingText (the machine page schedule says the same as the due list)', () => {
  it('remainingText — 12 days past the due date — "12 days over", never "late"', () => {
    expect(due.remainingText({ remainingMeter: null, remainingDays: -12 }, 'h')).toBe(
      '12 days over',
    );
  });
  it('remainingText — exactly at the due meter and 20 days to the date — "due now · 20 days left"', () => {
    expect(due.remainingText({ remainingMeter: 0, remainingDays: 20 }, 'h')).toBe(
      'due now · 20 days left',
    );
  });
});

describe('dueRangeText', () => {
  it('dueRangeText — both ends in 2026 — the year said once: "22 Dec – 29 Dec 2026"', () => {
    expect(due.dueRangeText('2026-12-22', '2026-12-29')).toBe('22 Dec – 29 Dec 2026');
  });
  it('dueRangeText — across the new year — both years: "29 Dec 2026 – 14 Jan 2027"', () => {
    expect(due.dueRangeText('2026-12-29', '2027-01-14')).toBe('29 Dec 2026 – 14 Jan 2027');
  });
  it('dueRangeText — both ends the same day — one date: "29 Dec 2026"', () => {
    expect(due.dueRangeText('2026-12-29', '2026-12-29')).toBe('29 Dec 2026');
  });
  it('dueRangeText — no range from the server (either end null) — null', () => {
    expect(due.dueRangeText(null, '2026-12-29')).toBeNull();
    expect(due.dueRangeText('2026-12-22', null)).toBeNull();
  });
});
