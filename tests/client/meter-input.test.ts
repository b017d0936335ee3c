import { describe, expect, it } from 'vitest';
import { meterValueAs, parseMeterInput } from '../../src/lib/meter-input';

// The one reader of typed meter values on the client (Log hours, the machine page's forms, the
// walkaround). A comma is the decimal mark on metric farms and groups thousands on imperial ones.

describe('parseMeterInput — decimal point and decimal comma', () => {
  it.each([
    ['3118', 'imperial', 3118],
    ['3118', 'metric', 3118],
    ['3118.5', 'imperial', 3118.5],
    ['3118.5', 'metric', 3118.5],
    ['3118,5', 'metric', 3118.5],
    ['0,25', 'metric', 0.25],
    ['0', 'imperial', 0],
    [' 3 118,5 ', 'metric', 3118.5],
  ] as const)('%j on a %s farm — %d', (text, units, expected) => {
    expect(parseMeterInput(text, units)).toBe(expected);
  });
});

describe('parseMeterInput — thousands separators', () => {
  it.each([
    ['3,118', 'imperial', 3118],
    ['3,118.5', 'imperial', 3118.5],
    ['12,345,678.25', 'imperial', 12345678.25],
    ['3 118', 'metric', 3118],
    ['3 118', 'imperial', 3118],
    // on a metric farm a lone comma is the decimal mark, never a thousands group
    ['3,118', 'metric', 3.118],
    // an imperial farm's commas are all dropped, grouped or not (the CSV import is stricter)
    ['3118,5', 'imperial', 31185],
  ] as const)('%j on a %s farm — %d', (text, units, expected) => {
    expect(parseMeterInput(text, units)).toBe(expected);
  });
});

describe('parseMeterInput — not a number: NaN, for the schema to name', () => {
  it.each([
    ['', 'imperial'],
    ['   ', 'metric'],
    ['abc', 'imperial'],
    ['-5', 'imperial'],
    ['1e3', 'imperial'],
    ['0x10', 'metric'],
    ['3.118,5', 'metric'],
    ['3,118,5', 'metric'],
    ['3118.', 'imperial'],
    ['.5', 'metric'],
    ['3118 h', 'imperial'],
    ['3118,5.0', 'metric'],
  ] as const)('%j on a %s farm — NaN', (text, units) => {
    expect(parseMeterInput(text, units)).toBeNaN();
  });
});

describe('meterValueAs — the form fields read through the same parser', () => {
  it('empty is undefined (required, said by the schema); text is parsed by the farm’s rule', () => {
    const metric = meterValueAs('metric').setValueAs;
    const imperial = meterValueAs('imperial').setValueAs;
    expect(metric('')).toBeUndefined();
    expect(metric(undefined)).toBeUndefined();
    expect(metric('3118,5')).toBe(3118.5);
    expect(imperial('3,118.5')).toBe(3118.5);
    expect(imperial(3118.5)).toBe(3118.5);
    expect(metric('drei')).toBeNaN();
  });
});
