// The parts forecast sums each fluid once, in one stock unit (server/services/fluid-sum.ts via
// sumPartsForecast): grease given in kg on one farm and lb on another is one line. Factors from
// NIST Handbook 44, Appendix C: 1 US gal = 3.785411784 L, 1 lb = 0.45359237 kg (exact).
import { describe, expect, it } from 'vitest';
import { sumPartsForecast, type ForecastService } from '../../server/services/parts-sum';

// Hand-worked example. Two farms, three machines, four due services:
//   Ash   M1  2027-04-01  grease 0.9 lb
//   Ash   M2  2027-04-03  grease 0.9 lb
//   Beech M3  2027-04-02  grease 1.1 kg, hydraulic oil 20 L
//   Beech M3  2027-04-10  hydraulic oil 5 gal, grease 1 tube (a unit the converter does not know)
// Grease by mass: 2 tasks × 0.9 lb = 1.8 lb = 1.8 × 0.45359237 = 0.816466266 kg;
//   + 1.1 kg = 1.916466266 kg → 1.916 kg (metric); 1.916466266 / 0.45359237 = 4.225084884 lb
//   → 4.225 lb (imperial); on 3 machines, 3 services, first 2027-04-01.
// Hydraulic oil: 20 L + 5 × 3.785411784 L = 20 + 18.92705892 = 38.92705892 L → 38.927 L;
//   in US gal: 38.92705892 / 3.785411784 = 5.283441047 + 5 = 10.283441047 → 10.283 gal.
// The 1 tube of grease stays its own line: 1 tube, not converted.
// Ash alone: grease 0.816466266 kg → 0.816 kg, or 1.8 lb. Beech alone: grease 1.1 kg, hydraulic
// oil 38.927 L, the tube.
const ash = { id: 'a', name: 'Ash Farm' };
const beech = { id: 'b', name: 'Beech Farm' };
const machine = (id: string) => ({ id, fleetNumber: id, name: `Machine ${id}` });
const grease = (volume: number, unit: string) => ({ kind: 'Grease EP2', volume, unit });
const services: ForecastService[] = [
  {
    customer: ash,
    machine: machine('M1'),
    neededOn: '2027-04-01',
    parts: [],
    fluids: [grease(0.9, 'lb')],
  },
  {
    customer: ash,
    machine: machine('M2'),
    neededOn: '2027-04-03',
    parts: [],
    fluids: [grease(0.9, 'lb')],
  },
  {
    customer: beech,
    machine: machine('M3'),
    neededOn: '2027-04-02',
    parts: [],
    fluids: [grease(1.1, 'kg'), { kind: 'Hydraulic oil', volume: 20, unit: 'L' }],
  },
  {
    customer: beech,
    machine: machine('M3'),
    neededOn: '2027-04-10',
    parts: [],
    fluids: [{ kind: 'hydraulic oil', volume: 5, unit: 'gal' }, grease(1, 'tube')],
  },
];

const line = (fluids: ReturnType<typeof sumPartsForecast>['fluids'], kind: string, unit: string) =>
  fluids.filter((f) => f.kind.toLowerCase() === kind.toLowerCase() && f.unit === unit);

describe('parts forecast — one stock unit per fluid (NIST Handbook 44 factors)', () => {
  it('metric dealer — grease 2 × 0.9 lb + 1.1 kg is one line of 1.916 kg; hydraulic oil 20 L + 5 US gal = 38.927 L', () => {
    const { fluids } = sumPartsForecast(services, 'metric');
    expect(line(fluids, 'Grease EP2', 'kg')).toEqual([
      {
        kind: 'Grease EP2',
        unit: 'kg',
        volume: 1.916,
        converted: true,
        summedFrom: ['kg', 'lb'],
        machines: 3,
        services: 3,
        firstNeededOn: '2027-04-01',
      },
    ]);
    expect(line(fluids, 'Grease EP2', 'lb')).toEqual([]); // grease appears once, not in lb too
    expect(line(fluids, 'Hydraulic oil', 'L')).toEqual([
      expect.objectContaining({
        volume: 38.927,
        summedFrom: ['L', 'gal'],
        machines: 1,
        services: 2,
      }),
    ]);
    expect(line(fluids, 'Hydraulic oil', 'gal')).toEqual([]);
  });

  it('imperial dealer — the same services in US gal and lb: 4.225 lb of grease, 10.283 gal of hydraulic oil', () => {
    const { fluids } = sumPartsForecast(services, 'imperial');
    expect(line(fluids, 'Grease EP2', 'lb')).toEqual([
      expect.objectContaining({ volume: 4.225, converted: true, machines: 3 }),
    ]);
    expect(line(fluids, 'Hydraulic oil', 'gal')).toEqual([
      expect.objectContaining({ volume: 10.283, converted: true }),
    ]);
    expect(fluids.map((f) => f.unit).sort()).toEqual(['gal', 'lb', 'tube']);
  });

  it('a unit the converter does not know — the tube of grease — stays its own line, never summed into kg', () => {
    const { fluids } = sumPartsForecast(services, 'metric');
    expect(line(fluids, 'Grease EP2', 'tube')).toEqual([
      {
        kind: 'Grease EP2',
        unit: 'tube',
        volume: 1,
        converted: false,
        summedFrom: ['tube'],
        machines: 1,
        services: 1,
        firstNeededOn: '2027-04-10',
      },
    ]);
    expect(fluids).toHaveLength(3);
  });

  it('per customer — Ash: 1.8 lb = 0.816 kg of grease; Beech: 1.1 kg, 38.927 L and the tube', () => {
    const [a, b] = sumPartsForecast(services, 'metric').customers;
    expect(a.customer.name).toBe('Ash Farm');
    expect(a.fluids.map((f) => [f.kind, f.unit, f.volume])).toEqual([['Grease EP2', 'kg', 0.816]]);
    expect(b.fluids.map((f) => [f.kind, f.unit, f.volume])).toEqual([
      ['Grease EP2', 'kg', 1.1],
      ['Hydraulic oil', 'L', 38.927],
      ['Grease EP2', 'tube', 1],
    ]);
    const imperialAsh = sumPartsForecast(services, 'imperial').customers[0];
    expect(imperialAsh.fluids.map((f) => [f.unit, f.volume])).toEqual([['lb', 1.8]]);
  });

  it('a volume and a mass of one fluid (grease in L and in kg) are two lines: no density is assumed', () => {
    const mixed: ForecastService[] = [
      { ...services[2], fluids: [grease(1.1, 'kg')] },
      { ...services[3], fluids: [grease(0.5, 'L')] },
    ];
    const { fluids } = sumPartsForecast(mixed, 'metric');
    expect(fluids.map((f) => [f.unit, f.volume])).toEqual([
      ['kg', 1.1],
      ['L', 0.5],
    ]);
  });
});
