import { beforeEach, describe, expect, it } from 'vitest';
import request from 'supertest';
import { parse } from 'csv-parse/sync';
import { sumPartsForecast, type ForecastService } from '../../server/services/parts-sum';
import { resetDatabase } from '../support/db';
import { createTask, signedInAgent } from '../support/factories';
import { addDaysIso, todayIso } from '../../shared/domain';
import { api, app, dealerWorld, TZ } from './dealer-fixture';

// Hand-worked example (plain addition; the gallon is NIST Handbook 44, Appendix C:
// 1 US gal = 3.785411784 L exactly). Two customers, three machines, four due services:
//   North  M1  2027-03-02  OF-100 ×1, HF-200 ×2, engine oil 18 L
//   North  M1  2027-03-20  of-100 ×1 (same part, other case), grease 0.5 kg
//   North  M2  2027-03-10  OF-100 ×1, engine oil 12.5 L
//   South  M3  2027-03-05  HF-200 ×1, engine oil 5 gal
// Totals (a metric dealer: litres): OF-100 = 1 + 1 + 1 = 3 on 2 machines (M1, M2), 3 services,
//         first 2027-03-02; HF-200 = 2 + 1 = 3 on 2 machines (M1, M3), first 2027-03-02;
//         engine oil = 18 + 12.5 + 5 × 3.785411784 = 30.5 + 18.92705892 = 49.42705892 → 49.427 L
//         on 3 machines, 3 services, first 2027-03-02; grease 0.5 kg on 1 machine, 2027-03-20.
// North alone: OF-100 3 on 2 machines, HF-200 2 on 1 machine, oil 30.5 L, grease 0.5 kg.
// South alone: HF-200 1, oil 5 gal = 18.92705892 → 18.927 L, first 2027-03-05.
const north = { id: 'n', name: 'North Farm' };
const south = { id: 's', name: 'South Farm' };
const machine = (id: string) => ({ id, fleetNumber: id, name: `Machine ${id}` });
const services: ForecastService[] = [
  {
    customer: north,
    machine: machine('M1'),
    neededOn: '2027-03-02',
    parts: [
      { partNumber: 'OF-100', description: 'Oil filter', quantity: 1 },
      { partNumber: 'HF-200', description: 'Hydraulic filter', quantity: 2 },
    ],
    fluids: [{ kind: 'Engine oil', volume: 18, unit: 'L' }],
  },
  {
    customer: north,
    machine: machine('M1'),
    neededOn: '2027-03-20',
    parts: [{ partNumber: ' of-100', description: '', quantity: 1 }],
    fluids: [{ kind: 'Grease', volume: 0.5, unit: 'kg' }],
  },
  {
    customer: south,
    machine: machine('M3'),
    neededOn: '2027-03-05',
    parts: [{ partNumber: 'HF-200', description: 'Hydraulic filter', quantity: 1 }],
    fluids: [{ kind: 'Engine oil', volume: 5, unit: 'gal' }],
  },
  {
    customer: north,
    machine: machine('M2'),
    neededOn: '2027-03-10',
    parts: [{ partNumber: 'OF-100', description: 'Oil filter', quantity: 1 }],
    fluids: [{ kind: 'engine oil ', volume: 12.5, unit: 'L' }],
  },
];

