import { describe, expect, it } from 'vitest';
import {
  labourMinor,
  lineMinor,
  minorDigits,
  minorToMajor,
  parseMajorToMinor,
  sumMinor,
} from '../../shared/domain/money';
import { lineCostMinor, recordCosts } from '../../shared/domain/record-costs';

describe('money — minor units of ISO 4217 currencies', () => {
  it('minorDigits — ISO 4217 minor units: USD 2, EUR 2, JPY 0, KWD 3', () => {
    expect(minorDigits('USD')).toBe(2);
    expect(minorDigits('EUR')).toBe(2);
    expect(minorDigits('JPY')).toBe(0);
    expect(minorDigits('KWD')).toBe(3);
  });

  it('minorToMajor — 1250 cents is 12.5 USD; yen have no minor unit; 1234 fils is 1.234 KWD', () => {
    expect(minorToMajor(1250, 'USD')).toBe(12.5);
    expect(minorToMajor(1500, 'JPY')).toBe(1500);
    expect(minorToMajor(1234, 'KWD')).toBe(1.234);
  });

  it('sumMinor — ten lines of 0.10 add to exactly 1.00 (the float sum is 0.9999999999999999)', () => {
    const floatSum = Array.from({ length: 10 }, () => 0.1).reduce((s, x) => s + x, 0);
    expect(floatSum).not.toBe(1);
    expect(sumMinor(Array.from({ length: 10 }, () => 10))).toBe(100);
    expect(sumMinor([])).toBe(0);
  });

  it('lineMinor — quantity × unit price rounds once, half up: 2.5 × 3 = 8, 0.333 × 100 = 33', () => {
    expect(lineMinor(3, 10)).toBe(30);
    expect(lineMinor(2.5, 3)).toBe(8);
    expect(lineMinor(0.333, 100)).toBe(33);
    expect(lineMinor(18, 610)).toBe(10_980);
  });

  it('lineMinor — binary noise is cleared: 1.005 × 100 (100.4999… in floating point) is 101', () => {
    expect(1.005 * 100).toBeLessThan(100.5);
    expect(lineMinor(1.005, 100)).toBe(101);
    expect(lineMinor(0.07, 100)).toBe(7);
  });

  it('labourMinor — 1.75 h at 48.00 an hour is 84.00; 0.5 h at 0.25 is 0.13 (12.5 rounds up)', () => {
    expect(labourMinor(1.75, 4800)).toBe(8400);
    expect(labourMinor(0.5, 25)).toBe(13);
  });
});

describe('money — typed decimal amounts to minor units', () => {
  it('parseMajorToMinor — USD: "12.50" 1250, "12" 1200, "0.10" 10, ".5" 50, "1,204.5" 120450', () => {
    expect(parseMajorToMinor('12.50', 'USD')).toBe(1250);
    expect(parseMajorToMinor('12', 'USD')).toBe(1200);
    expect(parseMajorToMinor('0.10', 'USD')).toBe(10);
    expect(parseMajorToMinor('.5', 'USD')).toBe(50);
    expect(parseMajorToMinor('1,204.5', 'USD')).toBe(120_450);
    expect(parseMajorToMinor(' 12.5 ', 'USD')).toBe(1250);
    expect(parseMajorToMinor('12.', 'USD')).toBe(1200);
  });

  it('parseMajorToMinor — digits are read as text, never through a float: "0.29" is 29, not 28.999…', () => {
    expect(0.29 * 100).not.toBe(29);
    expect(parseMajorToMinor('0.29', 'USD')).toBe(29);
    expect(parseMajorToMinor('1.15', 'USD')).toBe(115);
  });

  it('parseMajorToMinor — empty is null; not an amount is NaN ("abc", "-5", "1.2.3")', () => {
    expect(parseMajorToMinor('', 'USD')).toBeNull();
    expect(parseMajorToMinor('   ', 'USD')).toBeNull();
    expect(parseMajorToMinor('abc', 'USD')).toBeNaN();
    expect(parseMajorToMinor('-5', 'USD')).toBeNaN();
    expect(parseMajorToMinor('1.2.3', 'USD')).toBeNaN();
  });

  it('parseMajorToMinor — more decimals than the currency has stay a fraction, for the whole-number rule', () => {
    expect(parseMajorToMinor('12.345', 'USD')).toBe(1234.5);
    expect(parseMajorToMinor('12.340', 'USD')).toBe(1234);
    expect(parseMajorToMinor('1.5', 'JPY')).toBe(1.5);
    expect(parseMajorToMinor('1500', 'JPY')).toBe(1500);
    expect(parseMajorToMinor('1.234', 'KWD')).toBe(1234);
  });
});

describe('record costs — lines and totals in minor units', () => {
  it('recordCosts — parts of 0.10 and 0.20 total exactly 0.30 (the float sum is 0.30000000000000004)', () => {
    expect(0.1 + 0.2).not.toBe(0.3);
    const costs = recordCosts({
      parts: [
        { quantity: 1, unitCostMinor: 10 },
        { quantity: 1, unitCostMinor: 20 },
      ],
      fluids: [],
      otherCosts: [],
    });
    expect(costs.partsMinor).toBe(30);
    expect(costs.totalMinor).toBe(30);
  });

  it('recordCosts — each line rounds once, totals add the rounded lines; uncosted lines are counted apart', () => {
    const costs = recordCosts({
      parts: [
        { quantity: 2, unitCostMinor: 1840 },
        { quantity: 1, unitCostMinor: null },
      ],
      // 18 L at 6.10 = 109.80; 2.5 L at 0.45 = 1.125 → 1.13
      fluids: [
        { volume: 18, unitCostMinor: 610 },
        { volume: 2.5, unitCostMinor: 45 },
      ],
      otherCosts: [{ amountMinor: 400 }, { amountMinor: 1250 }],
    });
    expect(costs).toEqual({
      partLines: [3680, null],
      fluidLines: [10_980, 113],
      partsMinor: 3680,
      fluidsMinor: 11_093,
      otherMinor: 1650,
      totalMinor: 16_423,
      linesWithoutCost: 1,
    });
  });

  it('lineCostMinor — no unit cost, no line cost', () => {
    expect(lineCostMinor(3, null)).toBeNull();
    expect(lineCostMinor(3, 0)).toBe(0);
  });
});
