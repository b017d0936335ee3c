import { beforeEach, describe, expect, it } from 'vitest';
import { createApp } from '../../server/app';
import { countRows, resetDatabase } from '../support/db';
import {
  addReadings,
  createMachine,
  createMember,
  createOrganization,
  signedInAgent,
} from '../support/factories';
import { ServiceRecord } from '../../server/models';
import { todayIso } from '../../shared/domain';

// Costs travel as integer minor units of the farm's currency; the server sums them exactly and
// says which currency they are in.

const app = createApp();
const TZ = 'America/Chicago';

async function farm(currency = 'USD') {
  const org = await createOrganization({ timeZone: TZ, currency });
  const { user } = await createMember(org, 'technician');
  const machine = await createMachine(org, { fleetNumber: 'T-01' });
  await addReadings(machine, [{ daysAgo: 10, value: 1000 }]);
  const agent = await signedInAgent(app, user);
  return {
    agent,
    records: `/api/v1/organizations/${org.id}/machines/${machine.id}/service-records`,
  };
}

const visit = (extra: Record<string, unknown>) => ({
  status: 'completed',
  performedOn: todayIso(TZ),
  meterValue: 1010,
  ...extra,
});

describe('service records — costs in minor units', () => {
  beforeEach(resetDatabase);

  it('costs — parts of 0.10 and 0.20 total exactly 0.30 (30 minor units, not 0.30000000000000004)', async () => {
    const { agent, records } = await farm();
    const res = await agent.post(records).send(
      visit({
        parts: [
          { partNumber: 'W-1', quantity: 1, unitCostMinor: 10 },
          { partNumber: 'W-2', quantity: 1, unitCostMinor: 20 },
        ],
        otherCosts: [{ description: 'Rags', amountMinor: 10 }],
      }),
    );
    expect(res.status).toBe(201);
    expect(res.body.data.parts.map((p: { lineCostMinor: number }) => p.lineCostMinor)).toEqual([
      10, 20,
    ]);
    expect(res.body.data.costs).toEqual({
      partsMinor: 30,
      fluidsMinor: 0,
      otherMinor: 10,
      totalMinor: 40,
      linesWithoutCost: 0,
    });
  });

  it('costs — a fluid line is volume × price per unit, rounded once: 2.5 L at 0.45 is 1.13', async () => {
    const { agent, records } = await farm();
    const res = await agent
      .post(records)
      .send(visit({ fluids: [{ kind: 'Coolant', volume: 2.5, unit: 'L', unitCostMinor: 45 }] }));
    expect(res.status).toBe(201);
    expect(res.body.data.fluids[0]).toMatchObject({ unitCostMinor: 45, lineCostMinor: 113 });
    expect(res.body.data.costs.totalMinor).toBe(113);
  });

  it("presenter — the record carries the farm's currency: EUR for a euro farm, USD by default", async () => {
    const euro = await farm('EUR');
    const res = await euro.agent.post(euro.records).send(visit({}));
    expect(res.status).toBe(201);
    expect(res.body.data.currency).toBe('EUR');
    const history = await euro.agent.get(euro.records);
    expect(history.body.data.map((r: { currency: string }) => r.currency)).toEqual(['EUR']);
    await resetDatabase();
    const dollar = await farm();
    expect((await dollar.agent.post(dollar.records).send(visit({}))).body.data.currency).toBe(
      'USD',
    );
  });

  it('costs — a unit cost that is not whole minor units is refused (400 naming the field); nothing written', async () => {
    const { agent, records } = await farm();
    const res = await agent
      .post(records)
      .send(visit({ parts: [{ partNumber: 'W-1', quantity: 1, unitCostMinor: 9.5 }] }));
    expect(res.status).toBe(400);
    expect(res.body.error.fields['parts.0.unitCostMinor']).toMatch(/minor units .* whole/);
    expect(await countRows('service_records')).toBe(0);
  });

  it('costs — a negative amount is refused naming otherCosts.0.amountMinor; nothing written', async () => {
    const { agent, records } = await farm();
    const res = await agent
      .post(records)
      .send(visit({ otherCosts: [{ description: 'Refund', amountMinor: -100 }] }));
    expect(res.status).toBe(400);
    expect(res.body.error.fields['otherCosts.0.amountMinor']).toMatch(/may not be negative/);
    expect(await countRows('service_records')).toBe(0);
  });

  it('costs — are stored as the integers sent (no float on the way to the database)', async () => {
    const { agent, records } = await farm();
    const res = await agent
      .post(records)
      .send(visit({ parts: [{ partNumber: 'W-1', quantity: 3, unitCostMinor: 1999 }] }));
    expect(res.status).toBe(201);
    const stored = (await ServiceRecord.findByPk(res.body.data.id))!;
    expect(stored.parts).toEqual([
      { partNumber: 'W-1', description: '', quantity: 3, unitCostMinor: 1999 },
    ]);
    expect(res.body.data.costs.partsMinor).toBe(5997);
  });
});
