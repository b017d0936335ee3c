// Which meters a counter reset belongs to (shared/domain/meter-kinds.ts). The split is common
// practice, not a published source: a baler's bale counter is zeroed by the operator (per field,
// per customer); engine, separator and PTO hour meters, odometers and area meters run on for the
// machine's life, and a lower figure there is a new meter (a replacement), not a reset.
import { describe, expect, it } from 'vitest';
import { METER_KINDS } from '../../shared/constants';
import { isCountingMeter, isCountingUnit } from '../../shared/domain/meter-kinds';
import { checkReading } from '../../shared/domain/reading-rules';

describe('meter kinds — counting meters', () => {
  it.each([
    ['bales', true],
    ['engine_hours', false],
    ['separator_hours', false],
    ['pto_hours', false],
    ['km', false],
    ['miles', false],
    ['hectares', false],
    ['acres', false],
  ] as const)('counter reset on %s — %s', (kind, expected) => {
    expect(isCountingMeter(kind)).toBe(expected);
  });

  it('every meter kind is decided (a new kind must be added to the table above)', () => {
    expect([...METER_KINDS].sort()).toEqual(
      [
        'acres',
        'bales',
        'engine_hours',
        'hectares',
        'km',
        'miles',
        'pto_hours',
        'separator_hours',
      ].sort(),
    );
  });

  it('units — bales count, hours and km do not', () => {
    expect(isCountingUnit('bales')).toBe(true);
    expect(isCountingUnit('h')).toBe(false);
    expect(isCountingUnit('km')).toBe(false);
  });

  it('a lower reading — the bale counter points at “Counter was reset”, the hour meter only at a replacement', () => {
    const previous = { value: 9950, takenAtMs: Date.parse('2024-03-11T08:00Z') };
    const candidate = { value: 40, takenAtMs: Date.parse('2024-03-12T08:00Z') };
    const nowMs = Date.parse('2024-03-15T08:00Z');
    const bales = checkReading(candidate, { previous }, { nowMs, meterUnit: 'bales' });
    expect(bales?.message).toMatch(/Counter was reset/);
    const hours = checkReading(candidate, { previous }, { nowMs, meterUnit: 'h' });
    expect(hours?.rule).toBe('backwards');
    expect(hours?.message).not.toMatch(/Counter was reset/);
    expect(hours?.message).toMatch(/Record meter replacement/);
  });
});