describe('parts forecast — summing (pure function)', () => {
  it('parts forecast — hand-worked example: summed by part number and by fluid kind in litres, per customer and in total', () => {
    const result = sumPartsForecast(services, 'metric');
    expect(result.parts).toEqual([
      {
        partNumber: 'HF-200',
        description: 'Hydraulic filter',
        quantity: 3,
        machines: 2,
        services: 2,
        firstNeededOn: '2027-03-02',
      },
      {
        partNumber: 'OF-100',
        description: 'Oil filter',
        quantity: 3,
        machines: 2,
        services: 3,
        firstNeededOn: '2027-03-02',
      },
    ]);
    expect(result.fluids).toEqual([
      {
        kind: 'Engine oil',
        unit: 'L',
        volume: 49.427,
        converted: true,
        summedFrom: ['L', 'gal'],
        machines: 3,
        services: 3,
        firstNeededOn: '2027-03-02',
      },
      {
        kind: 'Grease',
        unit: 'kg',
        volume: 0.5,
        converted: true,
        summedFrom: ['kg'],
        machines: 1,
        services: 1,
        firstNeededOn: '2027-03-20',
      },
    ]);
    expect(result.wearParts).toEqual([]);
    expect(result.customers.map((c) => c.customer.name)).toEqual(['North Farm', 'South Farm']);
    const [n, s] = result.customers;
    expect(n.parts.map((p) => [p.partNumber, p.quantity, p.machines])).toEqual([
      ['HF-200', 2, 1],
      ['OF-100', 3, 2],
    ]);
    expect(n.fluids.map((f) => [f.kind, f.unit, f.volume])).toEqual([
      ['Engine oil', 'L', 30.5],
      ['Grease', 'kg', 0.5],
    ]);
    expect(s.parts).toEqual([
      {
        partNumber: 'HF-200',
        description: 'Hydraulic filter',
        quantity: 1,
        machines: 1,
        services: 1,
        firstNeededOn: '2027-03-05',
      },
    ]);
    expect(s.fluids.map((f) => [f.unit, f.volume])).toEqual([['L', 18.927]]);
  });

  it('parts forecast — no services, no lines; quantities keep three decimals', () => {
    expect(sumPartsForecast([], 'metric')).toEqual({
      parts: [],
      fluids: [],
      wearParts: [],
      customers: [],
    });
    const tenths = Array.from({ length: 3 }, (_, i) => ({
      customer: north,
      machine: machine(`M${i}`),
      neededOn: '2027-01-01',
      parts: [{ partNumber: 'X', description: '', quantity: 0.1 }],
      fluids: [],
    }));
    expect(sumPartsForecast(tenths, 'metric').parts[0].quantity).toBe(0.3);
  });
});

