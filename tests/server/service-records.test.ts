import { beforeEach, describe, expect, it } from 'vitest';
import request from 'supertest';
import sharp from 'sharp';
import { createApp } from '../../server/app';
import { countRows, resetDatabase } from '../support/db';
import {
  addReadings,
  createMachine,
  createMember,
  createOrganization,
  createTask,
  signedInAgent,
} from '../support/factories';
import {
  Defect,
  Machine,
  MachineOperator,
  MeterReading,
  ServiceRecord,
  ServiceTask,
  TaskDuePoint,
} from '../../server/models';
import { loadDemo } from '../../server/seeders/demo';
import { addDaysIso, todayIso } from '../../shared/domain';

const app = createApp();
const TZ = 'America/Chicago';
const DAY = 86_400_000;
const today = () => todayIso(TZ);
const daysAgoIso = (n: number) => todayIso(TZ, new Date(Date.now() - n * DAY));

const png = () =>
  sharp({ create: { width: 640, height: 480, channels: 3, background: { r: 40, g: 90, b: 30 } } })
    .png()
    .toBuffer();
const pdf = () =>
  Buffer.from(
    '%PDF-1.4\n1 0 obj\n<< /Type /Catalog /Pages 2 0 R >>\nendobj\n2 0 obj\n<< /Type /Pages /Kids [] /Count 0 >>\nendobj\ntrailer\n<< /Root 1 0 R >>\n%%EOF\n',
  );
const binary = (res: request.Response, cb: (err: Error | null, body: Buffer) => void) => {
  const chunks: Buffer[] = [];
  res.on('data', (c: Buffer) => chunks.push(c));
  res.on('end', () => cb(null, Buffer.concat(chunks)));
};

/** A farm with a technician, an operator, T-01 with readings up to 1,190 h and three tasks. */
async function shop() {
  const org = await createOrganization({ timeZone: TZ });
  const { user: tech } = await createMember(org, 'technician');
  const { user: op } = await createMember(org, 'operator');
  const machine = await createMachine(org, { fleetNumber: 'T-01' });
  await addReadings(machine, [
    { daysAgo: 40, value: 1000 },
    { daysAgo: 20, value: 1100 },
    { daysAgo: 2, value: 1190 },
  ]);
  const oil = await createTask(machine, {
    name: 'Engine oil and filter',
    intervalMeter: 250,
    lastDoneMeter: 1000,
    lastDoneOn: daysAgoIso(40),
    labourHours: 1,
    parts: [{ partNumber: 'OF-100', description: 'Oil filter', quantity: 1 }],
    fluids: [{ kind: 'Engine oil 15W-40', volume: 18, unit: 'L' }],
  });
  const hydraulic = await createTask(machine, {
    name: 'Hydraulic filters',
    intervalMeter: 500,
    lastDoneMeter: 900,
    lastDoneOn: daysAgoIso(60),
    labourHours: 0.75,
    parts: [
      { partNumber: 'HF-200', description: 'Hydraulic filter', quantity: 2 },
      { partNumber: 'of-100', description: 'Oil filter', quantity: 1 },
    ],
  });
  const air = await createTask(machine, {
    name: 'Air filter inspection',
    intervalMeter: 250,
    lastDoneMeter: 1050,
    lastDoneOn: daysAgoIso(30),
    labourHours: 0.3,
  });
  const agent = await signedInAgent(app, tech);
  const base = `/api/v1/organizations/${org.id}`;
  return {
    org,
    tech,
    op,
    machine,
    oil,
    hydraulic,
    air,
    agent,
    base,
    records: `${base}/machines/${machine.id}/service-records`,
  };
}

const completed = (extra: Record<string, unknown> = {}) => ({
  status: 'completed',
  performedOn: today(),
  meterValue: 1200,
  ...extra,
});

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

