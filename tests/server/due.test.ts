import { beforeEach, describe, expect, it } from 'vitest';
import request from 'supertest';
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
import { ScheduleTemplate, ServiceTask } from '../../server/models';
import { todayIso, addDaysIso } from '../../shared/domain';

const app = createApp();

describe('due list API', () => {
  beforeEach(resetDatabase);

  it('due — 401 without sign-in; 404 for another farm', async () => {
    const org = await createOrganization();
    expect((await request(app).get(`/api/v1/organizations/${org.id}/due`)).status).toBe(401);
    const other = await createOrganization();
    const { user } = await createMember(other, 'manager');
    const agent = await signedInAgent(app, user);
    expect((await agent.get(`/api/v1/organizations/${org.id}/due`)).status).toBe(404);
  });

  it('due — overdue first, then by the date each task falls due; counts by status; hand-worked figures', async () => {
    const org = await createOrganization({ timeZone: 'America/Chicago' });
    const { user } = await createMember(org, 'manager');
    const a = await createMachine(org, { fleetNumber: 'A' });
    const b = await createMachine(org, { fleetNumber: 'B' });
    // 10 h/day for 30 days on both machines (hand-worked: rate 10 h/day, current 1,300 h)
    const pts = [0, 10, 20, 30].map((d) => ({ daysAgo: 30 - d, value: 1000 + d * 10 }));
    await addReadings(a, pts);
    await addReadings(b, pts);
    await createTask(a, {
      name: 'Late oil',
      intervalMeter: 250,
      lastDoneMeter: 1000,
      warnMeter: 25,
    }); // due 1,250: 50 h over
    await createTask(b, {
      name: 'Filter in 10 days',
      intervalMeter: 500,
      lastDoneMeter: 900,
      warnMeter: 50,
    }); // due 1,400: 100 h left
    await createTask(a, {
      name: 'Coolant',
      intervalMeter: 3000,
      lastDoneMeter: 1000,
      warnMeter: 300,
    }); // due 4,000: 270 days
    const agent = await signedInAgent(app, user);
    const res = await agent.get(`/api/v1/organizations/${org.id}/due`);
    expect(res.status).toBe(200);
    const today = todayIso('America/Chicago');
    expect(res.body.meta.asOf).toBe(today);
    expect(
      res.body.data.map((r: { taskName: string; due: { status: string } }) => [
        r.taskName,
        r.due.status,
      ]),
    ).toEqual([
      ['Late oil', 'overdue'],
      ['Filter in 10 days', 'ok'],
      ['Coolant', 'ok'],
    ]);
    const filter = res.body.data[1];
    expect(filter.due.dueMeter).toBe(1400);
    expect(filter.due.remainingMeter).toBe(100);
    expect(filter.usage.rate).toBeCloseTo(10, 1);
    // 100 h at 10 h/day from the last reading (taken now) → 10 days ahead (±1 for the time of day)
    const projected = filter.due.projectedDate as string;
    expect([addDaysIso(today, 9), addDaysIso(today, 10), addDaysIso(today, 11)]).toContain(
      projected,
    );
    expect(res.body.meta.counts).toEqual({
      overdue: 1,
      due_soon: 0,
      history_unknown: 0,
      ok: 2,
      no_forecast: 0,
    });
  });

  it('due — horizon filter keeps overdue and what falls due inside it; status and category filters', async () => {
    const org = await createOrganization();
    const { user } = await createMember(org, 'manager');
    const a = await createMachine(org, { fleetNumber: 'A', category: 'tractor' });
    const b = await createMachine(org, { fleetNumber: 'B', category: 'baler', meterUnit: 'bales' });
    const pts = [0, 10, 20, 30].map((d) => ({ daysAgo: 30 - d, value: 1000 + d * 10 }));
    await addReadings(a, pts);
    await addReadings(b, pts);
    await createTask(a, { name: 'Late', intervalMeter: 250, lastDoneMeter: 1000 });
    await createTask(a, { name: 'Far', intervalMeter: 3000, lastDoneMeter: 1000 });
    await createTask(b, { name: 'Soon', intervalMeter: 500, lastDoneMeter: 900 });
    const agent = await signedInAgent(app, user);
    const url = `/api/v1/organizations/${org.id}/due`;
    const h30 = await agent.get(`${url}?horizon=30`);
    expect(h30.body.data.map((r: { taskName: string }) => r.taskName)).toEqual(['Late', 'Soon']);
    const balers = await agent.get(`${url}?category=baler`);
    expect(balers.body.data.map((r: { taskName: string }) => r.taskName)).toEqual(['Soon']);
    const overdue = await agent.get(`${url}?status=overdue`);
    expect(overdue.body.data.map((r: { taskName: string }) => r.taskName)).toEqual(['Late']);
    const bad = await agent.get(`${url}?horizon=12`);
    expect(bad.status).toBe(400);
    expect(bad.body.error.fields.horizon).toMatch(/7, 30, 90/);
  });

  it('due — stale meters: a machine in season with no reading for 14 days is listed', async () => {
    const org = await createOrganization();
    const { user } = await createMember(org, 'manager');
    const month = Number(todayIso(org.timeZone).slice(5, 7));
    const stale = await createMachine(org, { fleetNumber: 'S', seasonMonths: [month] });
    const offSeason = await createMachine(org, {
      fleetNumber: 'O',
      seasonMonths: [(month % 12) + 1],
    });
    const fresh = await createMachine(org, { fleetNumber: 'F' });
    await addReadings(stale, [
      { daysAgo: 40, value: 10 },
      { daysAgo: 20, value: 20 },
    ]);
    await addReadings(offSeason, [{ daysAgo: 40, value: 10 }]);
    await addReadings(fresh, [{ daysAgo: 2, value: 10 }]);
    const agent = await signedInAgent(app, user);
    const res = await agent.get(`/api/v1/organizations/${org.id}/due`);
    expect(
      res.body.meta.stale.map((s: { machine: { fleetNumber: string } }) => s.machine.fleetNumber),
    ).toEqual(['S']);
    expect(res.body.meta.stale[0].daysSince).toBeGreaterThanOrEqual(19);
  });

  it('due — a machine with one reading has "no forecast" for a meter-only task', async () => {
    const org = await createOrganization();
    const { user } = await createMember(org, 'manager');
    const m = await createMachine(org);
    await addReadings(m, [{ daysAgo: 1, value: 100 }]);
    await createTask(m, { intervalMeter: 250, lastDoneMeter: 0 });
    const agent = await signedInAgent(app, user);
    const res = await agent.get(`/api/v1/organizations/${org.id}/machines/${m.id}/due`);
    expect(res.status).toBe(200);
    expect(res.body.data[0].due.status).toBe('no_forecast');
    expect(res.body.data[0].due.projectedDate).toBeNull();
  });
});

