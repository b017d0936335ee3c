import { beforeEach, describe, expect, it } from 'vitest';
import request from 'supertest';
import { countRows, resetDatabase } from '../support/db';
import { createMember, createOrganization, signedInAgent } from '../support/factories';
import { Defect, MeterReading, ServiceTask, TaskDuePoint } from '../../server/models';
import { addDaysIso } from '../../shared/domain';
import { app, completed, daysAgoIso, shop, today } from './service-records-fixture';

describe('service records — completing', () => {
  beforeEach(resetDatabase);

  it('service record — 401 without sign-in; 404 for another farm; 403 for an operator; operator reads history', async () => {
    const s = await shop();
    expect((await request(app).get(s.records)).status).toBe(401);
    expect((await request(app).post(s.records).send(completed())).status).toBe(401);
    const other = await createOrganization();
    const { user: stranger } = await createMember(other, 'manager');
    const strangerAgent = await signedInAgent(app, stranger);
    expect((await strangerAgent.get(s.records)).status).toBe(404);
    expect((await strangerAgent.post(s.records).send(completed())).status).toBe(404);
    const opAgent = await signedInAgent(app, s.op);
    const refused = await opAgent.post(s.records).send(completed({ taskIds: [s.oil.id] }));
    expect(refused.status).toBe(403);
    expect(await countRows('service_records')).toBe(0);
    const created = await s.agent.post(s.records).send(completed({ taskIds: [s.oil.id] }));
    expect(created.status).toBe(201);
    const id = created.body.data.id;
    expect(
      (await strangerAgent.get(`/api/v1/organizations/${s.org.id}/service-records/${id}`)).status,
    ).toBe(404);
    expect(
      (await strangerAgent.get(`/api/v1/organizations/${other.id}/service-records/${id}`)).status,
    ).toBe(404);
    const history = await opAgent.get(s.records);
    expect(history.status).toBe(200);
    expect(history.body.abilities).toEqual({ create: false });
    expect(
      (await opAgent.patch(`${s.base}/service-records/${id}`).send({ notes: 'mine' })).status,
    ).toBe(403);
  });

  it('service record — completing resets exactly its tasks (meter and date), writes a service reading and refreshes due points', async () => {
    const s = await shop();
    const airBefore = (await ServiceTask.findByPk(s.air.id))!;
    const res = await s.agent.post(s.records).send(
      completed({
        taskIds: [s.oil.id, s.hydraulic.id],
        labourHours: 1.9,
        notes: 'Oil dark; hydraulic filters changed.',
        otherCosts: [{ description: 'Shop consumables', amountMinor: 1250 }],
      }),
    );
    expect(res.status).toBe(201);
    const data = res.body.data;
    expect(data).toMatchObject({
      status: 'completed',
      performedOn: today(),
      meterValue: 1200,
      meterLifetime: 1200,
      machine: { fleetNumber: 'T-01', status: 'in_service' },
      labourHours: 1.9,
      estimatedLabourHours: 1.75,
      technicians: [{ id: s.tech.id }],
    });
    // parts prefilled from the tasks' lists, summed by part number (OF-100 appears in both)
    expect(data.parts).toEqual([
      {
        partNumber: 'OF-100',
        description: 'Oil filter',
        quantity: 2,
        unitCostMinor: null,
        lineCostMinor: null,
      },
      {
        partNumber: 'HF-200',
        description: 'Hydraulic filter',
        quantity: 2,
        unitCostMinor: null,
        lineCostMinor: null,
      },
    ]);
    expect(data.fluids).toEqual([
      {
        kind: 'Engine oil 15W-40',
        volume: 18,
        unit: 'L',
        unitCostMinor: null,
        lineCostMinor: null,
      },
    ]);
    expect(data.currency).toBe('USD');
    expect(data.costs).toEqual({
      partsMinor: 0,
      fluidsMinor: 0,
      otherMinor: 1250,
      totalMinor: 1250,
      linesWithoutCost: 3,
    });
    expect(res.body.resets.map((r: { name: string; reset: boolean }) => [r.name, r.reset])).toEqual(
      [
        ['Engine oil and filter', true],
        ['Hydraulic filters', true],
      ],
    );
    for (const id of [s.oil.id, s.hydraulic.id]) {
      const t = (await ServiceTask.findByPk(id))!;
      expect([t.lastDoneMeter, t.lastDoneOn]).toEqual([1200, today()]);
    }
    const air = (await ServiceTask.findByPk(s.air.id))!;
    expect([air.lastDoneMeter, air.lastDoneOn]).toEqual([
      airBefore.lastDoneMeter,
      airBefore.lastDoneOn,
    ]);
    const due = (await TaskDuePoint.findByPk(s.oil.id))!.due;
    expect(due.dueMeter).toBe(1450);
    const reading = (await MeterReading.findOne({ where: { source: 'service' } }))!;
    expect(reading.value).toBe(1200);
    expect(data.readingId).toBe(reading.id);
  });

  it('service record — an invalid part line is refused naming it (400) and nothing is written', async () => {
    const s = await shop();
    const before = await countRows('meter_readings');
    const res = await s.agent.post(s.records).send(
      completed({
        taskIds: [s.oil.id],
        parts: [
          { partNumber: 'OF-100', quantity: 1, unitCostMinor: 950 },
          { partNumber: 'HF-200', quantity: -1 },
        ],
      }),
    );
    expect(res.status).toBe(400);
    expect(res.body.error.fields['parts.1.quantity']).toMatch(/greater than 0/);
    expect(await countRows('service_records')).toBe(0);
    expect(await countRows('meter_readings')).toBe(before);
    expect((await ServiceTask.findByPk(s.oil.id))!.lastDoneMeter).toBe(1000);
  });

  it('service record — one transaction: a refusal after the reading is written (a defect closed already) leaves nothing behind', async () => {
    const s = await shop();
    const fixed = await Defect.create({
      organizationId: s.org.id,
      machineId: s.machine.id,
      title: 'Left step cracked',
      severity: 'minor',
      status: 'fixed',
      walkaroundId: null,
      itemId: null,
      photoId: null,
      reportedBy: null,
      assignedTo: null,
      fixedAt: new Date(),
      fixedBy: null,
      fixedByRecordId: null,
    });
    const readings = await countRows('meter_readings');
    const audit = await countRows('audit_events');
    const res = await s.agent.post(s.records).send(
      completed({
        taskIds: [s.oil.id, s.air.id],
        measurements: [{ name: 'PTO clutch pressure', value: 20.1, unit: 'bar' }],
        closesDefectIds: [fixed.id],
      }),
    );
    expect(res.status).toBe(422);
    expect(res.body.error.fields['closesDefectIds.0']).toMatch(/closed already/);
    expect(await countRows('service_records')).toBe(0);
    expect(await countRows('service_measurements')).toBe(0);
    expect(await countRows('meter_readings')).toBe(readings);
    expect(await countRows('audit_events')).toBe(audit);
    expect((await ServiceTask.findByPk(s.oil.id))!.lastDoneMeter).toBe(1000);
    expect((await ServiceTask.findByPk(s.air.id))!.lastDoneMeter).toBe(1050);
  });

  it('service record — the meter value follows the reading rules: below the previous reading is refused on meterValue', async () => {
    const s = await shop();
    const res = await s.agent.post(s.records).send(completed({ meterValue: 1150 }));
    expect(res.status).toBe(422);
    expect(res.body.error.fields.meterValue).toMatch(/lower than the previous reading of 1,190 h/);
    expect(await countRows('service_records')).toBe(0);
    const future = await s.agent
      .post(s.records)
      .send(completed({ performedOn: addDaysIso(today(), 1) }));
    expect(future.status).toBe(422);
    expect(future.body.error.fields.performedOn).toMatch(/after today/);
    const missing = await s.agent.post(s.records).send({ status: 'completed' });
    expect(missing.status).toBe(400);
    expect(missing.body.error.fields).toMatchObject({
      performedOn: 'Give the date it was done',
      meterValue: 'Enter the meter value at service',
    });
    const foreignTask = await s.agent
      .post(s.records)
      .send(completed({ taskIds: ['5a0b8a8e-5d7e-4c1e-9a59-0d1b7b1f0a11'] }));
    expect(foreignTask.status).toBe(422);
    expect(foreignTask.body.error.fields['taskIds.0']).toMatch(/No such task on T-01/);
  });

  it('service record — a record for an earlier visit leaves a task already done later as it is', async () => {
    const s = await shop();
    const res = await s.agent
      .post(s.records)
      .send(
        completed({ performedOn: daysAgoIso(35), meterValue: 1020, taskIds: [s.oil.id, s.air.id] }),
      );
    expect(res.status).toBe(201);
    const resets = Object.fromEntries(
      res.body.resets.map((r: { name: string; reset: boolean }) => [r.name, r.reset]),
    );
    expect(resets).toEqual({ 'Engine oil and filter': true, 'Air filter inspection': false });
    expect((await ServiceTask.findByPk(s.air.id))!.lastDoneMeter).toBe(1050);
    expect((await ServiceTask.findByPk(s.oil.id))!.lastDoneMeter).toBe(1020);
  });
});