describe('service records — reassembly settings', () => {
  beforeEach(resetDatabase);

  const settings = [
    { what: 'Shim pack under the rear bearing cap', value: '0.40 mm', restored: true },
    { what: 'LH adjuster', value: '3½ turns out', restored: false },
    { what: 'Final drive cap bolts', value: 'torque 120 N·m', restored: true },
  ];

  it('reassembly — completion is refused (422 naming the setting) while one is unticked; nothing written', async () => {
    const s = await shop();
    const res = await s.agent
      .post(s.records)
      .send(completed({ taskIds: [s.oil.id], reassemblySettings: settings }));
    expect(res.status).toBe(422);
    expect(res.body.error.fields['reassemblySettings.1.restored']).toMatch(
      /"LH adjuster: 3½ turns out" is not ticked as restored/,
    );
    expect(res.body.error.message).toMatch(/LH adjuster: 3½ turns out/);
    expect(await countRows('service_records')).toBe(0);
    expect(await countRows('meter_readings')).toBe(3);
    expect((await ServiceTask.findByPk(s.oil.id))!.lastDoneMeter).toBe(1000);
  });

  it('reassembly — with the reason given the record completes and keeps the reason', async () => {
    const s = await shop();
    const res = await s.agent.post(s.records).send(
      completed({
        taskIds: [s.oil.id],
        reassemblySettings: settings,
        unrestoredReason: 'LH adjuster left for the dealer to set after the new lining beds in',
      }),
    );
    expect(res.status).toBe(201);
    expect(res.body.data.reassemblySettings).toEqual(settings);
    expect(res.body.data.unrestoredReason).toMatch(/dealer/);
  });

  it('reassembly — a plan cannot be completed until the setting is ticked; ticking it lets it complete', async () => {
    const s = await shop();
    const plan = await s.agent.post(s.records).send({
      status: 'planned',
      plannedFor: addDaysIso(today(), 1),
      taskIds: [s.oil.id],
      reassemblySettings: settings,
    });
    expect(plan.status).toBe(201);
    const url = `${s.base}/service-records/${plan.body.data.id}`;
    const refused = await s.agent
      .post(`${url}/complete`)
      .send({ performedOn: today(), meterValue: 1200 });
    expect(refused.status).toBe(422);
    expect(Object.keys(refused.body.error.fields)).toEqual(['reassemblySettings.1.restored']);
    const ticked = settings.map((x) => ({ ...x, restored: true }));
    const done = await s.agent
      .post(`${url}/complete`)
      .send({ performedOn: today(), meterValue: 1200, reassemblySettings: ticked });
    expect(done.status).toBe(200);
    expect(done.body.data.status).toBe('completed');
    // a completed record may not lose a tick without a reason either
    const untick = await s.agent.patch(url).send({ reassemblySettings: settings });
    expect(untick.status).toBe(422);
  });
});