describe('schedule API', () => {
  beforeEach(resetDatabase);

  it('tasks — technician adds a task; at least one interval required (400 names intervalMeter); nothing written', async () => {
    const org = await createOrganization();
    const { user } = await createMember(org, 'technician');
    const m = await createMachine(org);
    const agent = await signedInAgent(app, user);
    const url = `/api/v1/organizations/${org.id}/machines/${m.id}/tasks`;
    const none = await agent.post(url).send({ name: 'Grease' });
    expect(none.status).toBe(400);
    expect(none.body.error.fields.intervalMeter).toMatch(/meter interval, a day interval, or both/);
    expect(await countRows('service_tasks')).toBe(0);
    const ok = await agent.post(url).send({
      name: 'PTO clutch check',
      intervalMeter: 1000,
      warnMeter: 50,
      parts: [{ partNumber: 'HS-1', description: 'seal kit', quantity: 1 }],
      hazards: ['pto'],
    });
    expect(ok.status).toBe(201);
    expect(ok.body.data).toMatchObject({
      name: 'PTO clutch check',
      intervalMeter: 1000,
      hazards: ['pto'],
    });
    expect(ok.body.data.due).toMatchObject({ dueMeter: 1000, basis: 'assumed' });
  });

  it('tasks — an operator may not edit the schedule (403) and nothing changes', async () => {
    const org = await createOrganization();
    const { user } = await createMember(org, 'operator');
    const m = await createMachine(org);
    const task = await createTask(m, { name: 'Keep' });
    const agent = await signedInAgent(app, user);
    expect(
      (
        await agent
          .post(`/api/v1/organizations/${org.id}/machines/${m.id}/tasks`)
          .send({ name: 'X', intervalDays: 5 })
      ).status,
    ).toBe(403);
    expect(
      (
        await agent
          .patch(`/api/v1/organizations/${org.id}/tasks/${task.id}`)
          .send({ name: 'Changed' })
      ).status,
    ).toBe(403);
    expect((await agent.delete(`/api/v1/organizations/${org.id}/tasks/${task.id}`)).status).toBe(
      403,
    );
    expect((await ServiceTask.findByPk(task.id))!.name).toBe('Keep');
    const list = await agent.get(`/api/v1/organizations/${org.id}/machines/${m.id}/tasks`);
    expect(list.status).toBe(200);
    expect(list.body.abilities).toEqual({ edit: false, setLastDone: false });
  });

  it('tasks — last done: future date and meter above the last reading are refused; a valid one moves the due point', async () => {
    const org = await createOrganization();
    const { user } = await createMember(org, 'manager');
    const m = await createMachine(org);
    await addReadings(m, [
      { daysAgo: 20, value: 800 },
      { daysAgo: 0, value: 1000 },
    ]);
    const task = await createTask(m, { intervalMeter: 500, intervalDays: 365 });
    const agent = await signedInAgent(app, user);
    const url = `/api/v1/organizations/${org.id}/tasks/${task.id}/last-done`;
    // a year far outside the date window is refused by the schema; tomorrow on the farm's calendar
    // passes the window and is refused by the last-done rule
    const farOff = await agent.put(url).send({ lastDoneMeter: 900, lastDoneOn: '2999-01-01' });
    expect(farOff.status).toBe(400);
    expect(farOff.body.error.fields).toHaveProperty('lastDoneOn');
    const tomorrow = addDaysIso(todayIso(org.timeZone), 1);
    const future = await agent.put(url).send({ lastDoneMeter: 900, lastDoneOn: tomorrow });
    expect(future.status).toBe(422);
    expect(future.body.error.fields.lastDoneOn).toMatch(/after today/);
    const high = await agent.put(url).send({ lastDoneMeter: 1200, lastDoneOn: '2025-01-01' });
    expect(high.status).toBe(422);
    expect(high.body.error.fields.lastDoneMeter).toMatch(/above the latest reading \(1,000\)/);
    const ok = await agent
      .put(url)
      .send({ lastDoneMeter: 900, lastDoneOn: addDaysIso(todayIso(org.timeZone), -10) });
    expect(ok.status).toBe(200);
    expect(ok.body.data.due).toMatchObject({
      dueMeter: 1400,
      basis: 'recorded',
      dueDate: addDaysIso(todayIso(org.timeZone), 355),
    });
  });

  it('templates — applying one creates all its tasks in one step', async () => {
    const org = await createOrganization();
    const { user } = await createMember(org, 'manager');
    const m = await createMachine(org);
    const template = await ScheduleTemplate.create({
      organizationId: org.id,
      category: 'tractor',
      name: 'Tractor basics',
      description: 'Typical intervals of common practice',
      tasks: [
        {
          name: 'Engine oil',
          intervalMeter: 500,
          intervalDays: 365,
          firstServiceMeter: null,
          warnMeter: 50,
          warnDays: 30,
          parts: [],
          fluids: [],
          labourHours: 1,
          instructions: '',
          safetyNotes: '',
          hazards: [],
        },
        {
          name: 'Air filter',
          intervalMeter: 250,
          intervalDays: null,
          firstServiceMeter: null,
          warnMeter: 25,
          warnDays: null,
          parts: [],
          fluids: [],
          labourHours: 0.5,
          instructions: '',
          safetyNotes: '',
          hazards: [],
        },
      ],
    });
    const agent = await signedInAgent(app, user);
    const res = await agent
      .post(`/api/v1/organizations/${org.id}/machines/${m.id}/apply-template`)
      .send({ templateId: template.id });
    expect(res.status).toBe(201);
    expect(res.body.data.map((t: { name: string }) => t.name)).toEqual([
      'Engine oil',
      'Air filter',
    ]);
    const other = await createOrganization();
    const foreignTemplate = await ScheduleTemplate.create({
      organizationId: other.id,
      category: 'tractor',
      name: 'X',
      tasks: [],
    });
    const refused = await agent
      .post(`/api/v1/organizations/${org.id}/machines/${m.id}/apply-template`)
      .send({ templateId: foreignTemplate.id });
    expect(refused.status).toBe(422);
    expect(refused.body.error.fields.templateId).toMatch(/No such schedule template/);
    expect(await countRows('service_tasks')).toBe(2);
  });
});
