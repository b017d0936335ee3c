// Miles as a meter unit (issue 11: a US farm's grain truck reads in miles) through the reading
// rules and the due wording. The daily ceiling of 930 mi is the km ceiling (1,500 km a day,
// common practice) in miles: 1,500 ÷ 1.609344 (NIST Handbook 44, Appendix C) = 932.06, rounded
// down. Expected strings are written by hand.
import { describe, expect, it } from 'vitest';
import { METER_UNIT_LABELS, METER_UNITS } from '../../shared/constants';
import {
  checkReading,
  DEFAULT_MAX_PER_DAY,
  fallsDueText,
  fittedMeterText,
  remainingMeterText,
} from '../../shared/domain';

const at = (iso: string) => Date.parse(`${iso}Z`);
const HOUR = 3_600_000;

describe('miles — a meter unit of its own', () => {
  it('"mi" is a meter unit, labelled miles; its daily ceiling is 930 mi (1,500 km ÷ 1.609344 = 932.06, rounded down)', () => {
    expect(METER_UNITS).toContain('mi');
    expect(METER_UNIT_LABELS.mi).toBe('miles');
    expect(DEFAULT_MAX_PER_DAY.mi).toBe(930);
    expect(Math.floor(1500 / 1.609344 / 10) * 10).toBe(DEFAULT_MAX_PER_DAY.mi);
  });

  // A grain truck at 48,200 mi on 2026-09-14 08:00. A day later (24 h, plus the 5 minutes of
  // clock skew allowed): 48,200 + 900 = 49,100 mi is 900 mi/day, under 930 — accepted;
  // 49,200 mi is 1,000 mi/day — refused as too fast, in miles.
  it('reading rules — a grain truck in miles: 900 mi in a day accepted, 1,000 mi in a day refused naming 930 mi per day', () => {
    const opts = { nowMs: at('2026-09-16T12:00'), meterUnit: 'mi' };
    const previous = { value: 48_200, takenAtMs: at('2026-09-14T08:00') };
    const nextDay = previous.takenAtMs + 24 * HOUR;
    expect(checkReading({ value: 49_100, takenAtMs: nextDay }, { previous }, opts)).toBeNull();
    const refused = checkReading({ value: 49_200, takenAtMs: nextDay }, { previous }, opts);
    expect(refused?.rule).toBe('too_fast');
    expect(refused?.message).toContain('Reading 49,200 mi implies 1,000 mi per day');
    expect(refused?.message).toContain('the previous reading of 48,200 mi');
    expect(refused?.message).toContain('more than the 930 mi per day this meter can advance');
  });

  it('reading rules — a miles odometer going backwards is refused in miles', () => {
    const opts = { nowMs: at('2026-09-16T12:00'), meterUnit: 'mi' };
    const previous = { value: 48_200, takenAtMs: at('2026-09-14T08:00') };
    const result = checkReading(
      { value: 48_150, takenAtMs: at('2026-09-15T08:00') },
      { previous },
      opts,
    );
    expect(result?.rule).toBe('backwards');
    expect(result?.message).toMatch(
      /^Reading 48,150 mi is lower than the previous reading of 48,200 mi/,
    );
  });

  it('due wording — 340 mi left, 1,250.5 mi over, due at 60,000 mi, overdue by miles', () => {
    expect(remainingMeterText(340, 'mi')).toBe('340 mi left');
    expect(remainingMeterText(-1250.5, 'mi')).toBe('1,250.5 mi over');
    expect(fittedMeterText(60_000, 60_000, 'mi')).toBe('60,000 mi');
    const overdue = {
      status: 'overdue' as const,
      effectiveDate: null,
      remainingMeter: -75,
      remainingDays: 10,
    };
    expect(fallsDueText(overdue, 'mi')).toBe('overdue — 75 mi over');
  });
});