describe('service records — plans, history, measurements, shop week', () => {
  beforeEach(resetDatabase);

  it('plan — booked with tasks, nothing reset until completed; completing once (409 after); a plan cannot take a reading', async () => {
    const s = await shop();
    const plan = await s.agent.post(s.records).send({
      status: 'planned',
      plannedFor: addDaysIso(today(), 2),
      taskIds: [s.oil.id, s.hydraulic.id],
      technicianIds: [s.tech.id],
    });
    expect(plan.status).toBe(201);
    expect(plan.body.data).toMatchObject({
      status: 'planned',
      performedOn: null,
      meterValue: null,
    });
    expect(plan.body.abilities).toEqual({
      update: true,
      complete: true,
      cancel: true,
      attach: true,
    });
    expect(await countRows('meter_readings')).toBe(3);
    expect((await ServiceTask.findByPk(s.oil.id))!.lastDoneMeter).toBe(1000);
    const noDate = await s.agent.post(s.records).send({ status: 'planned' });
    expect(noDate.status).toBe(400);
    expect(noDate.body.error.fields.plannedFor).toBe('Give the date it is booked for');

    const url = `${s.base}/service-records/${plan.body.data.id}`;
    const done = await s.agent
      .post(`${url}/complete`)
      .send({ performedOn: today(), meterValue: 1205 });
    expect(done.status).toBe(200);
    expect(done.body.resets.every((r: { reset: boolean }) => r.reset)).toBe(true);
    expect((await ServiceTask.findByPk(s.hydraulic.id))!.lastDoneMeter).toBe(1205);
    const again = await s.agent
      .post(`${url}/complete`)
      .send({ performedOn: today(), meterValue: 1206 });
    expect(again.status).toBe(409);
    const edit = await s.agent.patch(url).send({ taskIds: [s.air.id] });
    expect(edit.status).toBe(422);
    expect(edit.body.error.fields.taskIds).toMatch(/cannot change/);
    // the whole form sent back with the tasks unchanged is fine: only the notes change
    const same = await s.agent
      .patch(url)
      .send({ taskIds: [s.hydraulic.id, s.oil.id], notes: 'Filters from the van stock' });
    expect(same.status).toBe(200);
    expect(same.body.data.notes).toBe('Filters from the van stock');
    const cancel = await s.agent.post(`${url}/cancel`);
    expect(cancel.status).toBe(409);
  });

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

  it('shop week — planned records by day with estimated labour and parts to pull; tasks falling due from the stored due points', async () => {
    const s = await shop();
    const monday = (() => {
      let d = today();
      while (new Date(`${d}T12:00:00Z`).getUTCDay() !== 1) d = addDaysIso(d, -1);
      return d;
    })();
    const planFor = addDaysIso(monday, 3);
    // a calendar task whose stored due point falls on the Friday
    const inspection = await createTask(s.machine, {
      name: 'Annual safety inspection',
      intervalMeter: null,
      intervalDays: 30,
      warnMeter: null,
      lastDoneMeter: null,
      lastDoneOn: addDaysIso(monday, 4 - 30),
      labourHours: null,
    });
    const plan = await s.agent.post(s.records).send({
      status: 'planned',
      plannedFor: planFor,
      taskIds: [s.oil.id, s.hydraulic.id, inspection.id],
    });
    expect(plan.status).toBe(201);
    const week = await s.agent.get(`${s.base}/shop-week`).query({ start: monday });
    expect(week.status).toBe(200);
    const data = week.body.data;
    expect(data.start).toBe(monday);
    expect(data.days).toHaveLength(7);
    expect(data.days[0].weekday).toBe('Mon');
    const day = data.days[3];
    expect(day.date).toBe(planFor);
    expect(day.planned).toHaveLength(1);
    expect(day.planned[0]).toMatchObject({
      estimatedLabourHours: 1.75,
      machine: { fleetNumber: 'T-01' },
    });
    expect(day.partsToPull).toEqual([
      { partNumber: 'HF-200', description: 'Hydraulic filter', quantity: 2 },
      { partNumber: 'OF-100', description: 'Oil filter', quantity: 2 },
    ]);
    expect(data.totals.plannedRecords).toBe(1);
    // every due row sits on the day its stored due point falls due
    const stored = await TaskDuePoint.findAll({ where: { organizationId: s.org.id } });
    const inWeek = stored.filter(
      (d) =>
        d.due.effectiveDate && d.due.effectiveDate >= monday && d.due.effectiveDate <= data.end,
    );
    const listed = data.days.flatMap(
      (d: {
        date: string;
        due: { taskId: string; due: { effectiveDate: string }; booked: unknown }[];
      }) =>
        d.due.map((r) => {
          expect(r.due.effectiveDate).toBe(d.date);
          return r.taskId;
        }),
    );
    expect(listed.sort()).toEqual(inWeek.map((d) => d.taskId).sort());
    expect(listed).toContain(inspection.id);
    const friday = data.days[4].due.find((r: { taskId: string }) => r.taskId === inspection.id);
    expect(friday.booked).toEqual({ recordId: plan.body.data.id, plannedFor: planFor });

    const opAgent = await signedInAgent(app, s.op);
    expect((await opAgent.get(`${s.base}/shop-week`)).status).toBe(403);
    const bad = await s.agent.get(`${s.base}/shop-week`).query({ start: '2026-02-30' });
    expect(bad.status).toBe(400);
    expect(bad.body.error.fields.start).toMatch(/yyyy-mm-dd/);
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

  it('service record — completing it closes the defects it names; the tagged-out machine stays tagged out until someone returns it to service', async () => {
    const s = await shop();
    await Machine.update({ status: 'tagged_out' }, { where: { id: s.machine.id } });
    const defect = await Defect.create({
      organizationId: s.org.id,
      machineId: s.machine.id,
      title: 'PTO master shield: fail',
      severity: 'critical',
      walkaroundId: null,
      itemId: 'pto-master-shield',
      photoId: null,
      reportedBy: s.op.id,
      assignedTo: null,
      fixedAt: null,
      fixedBy: null,
      fixedByRecordId: null,
    });
    const res = await s.agent
      .post(s.records)
      .send(completed({ closesDefectIds: [defect.id], notes: 'New master shield fitted' }));
    expect(res.status).toBe(201);
    await defect.reload();
    expect([defect.status, defect.fixedByRecordId]).toEqual(['fixed', res.body.data.id]);
    expect((await Machine.findByPk(s.machine.id))!.status).toBe('tagged_out');
  });
});

describe('service records — attachments', () => {
  beforeEach(resetDatabase);

  async function withRecord() {
    const s = await shop();
    const res = await s.agent.post(s.records).send(completed());
    const url = `${s.base}/service-records/${res.body.data.id}/attachments`;
    return { ...s, recordId: res.body.data.id as string, url };
  }

  it('attachments — a photo gets a thumbnail; a PDF is kept as is; both served only through the API', async () => {
    const s = await withRecord();
    const photo = await s.agent.post(s.url).attach('file', await png(), 'gauge.png');
    expect(photo.status).toBe(201);
    expect(photo.body.data).toMatchObject({
      kind: 'image',
      contentType: 'image/webp',
      fileName: 'gauge.png',
    });
    const full = await s.agent.get(photo.body.data.url).buffer(true).parse(binary);
    expect(full.headers['content-disposition']).toContain('filename="gauge.webp"');
    const thumb = await s.agent.get(photo.body.data.thumbnailUrl).buffer(true).parse(binary);
    expect(thumb.status).toBe(200);
    expect((await sharp(thumb.body as Buffer).metadata()).width).toBe(320);
    const sheet = await s.agent.post(s.url).attach('file', pdf(), 'pressure test.pdf');
    expect(sheet.status).toBe(201);
    expect(sheet.body.data).toMatchObject({
      kind: 'pdf',
      thumbnailUrl: null,
      fileName: 'pressure test.pdf',
    });
    const got = await s.agent.get(sheet.body.data.url).buffer(true).parse(binary);
    expect(got.status).toBe(200);
    expect(got.headers['content-type']).toBe('application/pdf');
    expect((got.body as Buffer).subarray(0, 5).toString()).toBe('%PDF-');
    const detail = await s.agent.get(`${s.base}/service-records/${s.recordId}`);
    expect(detail.body.data.attachments).toHaveLength(2);
    expect((await request(app).get(sheet.body.data.url)).status).toBe(401);
    // operators who may see the machine may look, not attach
    const opAgent = await signedInAgent(app, s.op);
    expect((await opAgent.get(sheet.body.data.url)).status).toBe(200);
    expect((await opAgent.post(s.url).attach('file', pdf(), 'x.pdf')).status).toBe(403);
    const del = await s.agent.delete(sheet.body.data.url);
    expect(del.status).toBe(204);
    expect((await s.agent.get(sheet.body.data.url)).status).toBe(404);
  });

  it('attachments — the type is checked by content: a text file named .pdf is refused (422 on file); nothing stored', async () => {
    const s = await withRecord();
    const res = await s.agent.post(s.url).attach('file', Buffer.from('an invoice, honestly'), {
      filename: 'invoice.pdf',
      contentType: 'application/pdf',
    });
    expect(res.status).toBe(422);
    expect(res.body.error.fields.file).toMatch(/attach a photo .* or a PDF/);
    const zip = await s.agent
      .post(s.url)
      .attach('file', Buffer.from('504b0304140000000800', 'hex'), 'photo.jpg');
    expect(zip.status).toBe(422);
    expect(await countRows('service_attachments')).toBe(0);
  });

  it('attachments — over 10 MB is refused with 413 naming the field', async () => {
    const s = await withRecord();
    const big = Buffer.concat([pdf(), Buffer.alloc(10 * 1024 * 1024)]);
    const res = await s.agent.post(s.url).attach('file', big, 'huge.pdf');
    expect(res.status).toBe(413);
    expect(res.body.error.fields.file).toMatch(/larger than 10 MB/);
    expect(await countRows('service_attachments')).toBe(0);
  });

  it('attachments — not served to another organization (404 on list, file and upload)', async () => {
    const s = await withRecord();
    const up = await s.agent.post(s.url).attach('file', pdf(), 'sheet.pdf');
    const other = await createOrganization();
    const { user: stranger } = await createMember(other, 'manager');
    const strangerAgent = await signedInAgent(app, stranger);
    expect((await strangerAgent.get(up.body.data.url)).status).toBe(404);
    expect((await strangerAgent.get(`${up.body.data.url}?size=thumb`)).status).toBe(404);
    expect((await strangerAgent.post(s.url).attach('file', pdf(), 'x.pdf')).status).toBe(404);
    expect((await strangerAgent.delete(up.body.data.url)).status).toBe(404);
    // the same ids under the stranger's own organization find nothing either
    const own = up.body.data.url.replace(s.org.id, other.id);
    expect((await strangerAgent.get(own)).status).toBe(404);
  });
});

describe('demo scenario — service history', () => {
  beforeEach(resetDatabase);

  it("demo — each task's latest completed record is its last-done point; statuses keep a few overdue and due soon", async () => {
    await loadDemo({ reset: true });
    const [tasks, records] = await Promise.all([
      ServiceTask.findAll(),
      ServiceRecord.findAll({ where: { status: 'completed' } }),
    ]);
    expect(records.length).toBeGreaterThan(50);
    const latest = new Map<string, { performedOn: string; meterLifetime: number }>();
    for (const r of records)
      for (const t of r.tasks) {
        const seen = latest.get(t.taskId);
        if (!seen || r.performedOn! > seen.performedOn)
          latest.set(t.taskId, { performedOn: r.performedOn!, meterLifetime: r.meterLifetime! });
      }
    expect(latest.size).toBeGreaterThan(40);
    for (const task of tasks) {
      const last = latest.get(task.id);
      if (!last) continue;
      expect([task.name, last.performedOn, last.meterLifetime]).toEqual([
        task.name,
        task.lastDoneOn,
        task.lastDoneMeter,
      ]);
    }
    const statuses = (await TaskDuePoint.findAll()).map((d) => d.status);
    const count = (s: string) => statuses.filter((x) => x === s).length;
    expect(count('overdue')).toBeGreaterThanOrEqual(3);
    expect(count('due_soon')).toBeGreaterThanOrEqual(3);
    expect(count('ok')).toBeGreaterThan(statuses.length / 2);
    const tagged = await Machine.findAll({ where: { status: 'tagged_out' } });
    expect(tagged.map((m) => m.fleetNumber)).toEqual(['T-03']);
    expect(
      await Defect.count({
        where: { machineId: tagged[0].id, severity: 'critical', status: 'open' },
      }),
    ).toBe(1);
  });
});
