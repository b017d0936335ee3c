// Farm-local times in a CSV cell (server/infra/csv-sheet.ts parseTakenAt), which convert through
// a per-day offset cache. Hand-worked against the rules of the zones (US: daylight saving from the
// second Sunday of March to the first Sunday of November, 15 U.S.C. 260a — 9 Mar and 2 Nov 2025;
// Ireland: winter time from the last Sunday of October, EU Directive 2000/84/EC — 26 Oct 2025;
// India: UTC+5:30 all year), then against @date-fns/tz's TZDate for random wall times.
import fc from 'fast-check';
import { TZDate } from '@date-fns/tz';
import { describe, expect, it } from 'vitest';
import { parseTakenAt } from '../../server/infra/csv-sheet';

const iso = (cell: string, zone: string, order: 'mdy' | 'dmy' = 'mdy') => {
  const at = parseTakenAt(cell, zone, order);
  return typeof at === 'string' ? at : at.toISOString();
};

describe('CSV local time', () => {
  it.each([
    ['2025-03-08 07:30', 'America/Chicago', '2025-03-08T13:30:00.000Z'], // CST, UTC−6
    ['2025-03-09 07:30', 'America/Chicago', '2025-03-09T12:30:00.000Z'], // change day, CDT
    ['2025-03-10 07:30', 'America/Chicago', '2025-03-10T12:30:00.000Z'], // CDT, UTC−5
    ['2025-11-02 07:30', 'America/Chicago', '2025-11-02T13:30:00.000Z'], // change day, CST
    ['2025-07-01', 'America/Chicago', '2025-07-01T17:00:00.000Z'], // a date alone: midday CDT
    ['07/01/2025 06:00', 'America/Chicago', '2025-07-01T11:00:00.000Z'], // US month first
    ['2025-10-25 12:00', 'Europe/Dublin', '2025-10-25T11:00:00.000Z'], // IST, UTC+1
    ['2025-10-26 12:00', 'Europe/Dublin', '2025-10-26T12:00:00.000Z'], // change day, GMT
    ['2025-01-15 10:00', 'Asia/Kolkata', '2025-01-15T04:30:00.000Z'], // UTC+5:30
  ])('local time — %s in %s is %s', (cell, zone, expected) => {
    expect(iso(cell, zone)).toBe(expected);
  });

  it('local time — 31 February and 24:00 are not dates', () => {
    expect(iso('31/02/2025', 'Europe/Dublin', 'dmy')).toBe('is not a valid date');
    expect(iso('2025-02-31 08:00', 'America/Chicago')).toBe('is not a valid date');
    expect(iso('2025-02-10 24:00', 'America/Chicago')).toBe('is not a valid date');
  });

  it('local time — any wall time in 2020–2030 gives the instant TZDate gives', () => {
    const zones = ['America/Chicago', 'Europe/Dublin', 'Australia/Lord_Howe', 'America/Santiago'];
    fc.assert(
      fc.property(
        fc.constantFrom(...zones),
        fc.record({
          y: fc.integer({ min: 2020, max: 2030 }),
          mo: fc.integer({ min: 1, max: 12 }),
          d: fc.integer({ min: 1, max: 28 }),
          h: fc.integer({ min: 0, max: 23 }),
          mi: fc.integer({ min: 0, max: 59 }),
        }),
        (zone, { y, mo, d, h, mi }) => {
          const two = (n: number) => String(n).padStart(2, '0');
          const cell = `${y}-${two(mo)}-${two(d)} ${two(h)}:${two(mi)}`;
          const expected = new TZDate(y, mo - 1, d, h, mi, 0, zone).getTime();
          expect(iso(cell, zone)).toBe(new Date(expected).toISOString());
        },
      ),
      { numRuns: 2000 },
    );
  });
});
