// A measurement against its spec (shared/domain/measurement-spec.ts): the limits are in spec
// (a closed range — common practice in service manuals: "20–60 psi" includes 20 and 60), and a
// measurement outside it is worded as the defect a technician raises in one tap. The figures are
// the issue's own example (12 psi against 20–60) and invented test pressures.
import { describe, expect, it } from 'vitest';
import {
  outOfSpecDefect,
  specRangeWords,
  specStatus,
  testPressureWords,
} from '../../shared/domain/measurement-spec';

describe('out of spec', () => {
  it.each([
    [12, 'low'],
    [19.99, 'low'],
    [20, 'in'],
    [40, 'in'],
    [60, 'in'],
    [60.01, 'high'],
  ] as const)('spec status — %s psi against 20–60 — %s (limits inclusive)', (value, expected) => {
    expect(specStatus(value, 20, 60)).toBe(expected);
  });

  it('spec status — one limit only, or none', () => {
    expect(specStatus(5, 10, null)).toBe('low');
    expect(specStatus(10, 10, null)).toBe('in');
    expect(specStatus(0.3, null, 0.25)).toBe('high');
    expect(specStatus(0.25, null, 0.25)).toBe('in');
    expect(specStatus(42, null, null)).toBeNull();
  });

  it('the defect — 12 psi against 20–60 — names the measurement, the value and the spec', () => {
    const defect = outOfSpecDefect(
      { name: 'Hydraulic charge pressure', value: 12, unit: 'psi', specMin: 20, specMax: 60 },
      { performedOn: '2026-04-02', meterValue: 4210, meterUnit: 'h', conditions: '' },
    );
    expect(defect?.title).toBe('Out of spec: Hydraulic charge pressure 12 psi (spec 20–60 psi)');
    expect(defect?.description).toMatch(
      /^Hydraulic charge pressure measured at the service of 2026-04-02 at 4,210 h: 12 psi, below the spec of 20–60 psi\. /,
    );
  });

  it('the defect — above a maximum, with the test conditions from the sheet', () => {
    const defect = outOfSpecDefect(
      { name: 'PTO clutch pressure', value: 2350, unit: 'kPa', specMin: 2000, specMax: 2200 },
      {
        performedOn: '2026-04-02',
        meterValue: null,
        meterUnit: 'h',
        conditions: 'at 2,100 rpm, oil 50 °C',
      },
    );
    expect(defect?.title).toBe('Out of spec: PTO clutch pressure 2,350 kPa (spec 2,000–2,200 kPa)');
    expect(defect?.description).toContain(
      'above the spec of 2,000–2,200 kPa (at 2,100 rpm, oil 50 °C).',
    );
  });

  it('the defect — a measurement in spec, or without one — none to raise', () => {
    const at = { performedOn: null, meterValue: null, meterUnit: 'h', conditions: '' };
    expect(
      outOfSpecDefect({ name: 'x', value: 20, unit: 'psi', specMin: 20, specMax: 60 }, at),
    ).toBeNull();
    expect(
      outOfSpecDefect({ name: 'x', value: 1, unit: '', specMin: null, specMax: null }, at),
    ).toBeNull();
  });

  it('the defect title — a long name — stays within the 160 characters a defect title holds', () => {
    const defect = outOfSpecDefect(
      { name: 'N'.repeat(80), value: 123456.789, unit: 'U'.repeat(20), specMin: 1, specMax: 2 },
      { performedOn: null, meterValue: null, meterUnit: 'h', conditions: '' },
    );
    expect(defect!.title.length).toBeLessThanOrEqual(160);
  });

  it('a test pressure in words — the range, the engine speed and the oil temperature', () => {
    expect(
      testPressureWords({
        name: 'PTO clutch pressure',
        min: 2000,
        max: 2200,
        unit: 'kPa',
        engineRpm: 2100,
        oilTemperature: { value: 50, unit: 'C' },
        conditions: '',
      }),
    ).toBe('PTO clutch pressure 2,000–2,200 kPa at 2,100 rpm, oil 50 °C');
    expect(specRangeWords(20, null, 'psi')).toBe('at least 20 psi');
    expect(specRangeWords(null, 60, 'psi')).toBe('at most 60 psi');
    expect(specRangeWords(190, 190, 'bar')).toBe('190 bar');
  });
});
