import { beforeEach, describe, expect, it } from 'vitest';
import { resetDatabase } from '../support/db';
import { createMember, createOrganization, signedInAgent } from '../support/factories';
import { MachineOperator } from '../../server/models';
import { app, completed, daysAgoIso, shop, today } from './service-records-fixture';

describe('service records — plans, history, measurements, shop week', () => {
  beforeEach(resetDatabase);

  it('history — newest first; q searches notes, task names and part numbers', async () => {
    const s = await shop();
    const post = (body: Record<string, unknown>) => s.agent.post(s.records).send(body);
    expect(
      (
        await post(
          completed({
            performedOn: daysAgoIso(30),
            meterValue: 1050,
            taskIds: [s.air.id],
            notes: 'Outer element replaced',
          }),
        )
      ).status,
    ).toBe(201);
    expect(
      (
        await post(
          completed({ performedOn: daysAgoIso(10), meterValue: 1150, taskIds: [s.hydraulic.id] }),
        )
      ).status,
    ).toBe(201);
    expect((await post(completed({ taskIds: [s.oil.id], notes: 'Routine' }))).status).toBe(201);
    const all = await s.agent.get(s.records);
    expect(all.body.data.map((r: { performedOn: string }) => r.performedOn)).toEqual([
      today(),
      daysAgoIso(10),
      daysAgoIso(30),
    ]);
    expect(all.body.meta).toEqual({ total: 3, page: 1, pageSize: 20 });
    const byPart = await s.agent.get(s.records).query({ q: 'hf-200' });
    expect(byPart.body.data.map((r: { meterValue: number }) => r.meterValue)).toEqual([1150]);
    const byNote = await s.agent.get(s.records).query({ q: 'element' });
    expect(byNote.body.data.map((r: { meterValue: number }) => r.meterValue)).toEqual([1050]);
    const byTask = await s.agent.get(s.records).query({ q: 'engine oil' });
    expect(byTask.body.data.map((r: { meterValue: number }) => r.meterValue)).toEqual([1200]);
    const bad = await s.agent.get(s.records).query({ pageSize: 500 });
    expect(bad.status).toBe(400);
    expect(bad.body.error.fields.pageSize).toMatch(/At most 100/);
  });

  it('measurements — in or out of spec is computed on the server; a series per machine, oldest first', async () => {
    const s = await shop();
    const first = await s.agent.post(s.records).send(
      completed({
        performedOn: daysAgoIso(30),
        meterValue: 1050,
        measurements: [
          { name: 'PTO clutch pressure', value: 20.4, unit: 'bar', specMin: 18, specMax: 22 },
          { name: 'Battery voltage (rested)', value: 12.6, unit: 'V', specMin: 12.4 },
        ],
      }),
    );
    expect(first.status).toBe(201);
    expect(
      first.body.data.measurements.map((m: { inSpec: boolean; specStatus: string }) => [
        m.inSpec,
        m.specStatus,
      ]),
    ).toEqual([
      [true, 'in'],
      [true, 'in'],
    ]);
    const second = await s.agent.post(s.records).send(
      completed({
        measurements: [
          { name: 'pto clutch pressure', value: 16.9, unit: 'bar', specMin: 18, specMax: 22 },
          { name: 'Belt deflection', value: 12, unit: 'mm' },
        ],
      }),
    );
    expect(second.body.data.measurements[0]).toMatchObject({ inSpec: false, specStatus: 'low' });
    expect(second.body.data.measurements[1]).toMatchObject({ inSpec: null, specStatus: null });
    const badSpec = await s.agent
      .post(s.records)
      .send(completed({ measurements: [{ name: 'Torque', value: 1, specMin: 5, specMax: 2 }] }));
    expect(badSpec.status).toBe(400);
    expect(badSpec.body.error.fields['measurements.0.specMax']).toMatch(/not be below/);

    const machineUrl = `${s.base}/machines/${s.machine.id}`;
    const series = await s.agent
      .get(`${machineUrl}/measurements/series`)
      .query({ name: 'PTO clutch pressure' });
    expect(series.status).toBe(200);
    expect(
      series.body.data.map((p: { performedOn: string; value: number; inSpec: boolean }) => [
        p.performedOn,
        p.value,
        p.inSpec,
      ]),
    ).toEqual([
      [daysAgoIso(30), 20.4, true],
      [today(), 16.9, false],
    ]);
    const names = await s.agent.get(`${machineUrl}/measurements`);
    expect(names.body.data.map((n: { name: string; count: number }) => [n.name, n.count])).toEqual([
      ['Battery voltage (rested)', 1],
      ['Belt deflection', 1],
      ['pto clutch pressure', 2],
    ]);
    const other = await createOrganization();
    const { user: stranger } = await createMember(other, 'manager');
    const strangerAgent = await signedInAgent(app, stranger);
    expect((await strangerAgent.get(`${machineUrl}/measurements/series?name=x`)).status).toBe(404);
  });

  it('service record — an operator cannot see the records of a machine they are not assigned to', async () => {
    const s = await shop();
    const { user: other } = await createMember(s.org, 'operator');
    await MachineOperator.create({
      organizationId: s.org.id,
      machineId: s.machine.id,
      userId: other.id,
    });
    const created = await s.agent.post(s.records).send(completed());
    const opAgent = await signedInAgent(app, s.op);
    expect((await opAgent.get(s.records)).status).toBe(404);
    expect((await opAgent.get(`${s.base}/service-records/${created.body.data.id}`)).status).toBe(
      404,
    );
    const assigned = await signedInAgent(app, other);
    expect((await assigned.get(s.records)).status).toBe(200);
  });
});