describe('parts forecast — API', () => {
  beforeEach(resetDatabase);

  it("parts forecast — the customers' due services inside the horizon: overdue needed today, the rest on their date; CSV", async () => {
    const w = await dealerWorld();
    // coolant falls due in about 270 days: outside every horizon, so its filter is not listed
    await createTask(w.viewed.machine, {
      name: 'Coolant',
      intervalMeter: 3000,
      lastDoneMeter: 1000,
      parts: [{ partNumber: 'CL-1', description: 'Coolant filter', quantity: 1 }],
    });
    const res = await w.advisorAgent.get(api(w.dealer.id, '/parts-forecast?horizon=30'));
    expect(res.status).toBe(200);
    const today = todayIso(TZ);
    const f = res.body.data;
    // each farm: oil (OF-100 ×1, 18 L, overdue → today) and hydraulic (HF-200 ×2, due in ~8 days)
    expect(f.services).toBe(4);
    expect(f.parts.map((p: { partNumber: string }) => p.partNumber)).toEqual(['OF-100', 'HF-200']);
    expect(f.parts[0]).toMatchObject({
      quantity: 2,
      machines: 2,
      services: 2,
      firstNeededOn: today,
    });
    expect(f.parts[1]).toMatchObject({ quantity: 4, machines: 2 });
    expect(f.parts[1].firstNeededOn > today).toBe(true);
    expect(f.parts[1].firstNeededOn <= addDaysIso(today, 30)).toBe(true);
    expect(f.fluids).toEqual([
      expect.objectContaining({ kind: 'Engine oil 15W-40', unit: 'L', volume: 36, machines: 2 }),
    ]);
    expect(f.byCustomer.map((c: { customer: { name: string } }) => c.customer.name)).toEqual([
      'Alder Farm',
      'Birch Farm',
    ]);
    const week = await w.advisorAgent.get(api(w.dealer.id, '/parts-forecast?horizon=7'));
    expect(week.body.data.parts.map((p: { partNumber: string }) => p.partNumber)).toEqual([
      'OF-100',
    ]);
    const one = await w.advisorAgent.get(
      api(w.dealer.id, `/parts-forecast?customerId=${w.viewed.org.id}`),
    );
    expect(one.body.data.parts[0]).toMatchObject({ partNumber: 'OF-100', quantity: 1 });

    const csv = await w.advisorAgent.get(api(w.dealer.id, '/parts-forecast.csv?horizon=30'));
    expect(csv.headers['content-disposition']).toMatch(/^attachment; filename="parts-forecast-/);
    const rows = parse(csv.text, { columns: true }) as Record<string, string>[];
    const totals = rows.filter((r) => r.Customer === 'All customers');
    expect(
      totals.map((r) => [r.Line, r['Part number'] || r.Description, r.Quantity, r.Unit]),
    ).toEqual([
      ['part', 'OF-100', '2', ''],
      ['part', 'HF-200', '4', ''],
      ['fluid', 'Engine oil 15W-40', '36', 'L'],
    ]);
    expect(rows.filter((r) => r.Customer === 'Alder Farm')).toHaveLength(3);
  });

  // Hand-worked (NIST Handbook 44, Appendix C: 1 US gal = 3.785411784 L, 1 lb = 0.45359237 kg).
  // An imperial dealer; both farms' oil changes are overdue (needed today). Alder's calls 18 L of
  // oil and 1.1 kg of grease, Birch's 5 gal of oil and 0.9 lb of grease:
  //   oil    18 / 3.785411784 = 4.755097 gal + 5 gal = 9.755097 → 9.755 gal, one line
  //   grease 1.1 / 0.45359237 = 2.425085 lb + 0.9 lb = 3.325085 → 3.325 lb (= 1.508 kg), one line
  // Each oil change also inspects a drive belt (a wear part): listed on A-01 and B-01, no quantity.
  it('parts forecast — an imperial dealer: oil 18 L + 5 gal = 9.755 US gal, grease 1.1 kg + 0.9 lb = 3.325 lb; wear belts to inspect on A-01, B-01', async () => {
    const w = await dealerWorld();
    await w.dealer.update({ units: 'imperial' });
    const belt = {
      partNumber: '',
      description: 'Drive belt, as worn',
      quantity: 1,
      wearPart: true,
    };
    const oilPart = { partNumber: 'OF-100', description: 'Oil filter', quantity: 1 };
    await w.serviced.oil.update({
      parts: [oilPart, belt],
      fluids: [
        { kind: 'Engine oil 15W-40', volume: 18, unit: 'L' },
        { kind: 'Grease', volume: 1.1, unit: 'kg' },
      ],
    });
    await w.viewed.oil.update({
      parts: [oilPart, belt],
      fluids: [
        { kind: 'Engine oil 15W-40', volume: 5, unit: 'gal' },
        { kind: 'grease', volume: 0.9, unit: 'lb' },
      ],
    });
    const res = await w.advisorAgent.get(api(w.dealer.id, '/parts-forecast?horizon=7'));
    expect(res.status).toBe(200);
    const f = res.body.data;
    expect(f.units).toBe('imperial');
    expect(
      f.fluids.map((l: { kind: string; unit: string; volume: number }) => [
        l.kind,
        l.unit,
        l.volume,
      ]),
    ).toEqual([
      ['Engine oil 15W-40', 'gal', 9.755],
      ['Grease', 'lb', 3.325],
    ]);
    expect(
      f.parts.map((p: { partNumber: string; quantity: number }) => [p.partNumber, p.quantity]),
    ).toEqual([['OF-100', 2]]);
    expect(f.wearParts).toEqual([
      {
        partNumber: '',
        description: 'Drive belt, as worn',
        machines: [
          { id: w.serviced.machine.id, fleetNumber: 'A-01', name: 'Alder Farm tractor' },
          { id: w.viewed.machine.id, fleetNumber: 'B-01', name: 'Birch Farm tractor' },
        ],
        services: 2,
        firstNeededOn: todayIso(TZ),
      },
    ]);
    const csv = await w.advisorAgent.get(api(w.dealer.id, '/parts-forecast.csv?horizon=7'));
    const totals = (parse(csv.text, { columns: true }) as Record<string, string>[]).filter(
      (r) => r.Customer === 'All customers',
    );
    expect(totals.map((r) => [r.Line, r.Description, r.Quantity, r.Unit, r['Inspect on']])).toEqual(
      [
        ['part', 'Oil filter', '2', '', ''],
        ['fluid', 'Engine oil 15W-40', '9.755', 'US gal', ''],
        ['fluid', 'Grease', '3.325', 'lb', ''],
        ['wear part (inspect, replace when worn)', 'Drive belt, as worn', '', '', 'A-01; B-01'],
      ],
    );
  });

  it('parts forecast — 401, 400 on a bad horizon, 404 for a farm', async () => {
    const w = await dealerWorld();
    expect((await request(app).get(api(w.dealer.id, '/parts-forecast'))).status).toBe(401);
    expect((await w.advisorAgent.get(api(w.dealer.id, '/parts-forecast?horizon=365'))).status).toBe(
      400,
    );
    const manager = await signedInAgent(app, w.serviced.manager);
    expect((await manager.get(api(w.serviced.org.id, '/parts-forecast'))).status).toBe(404);
    expect((await w.advisorAgent.get(api(w.serviced.org.id, '/parts-forecast'))).status).toBe(404);
  });
});
