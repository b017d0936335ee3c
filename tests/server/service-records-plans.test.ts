import { beforeEach, describe, expect, it } from 'vitest';
import { countRows, resetDatabase } from '../support/db';
import { createTask, signedInAgent } from '../support/factories';
import { ServiceTask, TaskDuePoint } from '../../server/models';
import { addDaysIso } from '../../shared/domain';
import { app, shop, today } from './service-records-fixture';

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
});
