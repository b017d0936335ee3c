import { describe, expect, it } from 'vitest';
import { meterNumberMessage, parseMeterNumber } from '../../shared/domain/meter-number';

// The one reader of meter numbers (every meter field of the client, the readings and fleet CSV
// imports). Expectations written by hand from the rules: an imperial farm writes 3,118.5, a metric
// farm 3.118,5 or 3 118,5 (the common European conventions; a decimal point is read on a metric
// farm only where it cannot be a thousands mark).

const ok = (value: number) => ({ ok: true, value });
const GROUPING_IMPERIAL =
  'is not a number on this farm: use one point for decimals, and commas only between groups of three digits (12,345.5)';
const GROUPING_METRIC =
  'is not a number on this farm: use one comma for decimals, and points or spaces only between groups of three digits (12.345,5)';

describe('parseMeterNumber — the issue’s table, imperial farm', () => {
  it.each([
    [
      '3118,5',
      {
        ok: false,
        code: 'decimal-mark',
        reason: 'is not a number on this farm: use a point for decimals (3118.5)',
      },
    ],
    [
      '3.118,5',
      {
        ok: false,
        code: 'decimal-mark',
        reason: 'is not a number on this farm: use a point for decimals (3118.5)',
      },
    ],
    [
      '3 118,5',
      {
        ok: false,
        code: 'decimal-mark',
        reason: 'is not a number on this farm: use a point for decimals (3118.5)',
      },
    ],
    ['3118.5', ok(3118.5)],
    ['3,118.5', ok(3118.5)],
    // a comma then four digits is no thousands group; read as a decimal comma it would be 3.1185
    [
      '3,1185',
      {
        ok: false,
        code: 'decimal-mark',
        reason: 'is not a number on this farm: use a point for decimals (3.1185)',
      },
    ],
    ['1,2,3', { ok: false, code: 'grouping', reason: GROUPING_IMPERIAL }],
    ['', { ok: false, code: 'empty', reason: 'is empty: enter a number like 1234.5' }],
    [' 42 ', ok(42)],
    [
      '-5',
      { ok: false, code: 'negative', reason: 'may not be negative: a meter counts up from 0' },
    ],
    ['1e3', { ok: false, code: 'not-a-number', reason: 'must be a number like 1234.5' }],
    ['0x10', { ok: false, code: 'not-a-number', reason: 'must be a number like 1234.5' }],
    ['Infinity', { ok: false, code: 'not-a-number', reason: 'must be a number like 1234.5' }],
  ] as const)('%j — %j', (text, expected) => {
    expect(parseMeterNumber(text, 'imperial')).toEqual(expected);
  });
});

describe('parseMeterNumber — the issue’s table, metric farm', () => {
  it.each([
    ['3118,5', ok(3118.5)],
    ['3.118,5', ok(3118.5)],
    ['3 118,5', ok(3118.5)],
    // one point and four digits before it: no thousands mark, so a decimal point
    ['3118.5', ok(3118.5)],
    [
      '3,118.5',
      {
        ok: false,
        code: 'decimal-mark',
        reason: 'is not a number on this farm: use a comma for decimals (3118,5)',
      },
    ],
    ['3,1185', ok(3.1185)],
    ['1,2,3', { ok: false, code: 'grouping', reason: GROUPING_METRIC }],
    ['', { ok: false, code: 'empty', reason: 'is empty: enter a number like 1234,5' }],
    [' 42 ', ok(42)],
    [
      '-5',
      { ok: false, code: 'negative', reason: 'may not be negative: a meter counts up from 0' },
    ],
    ['1e3', { ok: false, code: 'not-a-number', reason: 'must be a number like 1234,5' }],
    ['0x10', { ok: false, code: 'not-a-number', reason: 'must be a number like 1234,5' }],
    ['Infinity', { ok: false, code: 'not-a-number', reason: 'must be a number like 1234,5' }],
  ] as const)('%j — %j', (text, expected) => {
    expect(parseMeterNumber(text, 'metric')).toEqual(expected);
  });
});

