import { describe, expect, it } from 'vitest';
import type { Resolver } from 'react-hook-form';
import {
  meterInputError,
  meterValueAs,
  parseMeterInput,
  RefusedMeterText,
  withMeterReasons,
} from '../../src/lib/meter-input';

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
    // points group a metric farm's thousands, as the CSV import has always read them
    ['3.118,5', 'metric', 3118.5],
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
    // an imperial farm's comma only groups thousands: 3118,5 is refused, not read as 31185
    ['3118,5', 'imperial'],
    ['3,1185', 'imperial'],
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
    expect(metric('drei')).toEqual(new RefusedMeterText('"drei" must be a number like 1234,5'));
  });
});

describe('meterInputError — the reason, as the field shows it', () => {
  it('3118,5 on an imperial farm — use a point; 3,118.5 on a metric farm — use a comma', () => {
    expect(meterInputError('3118,5', 'imperial')).toBe(
      '"3118,5" is not a number on this farm: use a point for decimals (3118.5)',
    );
    expect(meterInputError(' 3,118.5 ', 'metric')).toBe(
      '"3,118.5" is not a number on this farm: use a comma for decimals (3118,5)',
    );
    expect(meterInputError('3118,5', 'metric')).toBeNull();
  });
});

describe('withMeterReasons — a refused meter field shows its reason, not "must be a number"', () => {
  type Values = { value: number; note: string };
  const schemaResolver: Resolver<Values> = async (values) =>
    typeof values.value === 'number'
      ? { values, errors: {} as Record<string, never> }
      : {
          values: {},
          errors: { value: { type: 'invalid_type', message: 'must be a number' } },
        };
  const options = { fields: {}, shouldUseNativeValidation: false };

  it('the reason replaces the schema message; other errors and valid values pass through', async () => {
    const resolver = withMeterReasons(schemaResolver);
    const refused = meterValueAs('imperial').setValueAs('3118,5') as number;
    expect(await resolver({ value: refused, note: '' }, undefined, options)).toEqual({
      values: {},
      errors: {
        value: {
          type: 'meter',
          message: '"3118,5" is not a number on this farm: use a point for decimals (3118.5)',
        },
      },
    });
    expect(await resolver({ value: 3118.5, note: '' }, undefined, options)).toEqual({
      values: { value: 3118.5, note: '' },
      errors: {},
    });
  });
});
