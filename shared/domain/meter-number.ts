// A meter number as a person types it or a spreadsheet saves it, read the same way by every
// meter field of the client and by both CSV imports. The farm's units decide the decimal mark:
//
//   imperial  decimal point; thousands grouped by "," (or a space) in groups of three
//             3118.5 · 3,118.5 · 12,345,678.25 · 3 118
//   metric    decimal comma; thousands grouped by "." or a space (plain, no-break or narrow
//             no-break) in groups of three: 3118,5 · 3.118,5 · 3 118,5 · 1.234.567
//             A decimal point is read too where it cannot be a thousands mark (3118.5, 0.25,
//             3 118.5); "3.118" could be either and is refused as unclear.
//
// Spaces around the number are ignored. Refused with a reason a person can act on: a mark in the
// wrong place or groups not of three ("3118,5" on an imperial farm, "3,1185", "1,2,3"), a unit
// after the number ("3118 h": the field already names the unit), a sign, and anything that
// JavaScript's Number() would read but nobody types on a meter (1e3, 0x10, Infinity).

import type { UnitSystem } from '../constants';

/** Why a text is not a meter number: `reason` follows the quoted text in a message. */
export type MeterNumberRefusal = {
  ok: false;
  code: 'empty' | 'negative' | 'unit' | 'unclear' | 'decimal-mark' | 'grouping' | 'not-a-number';
  reason: string;
};
export type MeterNumber = { ok: true; value: number } | MeterNumberRefusal;

/** Where the rule comes from, for the reason: "on this farm" (a form) or "in this file" (CSV). */
export interface MeterNumberOptions {
  where?: string;
}

const SPACES = [' ', '\u00A0', '\u202F'];
const GROUP_MARKS: Record<UnitSystem, string[]> = {
  imperial: [',', ...SPACES],
  metric: ['.', ...SPACES],
};
const DECIMAL_MARK: Record<UnitSystem, string> = { imperial: '.', metric: ',' };
const DIGITS = /^\d+$/;
// One group of one to three digits then a point and three: 3.118 is 3118 or 3,118 on a metric farm.
const UNCLEAR_POINT = /^[1-9]\d{0,2}\.\d{3}$/;

/** The digits of a whole number: plain, or groups of three split by one of `marks`; else null. */
function wholeDigits(text: string, marks: readonly string[]): string | null {
  if (DIGITS.test(text)) return text;
  for (const mark of marks) {
    const [first, ...rest] = text.split(mark);
    if (rest.length && /^[1-9]\d{0,2}$/.test(first) && rest.every((g) => /^\d{3}$/.test(g)))
      return first + rest.join('');
  }
  return null;
}

/** `whole` and optional decimals (digits after a single `mark`) as a number; else null. */
function readWithMark(text: string, mark: string, groupMarks: readonly string[]): number | null {
  const parts = text.split(mark);
  if (parts.length > 2) return null;
  const whole = wholeDigits(parts[0], groupMarks);
  const decimals = parts[1];
  if (whole === null || (decimals !== undefined && !DIGITS.test(decimals))) return null;
  return Number(decimals === undefined ? whole : `${whole}.${decimals}`);
}

/** A trimmed text by the farm's rule (a metric farm's unambiguous decimal point included). */
function readNumber(text: string, units: UnitSystem): number | null {
  const value = readWithMark(text, DECIMAL_MARK[units], GROUP_MARKS[units]);
  if (value !== null || units === 'imperial' || text.includes(',')) return value;
  return readWithMark(text, '.', SPACES);
}

/** A number written with the farm's decimal mark and no grouping: 3118.5 or 3118,5. */
const written = (value: number, units: UnitSystem) =>
  units === 'metric' ? String(value).replace('.', ',') : String(value);

/**
 * A typed or imported meter value (any unit: hours, km, bales…) read by the farm's number rule:
 * the number, or why it is not one. See the rules at the top of this file.
 */
export function parseMeterNumber(
  text: string,
  units: UnitSystem,
  options: MeterNumberOptions = {},
): MeterNumber {
  const where = options.where ?? 'on this farm';
  const example = written(1234.5, units);
  const s = text.trim();
  const refuse = (code: MeterNumberRefusal['code'], reason: string): MeterNumberRefusal => ({
    ok: false,
    code,
    reason,
  });
  if (!s) return refuse('empty', `is empty: enter a number like ${example}`);
  if (/^[-\u2212]\s*\d/.test(s))
    return refuse('negative', 'may not be negative: a meter counts up from 0');
  if (units === 'metric' && UNCLEAR_POINT.test(s))
    return refuse(
      'unclear',
      `is unclear ${where}: write ${s.replace('.', '')} without the point, or ${s.replace('.', ',')} for a decimal`,
    );
  const value = readNumber(s, units);
  if (value !== null) return { ok: true, value };
  if (/^[\d.,\s]*\d\s*\p{L}+\.?$/u.test(s))
    return refuse('unit', `must be the number alone, without a unit, like ${example}`);
  if (/^[\d.,\s]+$/.test(s)) {
    const other: UnitSystem = units === 'metric' ? 'imperial' : 'metric';
    const meant = readNumber(s, other);
    const mark = units === 'metric' ? 'a comma' : 'a point';
    if (meant !== null)
      return refuse(
        'decimal-mark',
        `is not a number ${where}: use ${mark} for decimals (${written(meant, units)})`,
      );
    return refuse(
      'grouping',
      units === 'metric'
        ? `is not a number ${where}: use one comma for decimals, and points or spaces only between groups of three digits (12.345,5)`
        : `is not a number ${where}: use one point for decimals, and commas only between groups of three digits (12,345.5)`,
    );
  }
  return refuse('not-a-number', `must be a number like ${example}`);
}

/** The whole message for a refused text: `"3118,5" is not a number on this farm: use a point…`. */
export const meterNumberMessage = (text: string, refusal: MeterNumberRefusal): string =>
  `"${text.trim()}" ${refusal.reason}`;