describe('parseMeterNumber — thousands groups', () => {
  it.each([
    ['12,345,678.25', 'imperial', 12345678.25],
    ['3,118', 'imperial', 3118],
    ['3 118', 'imperial', 3118],
    ['1.234.567', 'metric', 1234567],
    ['12.345.678,25', 'metric', 12345678.25],
    ['3 118', 'metric', 3118],
    ['3\u00A0118,5', 'metric', 3118.5],
    ['3\u202F118,5', 'metric', 3118.5],
    ['1 234 567,5', 'metric', 1234567.5],
    // spaces group a metric farm's digits before a decimal point too
    ['3 118.5', 'metric', 3118.5],
    // a lone comma on a metric farm is the decimal mark, never a thousands group
    ['3,118', 'metric', 3.118],
    ['0,25', 'metric', 0.25],
    ['0', 'imperial', 0],
    ['007', 'imperial', 7],
  ] as const)('%j on a %s farm — %d', (text, units, value) => {
    expect(parseMeterNumber(text, units)).toEqual(ok(value));
  });

  it.each([
    ['3,11,8', 'imperial'],
    ['3,118 500', 'imperial'],
    ['0,118,000', 'imperial'],
    ['31 18', 'imperial'],
    ['3  118', 'metric'],
    ['1.234.5', 'metric'],
    ['3 118.500.1', 'metric'],
    ['3118.', 'imperial'],
    ['.5', 'metric'],
    ['3118,5.0', 'metric'],
    ['3,118,5', 'metric'],
  ] as const)('%j on a %s farm — refused: groups of three, one decimal mark', (text, units) => {
    expect(parseMeterNumber(text, units)).toEqual({
      ok: false,
      code: 'grouping',
      reason: units === 'metric' ? GROUPING_METRIC : GROUPING_IMPERIAL,
    });
  });
});

describe('parseMeterNumber — a metric farm’s decimal point', () => {
  it.each([
    ['0.118', 0.118],
    ['3.1185', 3.1185],
    ['31.18', 31.18],
    ['3118.500', 3118.5],
  ] as const)('%j cannot be a thousands mark — %d', (text, value) => {
    expect(parseMeterNumber(text, 'metric')).toEqual(ok(value));
  });

  it('"3.118" could be 3118 or 3,118 — refused as unclear, both readings offered', () => {
    expect(parseMeterNumber('3.118', 'metric')).toEqual({
      ok: false,
      code: 'unclear',
      reason: 'is unclear on this farm: write 3118 without the point, or 3,118 for a decimal',
    });
    expect(parseMeterNumber(' 312.500 ', 'metric')).toMatchObject({
      code: 'unclear',
      reason: 'is unclear on this farm: write 312500 without the point, or 312,500 for a decimal',
    });
  });

  it('"3.118" on an imperial farm is three point one one eight', () => {
    expect(parseMeterNumber('3.118', 'imperial')).toEqual(ok(3.118));
  });
});

describe('parseMeterNumber — units, signs and what Number() would take', () => {
  it.each([
    ['3118 h', 'imperial', 'must be the number alone, without a unit, like 1234.5'],
    ['3118h', 'metric', 'must be the number alone, without a unit, like 1234,5'],
    ['3 118,5 hrs.', 'metric', 'must be the number alone, without a unit, like 1234,5'],
    ['212,480 km', 'imperial', 'must be the number alone, without a unit, like 1234.5'],
  ] as const)('%j on a %s farm — the unit is refused', (text, units, reason) => {
    expect(parseMeterNumber(text, units)).toEqual({ ok: false, code: 'unit', reason });
  });

  it.each([['- 5'], ['\u22125'], ['-3,118.5']])('%j — negative', (text) => {
    expect(parseMeterNumber(text, 'imperial')).toMatchObject({ code: 'negative' });
  });

  it.each([['+5'], ['abc'], ['h 3118'], ['1_000'], ['NaN'], ['   ']])(
    '%j — not a number',
    (text) => {
      expect(parseMeterNumber(text, 'imperial')).toMatchObject({
        code: text.trim() ? 'not-a-number' : 'empty',
      });
    },
  );
});

describe('parseMeterNumber — where the rule comes from', () => {
  it('a CSV file says "in this file" (a semicolon file reads decimal commas on any farm)', () => {
    expect(parseMeterNumber('3,118.5', 'metric', { where: 'in this file' })).toEqual({
      ok: false,
      code: 'decimal-mark',
      reason: 'is not a number in this file: use a comma for decimals (3118,5)',
    });
    expect(parseMeterNumber('3.118', 'metric', { where: 'in this file' })).toMatchObject({
      reason: 'is unclear in this file: write 3118 without the point, or 3,118 for a decimal',
    });
    expect(parseMeterNumber('1,2,3', 'imperial', { where: 'in this file' })).toMatchObject({
      reason: expect.stringMatching(/^is not a number in this file: /),
    });
  });

  it('meterNumberMessage — the trimmed text quoted, then the reason', () => {
    const refused = parseMeterNumber(' 3118,5 ', 'imperial');
    expect(refused.ok).toBe(false);
    if (!refused.ok)
      expect(meterNumberMessage(' 3118,5 ', refused)).toBe(
        '"3118,5" is not a number on this farm: use a point for decimals (3118.5)',
      );
  });
});
