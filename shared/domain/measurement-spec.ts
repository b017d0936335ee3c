// A measurement against its spec, and the words for both: in or out of the range (the limits
// themselves are in spec), a test pressure with the conditions it holds at, and the defect a
// measurement outside its spec raises in one tap. Numbers are written en-US with grouping
// ("2,000"), as the rest of the product writes them.
import {
  TEMPERATURE_UNIT_LABELS,
  type TemperatureUnit,
  type TestPressureUnit,
} from '../schemas/spec-keys';

export type SpecVerdict = 'in' | 'low' | 'high';

/**
 * In or out of spec: below the minimum is low, above the maximum high, the limits themselves in
 * spec (20 against 20–60 is in); no limit given, null.
 */
export function specStatus(
  value: number,
  specMin: number | null,
  specMax: number | null,
): SpecVerdict | null {
  if (specMin === null && specMax === null) return null;
  if (specMin !== null && value < specMin) return 'low';
  if (specMax !== null && value > specMax) return 'high';
  return 'in';
}

const num = (n: number) => n.toLocaleString('en-US', { maximumFractionDigits: 4 });
const withUnit = (n: number, unit: string) => (unit ? `${num(n)} ${unit}` : num(n));

/** "20–60 psi", "at least 20 psi", "at most 60 psi", "2,100 kPa" (min = max); '' without limits. */
export function specRangeWords(min: number | null, max: number | null, unit: string): string {
  if (min !== null && max !== null)
    return min === max ? withUnit(min, unit) : `${num(min)}–${withUnit(max, unit)}`;
  if (min !== null) return `at least ${withUnit(min, unit)}`;
  if (max !== null) return `at most ${withUnit(max, unit)}`;
  return '';
}

/** A test pressure's conditions as the sheet gives them. */
export interface TestConditions {
  engineRpm: number | null;
  oilTemperature: { value: number; unit: TemperatureUnit } | null;
  conditions: string;
}

/** "at 2,100 rpm, oil 50 °C, PTO engaged": the conditions a figure holds at; '' without any. */
export function testConditionsWords(c: TestConditions): string {
  const parts = [
    c.engineRpm !== null ? `at ${num(c.engineRpm)} rpm` : null,
    c.oilTemperature
      ? `oil ${num(c.oilTemperature.value)} ${TEMPERATURE_UNIT_LABELS[c.oilTemperature.unit]}`
      : null,
    c.conditions || null,
  ].filter((p): p is string => p !== null);
  return parts.join(', ');
}

/** "PTO clutch pressure 2,000–2,200 kPa at 2,100 rpm, oil 50 °C". */
export function testPressureWords(
  t: TestConditions & {
    name: string;
    min: number | null;
    max: number | null;
    unit: TestPressureUnit;
  },
): string {
  const conditions = testConditionsWords(t);
  return [t.name, specRangeWords(t.min, t.max, t.unit), conditions].filter(Boolean).join(' ');
}

export interface OutOfSpecMeasurement {
  name: string;
  value: number;
  unit: string;
  specMin: number | null;
  specMax: number | null;
}

export interface MeasuredAt {
  /** ISO local date of the visit (yyyy-mm-dd), null for a visit not done */
  performedOn: string | null;
  /** the meter at the visit, with its unit ("h", "km") */
  meterValue: number | null;
  meterUnit: string;
  /** the sheet's conditions for this test, in words ('' when none are known) */
  conditions: string;
}

const TITLE_MAX = 160;
const clip = (s: string, max: number) => (s.length <= max ? s : `${s.slice(0, max - 1)}…`);

/**
 * The defect a measurement outside its spec raises: its title names the measurement, the value
 * and the spec; its description when and at what meter it was taken, which way it is out, and
 * the test's conditions. Null for a measurement in spec or without one.
 */
export function outOfSpecDefect(
  m: OutOfSpecMeasurement,
  at: MeasuredAt,
): { title: string; description: string } | null {
  const verdict = specStatus(m.value, m.specMin, m.specMax);
  if (verdict === null || verdict === 'in') return null;
  const value = withUnit(m.value, m.unit);
  const spec = specRangeWords(m.specMin, m.specMax, m.unit);
  const when = [
    at.performedOn ? `at the service of ${at.performedOn}` : 'at a service',
    at.meterValue !== null ? `at ${withUnit(at.meterValue, at.meterUnit)}` : null,
  ]
    .filter(Boolean)
    .join(' ');
  const side = verdict === 'low' ? 'below' : 'above';
  const description = [
    `${m.name} measured ${when}: ${value}, ${side} the spec of ${spec}`,
    at.conditions ? ` (${at.conditions})` : '',
    '. Raised from the service record; check the reading and the test conditions before repair.',
  ].join('');
  return {
    title: clip(`Out of spec: ${m.name} ${value} (spec ${spec})`, TITLE_MAX),
    description: clip(description, 2000),
  };
}
