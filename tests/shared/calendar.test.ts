import { describe, expect, it } from 'vitest';
import {
  addDaysIso,
  dayNumberFromIso,
  daysBetweenIso,
  isoFromDayNumber,
  localDayNumber,
  todayIso,
} from '../../shared/domain/calendar';
import { referenceAddDays } from './fixtures';

describe('calendar — day numbers', () => {
  it('calendar — 1970-01-01 is day 0 and 2024-03-01 is day 19783', () => {
    expect(dayNumberFromIso('1970-01-01')).toBe(0);
    expect(dayNumberFromIso('2024-03-01')).toBe(19783);
    expect(isoFromDayNumber(19783)).toBe('2024-03-01');
  });

  it('calendar — the fraction of a day number is floored away', () => {
    expect(isoFromDayNumber(19783.999)).toBe('2024-03-01');
    expect(isoFromDayNumber(-0.5)).toBe('1969-12-31');
  });

  it('calendar — non-dates are refused', () => {
    expect(() => dayNumberFromIso('2023-02-29')).toThrow(RangeError);
    expect(() => dayNumberFromIso('2024-3-1')).toThrow(RangeError);
    expect(() => localDayNumber('not a time', 'UTC')).toThrow(RangeError);
    expect(() => localDayNumber(new Date(0), 'Mars/Olympus')).toThrow(RangeError);
  });

  it('calendar — local day number carries the local time of day as a fraction', () => {
    // 12:00 UTC on 2026-03-08 is 07:00 CDT (the first day of daylight time in Chicago).
    const day = localDayNumber('2026-03-08T12:00:00Z', 'America/Chicago');
    expect(isoFromDayNumber(day)).toBe('2026-03-08');
    expect(day - dayNumberFromIso('2026-03-08')).toBeCloseTo(7 / 24, 10);
  });

  it('calendar — todayIso follows the organization’s zone, not UTC', () => {
    const instant = new Date('2026-03-08T04:30:00Z'); // 22:30 CST on the 7th, 04:30 GMT in Dublin
    expect(todayIso('America/Chicago', instant)).toBe('2026-03-07');
    expect(todayIso('Europe/Dublin', instant)).toBe('2026-03-08');
  });
});

describe('calendar — 07:00 local is the same fraction on both sides of a DST change', () => {
  // Instants written in UTC by hand from each zone's offset before and after the change.
  const cases = [
    { zone: 'America/Chicago', before: '2026-03-07T13:00:00Z', after: '2026-03-08T12:00:00Z' },
    { zone: 'America/Chicago', before: '2026-10-31T12:00:00Z', after: '2026-11-01T13:00:00Z' },
    { zone: 'Europe/Dublin', before: '2026-03-28T07:00:00Z', after: '2026-03-29T06:00:00Z' },
    { zone: 'Europe/Dublin', before: '2026-10-24T06:00:00Z', after: '2026-10-25T07:00:00Z' },
  ];
  for (const { zone, before, after } of cases) {
    it(`calendar — ${zone} ${after.slice(0, 10)} — exactly one day apart`, () => {
      const a = localDayNumber(before, zone);
      const b = localDayNumber(after, zone);
      expect(b - a).toBeCloseTo(1, 10);
      expect(a - Math.floor(a)).toBeCloseTo(7 / 24, 10);
      expect(isoFromDayNumber(b)).toBe(after.slice(0, 10));
    });
  }
});

describe('calendar — date arithmetic against date-fns addDays (reference library)', () => {
  it('calendar — leap day 2024-02-29 + 365 days is 2025-02-28', () => {
    expect(addDaysIso('2024-02-29', 365)).toBe('2025-02-28');
    expect(addDaysIso('2024-02-29', 365)).toBe(referenceAddDays('2024-02-29', 365));
    expect(daysBetweenIso('2024-02-29', '2025-02-28')).toBe(365);
  });

  it('calendar — an interval across Feb 29 counts the leap day', () => {
    expect(addDaysIso('2024-02-15', 30)).toBe('2024-03-16');
    expect(addDaysIso('2023-02-15', 30)).toBe('2023-03-17');
    expect(addDaysIso('2024-02-15', 30)).toBe(referenceAddDays('2024-02-15', 30));
  });

  it('calendar — every start date of 2024–2026 plus 1, 30, 90, 180, 365 days matches date-fns', () => {
    let mismatches = 0;
    for (
      let day = dayNumberFromIso('2024-01-01');
      day <= dayNumberFromIso('2026-12-31');
      day += 1
    ) {
      const iso = isoFromDayNumber(day);
      for (const n of [1, 30, 90, 180, 365, -30]) {
        if (addDaysIso(iso, n) !== referenceAddDays(iso, n)) mismatches += 1;
        if (daysBetweenIso(iso, addDaysIso(iso, n)) !== n) mismatches += 1;
      }
    }
    expect(mismatches).toBe(0);
  });
});

describe('calendar — precision and refusals', () => {
  it('calendar — local day number keeps minutes, seconds and milliseconds (12:34:56.789 UTC)', () => {
    // 2026-03-08 is day 20520 (2024-03-01 is day 19783; + 365 to 2025-03-01, + 365 to
    // 2026-03-01, + 7); the time of day is (12 × 3600 + 34 × 60 + 56.789) / 86400.
    const expected = 20520 + 45296.789 / 86400;
    expect(localDayNumber('2026-03-08T12:34:56.789Z', 'UTC')).toBeCloseTo(expected, 9);
    expect(localDayNumber(new Date('2026-03-08T12:34:56.789Z'), 'UTC')).toBeCloseTo(expected, 9);
  });

  it('calendar — each refusal says what was wrong', () => {
    expect(() => localDayNumber('not a time', 'UTC')).toThrow('Invalid instant: not a time');
    expect(() => localDayNumber(new Date(0), 'Mars/Olympus')).toThrow(
      'Unknown time zone: Mars/Olympus',
    );
    expect(() => isoFromDayNumber(Number.NaN)).toThrow('Invalid day number: NaN');
    expect(() => dayNumberFromIso('2024-3-1')).toThrow('Not an ISO date (yyyy-mm-dd): 2024-3-1');
    expect(() => dayNumberFromIso('2023-02-29')).toThrow('No such date: 2023-02-29');
  });

  it('calendar — an ISO date with anything before or after it, or month 13 — refused', () => {
    expect(() => dayNumberFromIso('x2024-03-01')).toThrow(RangeError);
    expect(() => dayNumberFromIso('2024-03-01T00:00')).toThrow(RangeError);
    // Month 13 would roll over to 1 January 2025, the same day of the month.
    expect(() => dayNumberFromIso('2024-13-01')).toThrow('No such date: 2024-13-01');
  });
});
