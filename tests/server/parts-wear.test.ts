// Wear parts (belts, tines, knives) are inspected at each service and replaced only when worn, so
// neither the dealer's parts forecast nor a service record's prefilled lines count them as used;
// the forecast lists them apart, to inspect on the machines they sit on, with no quantity.
import { describe, expect, it } from 'vitest';
import { sumPartsForecast, type ForecastService } from '../../server/services/parts-sum';
import { prefillLines } from '../../server/services/service-records';

// Hand-worked example (plain addition, no published source needed). One farm, two balers, three
// due services of the 50 h "Pickup tines and guards" and "Main gearbox oil" tasks:
//   B1  2027-05-02  pickup tines ×6 (wear part, no number), GB-10 gearbox seal ×1
//   B1  2027-05-20  pickup tines ×6 (wear part)
//   B2  2027-05-09  pickup tines ×6 (wear part), GB-10 ×1
// Counted as consumed: GB-10 = 1 + 1 = 2 on 2 machines, 2 services, first 2027-05-02.
// Not counted: 18 tines (6 + 6 + 6) — were they counted they would be a line of 18. Listed
// instead: "Pickup tine, as worn" to inspect on B1 and B2, 3 services, first 2027-05-02.
const farm = { id: 'f', name: 'Hill Farm' };
const b1 = { id: 'b1', fleetNumber: 'B1', name: 'Round baler' };
const b2 = { id: 'b2', fleetNumber: 'B2', name: 'Square baler' };
const tines = { partNumber: '', description: 'Pickup tine, as worn', quantity: 6, wearPart: true };
const seal = { partNumber: 'GB-10', description: 'Gearbox seal', quantity: 1, wearPart: false };
const services: ForecastService[] = [
  { customer: farm, machine: b1, neededOn: '2027-05-02', parts: [tines, seal], fluids: [] },
  { customer: farm, machine: b1, neededOn: '2027-05-20', parts: [tines], fluids: [] },
  { customer: farm, machine: b2, neededOn: '2027-05-09', parts: [tines, seal], fluids: [] },
];

describe('wear parts', () => {
  it('parts forecast — three services with 6 wear tines each and two seals: only the 2 seals are needed', () => {
    const result = sumPartsForecast(services, 'metric');
    expect(result.parts).toEqual([
      {
        partNumber: 'GB-10',
        description: 'Gearbox seal',
        quantity: 2,
        machines: 2,
        services: 2,
        firstNeededOn: '2027-05-02',
      },
    ]);
    expect(result.customers[0].parts.map((p) => p.quantity)).toEqual([2]);
  });

  it('parts forecast — the wear tines are listed to inspect on B1 and B2, with no quantity', () => {
    const { wearParts } = sumPartsForecast(services, 'metric');
    expect(wearParts).toEqual([
      {
        partNumber: '',
        description: 'Pickup tine, as worn',
        machines: [b1, b2],
        services: 3,
        firstNeededOn: '2027-05-02',
      },
    ]);
    expect(wearParts[0]).not.toHaveProperty('quantity');
  });

  it('parts forecast — a service with only wear parts needs no part', () => {
    expect(sumPartsForecast([services[1]], 'metric').parts).toEqual([]);
  });

  it('service record prefill — the wear part is left for the technician to add if replaced', () => {
    const lines = prefillLines([{ parts: [tines, seal], fluids: [] }]);
    expect(lines.parts).toEqual([
      { partNumber: 'GB-10', description: 'Gearbox seal', quantity: 1, unitCostMinor: null },
    ]);
  });

  it('a part stored before wear parts existed (no flag) still counts as consumed', () => {
    const old = { partNumber: 'OF-1', description: 'Oil filter', quantity: 1 };
    const result = sumPartsForecast([{ ...services[0], parts: [old] }], 'metric');
    expect(result.parts.map((p) => [p.partNumber, p.quantity])).toEqual([['OF-1', 1]]);
  });
});
