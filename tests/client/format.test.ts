// Formatting helpers of the client (src/lib/format.ts). They follow the browser's language; the
// test fixes it to British English (en-GB) by giving Intl that default, so the expected strings
// are that locale's CLDR forms, written by hand. Dates are shown in the organization's zone.
import { afterAll, beforeAll, describe, expect, it, vi } from 'vitest';

type Format = typeof import('../../src/lib/format');
let format: Format;

beforeAll(async () => {
  const { DateTimeFormat, RelativeTimeFormat } = Intl;
  vi.stubGlobal('Intl', {
    ...Intl,
    DateTimeFormat: function (locale: string | undefined, options?: Intl.DateTimeFormatOptions) {
      return new DateTimeFormat(locale ?? 'en-GB', options);
    },
    RelativeTimeFormat: function (
      locale: string | undefined,
      options?: Intl.RelativeTimeFormatOptions,
    ) {
      return new RelativeTimeFormat(locale ?? 'en-GB', options);
    },
  });
  vi.resetModules();
  format = await import('../../src/lib/format');
});

afterAll(() => {
  vi.unstubAllGlobals();
});

describe('format — dates in the organization’s time zone', () => {
  // 04:30 UTC on 8 March 2026 is 22:30 on the 7th in Chicago (CST) and 04:30 in Dublin (GMT).
  const instant = '2026-03-08T04:30:00Z';

  it('formatDate — Chicago — 7 Mar 2026; Dublin — 8 Mar 2026', () => {
    expect(format.formatDate(instant, 'America/Chicago')).toBe('7 Mar 2026');
    expect(format.formatDate(instant, 'Europe/Dublin')).toBe('8 Mar 2026');
  });

  it('formatDateTime — Chicago — 7 Mar 2026, 22:30', () => {
    expect(format.formatDateTime(instant, 'America/Chicago')).toBe('7 Mar 2026, 22:30');
  });
});

describe('format — one date and time style per language (issue 10)', () => {
  // 19:43 UTC on 1 December 2026 is 13:43 in Chicago (CST, UTC−6). Expected strings are CLDR's
  // medium date and short time of each locale, written by hand.
  const instant = '2026-12-01T19:43:00Z';

  it('formatDateTime — en-US — "Dec 1, 2026, 1:43 PM"; en-GB — "1 Dec 2026, 13:43"', () => {
    expect(format.formatDateTime(instant, 'America/Chicago', 'en-US')).toBe('Dec 1, 2026, 1:43 PM');
    expect(format.formatDateTime(instant, 'America/Chicago')).toBe('1 Dec 2026, 13:43');
  });

  it('formatLocalDate — a farm calendar date reads as formatDate does, in each locale', () => {
    expect(format.formatLocalDate('2026-12-01', 'en-US')).toBe('Dec 1, 2026');
    expect(format.formatLocalDate('2026-12-01')).toBe('1 Dec 2026');
    expect(format.formatLocalDate('2026-12-01', 'en-US')).toBe(
      format.formatDate(instant, 'America/Chicago', 'en-US'),
    );
  });

  it('formatLocalDate — a calendar date is that day in any zone (never UTC midnight the day before)', () => {
    expect(format.formatLocalDate('2027-04-29')).toBe('29 Apr 2027');
    expect(format.formatLocalDate('2027-01-01', 'en-US')).toBe('Jan 1, 2027');
  });

  it('formatDayTime — without the year — en-US "Dec 1, 1:43 PM"; en-GB "1 Dec, 13:43"', () => {
    expect(format.formatDayTime(instant, 'America/Chicago', 'en-US')).toBe('Dec 1, 1:43 PM');
    expect(format.formatDayTime(instant, 'America/Chicago')).toBe('1 Dec, 13:43');
  });

  it('formatDateTime — the farm’s zone, not the reader’s: Dublin 19:43, Chicago 13:43', () => {
    expect(format.formatDateTime(instant, 'Europe/Dublin')).toBe('1 Dec 2026, 19:43');
  });
});

describe('format — formatTimeZoneName', () => {
  it('America/Chicago — "Central Time (Chicago)" (CLDR long generic name and the city)', () => {
    expect(format.formatTimeZoneName('America/Chicago', 'en-US')).toBe('Central Time (Chicago)');
  });

  it('America/Argentina/Buenos_Aires — the city with spaces', () => {
    expect(format.formatTimeZoneName('America/Argentina/Buenos_Aires', 'en-US')).toBe(
      'Argentina Standard Time (Buenos Aires)',
    );
  });

  it('UTC — no generic name, so the zone as it is written: "UTC"', () => {
    expect(format.formatTimeZoneName('UTC', 'en-US')).toBe('UTC');
  });

  it('never the database name with its slash', () => {
    for (const zone of ['Europe/Dublin', 'Pacific/Auckland', 'America/Winnipeg']) {
      expect(format.formatTimeZoneName(zone, 'en-GB')).not.toContain('/');
    }
  });
});

describe('format — formatRelative', () => {
  const now = new Date('2026-04-07T12:00:00Z');
  const later = (seconds: number) => new Date(now.getTime() + seconds * 1000).toISOString();

  it.each([
    ['6 days ahead', 'in 6 days', 6 * 86_400],
    ['1 day ahead', 'tomorrow', 86_400],
    // 36 h is 1.5 days: rounded to 2.
    ['36 hours ahead', 'in 2 days', 36 * 3_600],
    ['2 hours back', '2 hours ago', -2 * 3_600],
    ['23 hours ahead (under a day)', 'in 23 hours', 23 * 3_600],
    ['5 minutes ahead', 'in 5 minutes', 5 * 60],
    ['30 seconds ahead', 'in 30 seconds', 30],
    ['the same instant', 'now', 0],
  ])('formatRelative — %s — "%s"', (_name, expected, seconds) => {
    expect(format.formatRelative(later(seconds), now)).toBe(expected);
  });
});

describe('format — labels', () => {
  it('roleLabel — each role by its name on screen', () => {
    expect(format.roleLabel('manager')).toBe('Manager');
    expect(format.roleLabel('technician')).toBe('Technician');
    expect(format.roleLabel('operator')).toBe('Operator');
    expect(format.roleLabel('advisor')).toBe('Service advisor');
  });

  it('membershipLabel — "Larkspur Flats Farm · Manager"', () => {
    expect(
      format.membershipLabel({ role: 'manager', organization: { name: 'Larkspur Flats Farm' } }),
    ).toBe('Larkspur Flats Farm · Manager');
  });
});
