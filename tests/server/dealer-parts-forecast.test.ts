import { beforeEach, describe, expect, it } from 'vitest';
import request from 'supertest';
import { parse } from 'csv-parse/sync';
import { sumPartsForecast, type ForecastService } from '../../server/services/parts-sum';
import { resetDatabase } from '../support/db';
import { createTask, signedInAgent } from '../support/factories';
import { addDaysIso, todayIso } from '../../shared/domain';
import { api, app, dealerWorld, TZ } from './dealer-fixture';

// Hand-worked example (derived: plain addition, no published source needed). Two customers,
// three machines, four due services:
//   North  M1  2027-03-02  OF-100 ×1, HF-200 ×2, engine oil 18 L
//   North  M1  2027-03-20  of-100 ×1 (same part, other case), grease 0.5 kg
//   North  M2  2027-03-10  OF-100 ×1, engine oil 12.5 L
//   South  M3  2027-03-05  HF-200 ×1, engine oil 5 gal
// Totals: OF-100 = 1 + 1 + 1 = 3 on 2 machines (M1, M2), 3 services, first 2027-03-02;
//         HF-200 = 2 + 1 = 3 on 2 machines (M1, M3), first 2027-03-02;
//         engine oil L = 18 + 12.5 = 30.5 L on 2 machines, first 2027-03-02; engine oil gal = 5 gal
//         (never converted to litres); grease 0.5 kg on 1 machine, first 2027-03-20.
// North alone: OF-100 3 on 2 machines, HF-200 2 on 1 machine, oil 30.5 L, grease 0.5 kg.
// South alone: HF-200 1, oil 5 gal, first 2027-03-05.
const north = { id: 'n', name: 'North Farm' };
const south = { id: 's', name: 'South Farm' };
const services: ForecastService[] = [
  {
    customer: north,
    machineId: 'M1',
    neededOn: '2027-03-02',
    parts: [
      { partNumber: 'OF-100', description: 'Oil filter', quantity: 1 },
      { partNumber: 'HF-200', description: 'Hydraulic filter', quantity: 2 },
    ],
    fluids: [{ kind: 'Engine oil', volume: 18, unit: 'L' }],
  },
  {
    customer: north,
    machineId: 'M1',
    neededOn: '2027-03-20',
    parts: [{ partNumber: ' of-100', description: '', quantity: 1 }],
    fluids: [{ kind: 'Grease', volume: 0.5, unit: 'kg' }],
  },
  {
    customer: south,
    machineId: 'M3',
    neededOn: '2027-03-05',
    parts: [{ partNumber: 'HF-200', description: 'Hydraulic filter', quantity: 1 }],
    fluids: [{ kind: 'Engine oil', volume: 5, unit: 'gal' }],
  },
  {
    customer: north,
    machineId: 'M2',
    neededOn: '2027-03-10',
    parts: [{ partNumber: 'OF-100', description: 'Oil filter', quantity: 1 }],
    fluids: [{ kind: 'engine oil ', volume: 12.5, unit: 'L' }],
  },
];

describe('parts forecast — summing (pure function)', () => {
  it('parts forecast — hand-worked example: summed by part number and by fluid kind + unit, per customer and in total', () => {
    const result = sumPartsForecast(services);
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
        volume: 30.5,
        machines: 2,
        services: 2,
        firstNeededOn: '2027-03-02',
      },
      {
        kind: 'Engine oil',
        unit: 'gal',
        volume: 5,
        machines: 1,
        services: 1,
        firstNeededOn: '2027-03-05',
      },
      {
        kind: 'Grease',
        unit: 'kg',
        volume: 0.5,
        machines: 1,
        services: 1,
        firstNeededOn: '2027-03-20',
      },
    ]);
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
    expect(s.fluids.map((f) => [f.unit, f.volume])).toEqual([['gal', 5]]);
  });

  it('parts forecast — no services, no lines; quantities keep three decimals', () => {
    expect(sumPartsForecast([])).toEqual({ parts: [], fluids: [], customers: [] });
    const tenths = Array.from({ length: 3 }, (_, i) => ({
      customer: north,
      machineId: `M${i}`,
      neededOn: '2027-01-01',
      parts: [{ partNumber: 'X', description: '', quantity: 0.1 }],
      fluids: [],
    }));
    expect(sumPartsForecast(tenths).parts[0].quantity).toBe(0.3);
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
