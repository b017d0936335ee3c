// The stock-unit converter (shared/domain/stock-units.ts) against NIST Handbook 44, Appendix C
// ("General Tables of Units of Measurement"): 1 US gallon = 3.785411784 L, 1 US liquid quart =
// 0.946352946 L, 1 avoirdupois pound = 0.45359237 kg, 1 mile = 1.609344 km — all exact by
// definition. The figures below are written out from the handbook, not taken from the module.
import { describe, expect, it } from 'vitest';
import {
  convertQuantity,
  fromBaseUnit,
  KILOMETRES_PER_MILE,
  knownUnit,
  stockUnitLabel,
  STOCK_UNITS,
  toBaseUnit,
} from '../../shared/domain/stock-units';

describe('stock units — NIST Handbook 44, Appendix C', () => {
  it('1 US gal = 3.785411784 L; 1 US qt = 0.946352946 L; 1 lb = 0.45359237 kg; 1 mi = 1.609344 km', () => {
    expect(toBaseUnit(1, 'gal')).toEqual({ kind: 'volume', base: 3.785411784 });
    expect(toBaseUnit(1, 'qt')).toEqual({ kind: 'volume', base: 0.946352946 });
    expect(toBaseUnit(1, 'lb')).toEqual({ kind: 'mass', base: 0.45359237 });
    expect(KILOMETRES_PER_MILE).toBe(1.609344);
  });

  it('metric prefixes: 1 mL = 0.001 L, 1 g = 0.001 kg (SI)', () => {
    expect(toBaseUnit(250, 'mL')!.base).toBeCloseTo(0.25, 12);
    expect(toBaseUnit(400, 'g')!.base).toBeCloseTo(0.4, 12);
  });

  it('hand-worked: 5 US gal = 5 × 3.785411784 = 18.92705892 L; 38 L = 38 / 3.785411784 = 10.038538 gal', () => {
    expect(convertQuantity(5, 'gal', 'L')).toBeCloseTo(18.92705892, 9);
    expect(convertQuantity(38, 'L', 'gal')).toBeCloseTo(10.038538, 6);
  });

  it('hand-worked: 4 US qt = 1 US gal (4 × 0.946352946 = 3.785411784 L)', () => {
    expect(convertQuantity(4, 'qt', 'gal')).toBeCloseTo(1, 12);
  });

  it('hand-worked: 0.9 lb = 0.9 × 0.45359237 = 0.408233133 kg; 1.1 kg = 1.1 / 0.45359237 = 2.425085 lb', () => {
    expect(convertQuantity(0.9, 'lb', 'kg')).toBeCloseTo(0.408233133, 9);
    expect(convertQuantity(1.1, 'kg', 'lb')).toBeCloseTo(2.425085, 6);
  });

  it('a volume is never turned into a mass (grease in L is not grease in kg): null', () => {
    expect(convertQuantity(1, 'L', 'kg')).toBeNull();
    expect(convertQuantity(1, 'lb', 'gal')).toBeNull();
  });

  it('units not known here (imperial gallon, ounces, tubes) are not guessed at: null', () => {
    for (const unit of ['imp gal', 'oz', 'fl oz', 'tube', ''])
      expect(toBaseUnit(1, unit), unit).toBeNull();
    expect(convertQuantity(1, 'oz', 'lb')).toBeNull();
  });

  it('spellings as typed: "US gal", "Litres", "lbs.", "pcs" are the known units', () => {
    expect(knownUnit('US gal')).toBe('gal');
    expect(knownUnit(' gal  US ')).toBe('gal');
    expect(knownUnit('Litres')).toBe('L');
    expect(knownUnit('lbs.')).toBe('lb');
    expect(knownUnit('pcs')).toBe('each');
    expect(knownUnit('ML')).toBe('mL');
  });

  it('stock units by unit system: metric L, kg; imperial US gal, lb; counts stay counts', () => {
    expect(STOCK_UNITS.metric).toEqual({ volume: 'L', mass: 'kg', count: 'each' });
    expect(STOCK_UNITS.imperial).toEqual({ volume: 'gal', mass: 'lb', count: 'each' });
    expect(fromBaseUnit(3.785411784, 'volume', 'imperial')).toEqual({ quantity: 1, unit: 'gal' });
    expect(fromBaseUnit(0.45359237, 'mass', 'imperial')).toEqual({ quantity: 1, unit: 'lb' });
    expect(fromBaseUnit(3, 'count', 'imperial')).toEqual({ quantity: 3, unit: 'each' });
    expect(stockUnitLabel('gal')).toBe('US gal');
    expect(stockUnitLabel('qt')).toBe('US qt');
    expect(stockUnitLabel('kg')).toBe('kg');
  });
});
