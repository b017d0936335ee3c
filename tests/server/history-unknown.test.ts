import { beforeEach, describe, expect, it } from 'vitest';
import request from 'supertest';
import { createApp } from '../../server/app';
import { resetDatabase } from '../support/db';
import {
  addReadings,
  createMachine,
  createMember,
  createOrganization,
  createTask,
  signedInAgent,
} from '../support/factories';
import { ScheduleTemplate, ServiceTask } from '../../server/models';
import { addDaysIso, todayIso } from '../../shared/domain';

const app = createApp();

const templateTask = (name: string, intervalMeter: number, intervalDays: number | null) => ({
  name,
  intervalMeter,
  intervalDays,
  firstServiceMeter: null,
  warnMeter: 50,
  warnDays: null,
  parts: [],
  fluids: [],
  labourHours: 1,
  instructions: '',
  safetyNotes: '',
  hazards: [],
});

/** A 4,210 h tractor with no service history, a two-task template, and a signed-in member. */
async function usedTractor(role: 'manager' | 'technician' | 'operator' = 'manager') {
  const org = await createOrganization();
  const { user } = await createMember(org, role);
  const machine = await createMachine(org, { fleetNumber: 'T-07' });
  await addReadings(machine, [
    { daysAgo: 20, value: 4000 },
    { daysAgo: 0, value: 4210 },
  ]);
  const template = await ScheduleTemplate.create({
    organizationId: org.id,
    category: 'tractor',
    name: 'Tractor basics',
    tasks: [templateTask('Engine oil', 500, 365), templateTask('Air filter', 250, null)],
  });
  const agent = await signedInAgent(app, user);
  const base = `/api/v1/organizations/${org.id}`;
  return { org, machine, template, agent, base };
}

async function applyAsManager(w: Awaited<ReturnType<typeof usedTractor>>) {
  const res = await w.agent
    .post(`${w.base}/machines/${w.machine.id}/apply-template`)
    .send({ templateId: w.template.id });
  expect(res.status).toBe(201);
  return res.body.data as { id: string; name: string; due: { status: string } }[];
}

describe('history unknown', () => {
  beforeEach(resetDatabase);

  it('history unknown — a template applied to a 4,210 h machine — every task is history unknown, none OK, on the schedule, due list and machine', async () => {
    const w = await usedTractor();
    const tasks = await applyAsManager(w);
    expect(tasks.map((t) => [t.name, t.due.status])).toEqual([
      ['Engine oil', 'history_unknown'],
      ['Air filter', 'history_unknown'],
    ]);
    const due = await w.agent.get(`${w.base}/due?horizon=7`);
    expect(due.status).toBe(200);
    expect(due.body.meta.counts).toMatchObject({ history_unknown: 2, ok: 0, due_soon: 0 });
    expect(due.body.data.map((r: { due: { status: string } }) => r.due.status)).toEqual([
      'history_unknown',
      'history_unknown',
    ]);
    expect(due.body.data[0].due).toMatchObject({ dueMeter: null, remainingMeter: null });
    const only = await w.agent.get(`${w.base}/due?status=history_unknown`);
    expect(only.body.data).toHaveLength(2);
    const page = await w.agent.get(`${w.base}/machines/${w.machine.id}`);
    expect(page.body.data.dueStatus).toBe('history_unknown');
    const fleet = await w.agent.get(`${w.base}/machines?dueStatus=history_unknown`);
    expect(fleet.body.data.map((m: { fleetNumber: string }) => m.fleetNumber)).toEqual(['T-07']);
  });

  it('history unknown — schedule applied before the first reading, which comes in at 4,210 h — history unknown', async () => {
    const org = await createOrganization();
    const { user } = await createMember(org, 'manager');
    const machine = await createMachine(org);
    const agent = await signedInAgent(app, user);
    const base = `/api/v1/organizations/${org.id}`;
    const added = await agent
      .post(`${base}/machines/${machine.id}/tasks`)
      .send({ name: 'Engine oil', intervalMeter: 500 });
    expect(added.body.data.due.status).toBe('no_forecast');
    const logged = await agent
      .post(`${base}/machines/${machine.id}/readings`)
      .send({ value: 4210 });
    expect(logged.status).toBe(201);
    const tasks = await agent.get(`${base}/machines/${machine.id}/tasks`);
    expect(tasks.body.data[0].due.status).toBe('history_unknown');
  });

  it('history unknown — a new machine whose first reading is 0 h — counted from new as before (assumed)', async () => {
    const org = await createOrganization();
    const { user } = await createMember(org, 'manager');
    const machine = await createMachine(org);
    await addReadings(machine, [
      { daysAgo: 30, value: 0 },
      { daysAgo: 0, value: 120 },
    ]);
    const agent = await signedInAgent(app, user);
    const res = await agent
      .post(`/api/v1/organizations/${org.id}/machines/${machine.id}/tasks`)
      .send({ name: 'Engine oil', intervalMeter: 500 });
    expect(res.body.data.due).toMatchObject({ status: 'ok', dueMeter: 500, basis: 'assumed' });
  });

  it('history unknown — setting last done answers it: due from the record', async () => {
    const w = await usedTractor();
    const [oil] = await applyAsManager(w);
    const lastDoneOn = addDaysIso(todayIso(w.org.timeZone), -30);
    const res = await w.agent
      .put(`${w.base}/tasks/${oil.id}/last-done`)
      .send({ lastDoneMeter: 3900, lastDoneOn });
    expect(res.status).toBe(200);
    // 3,900 + 500 = 4,400 h: 190 h left at 10.5 h/day ≈ 18 days, inside the default window of
    // 10 % of 365 days (37 days) → due soon.
    expect(res.body.data.due).toMatchObject({
      status: 'due_soon',
      dueMeter: 4400,
      basis: 'recorded',
    });
    expect((await ServiceTask.findByPk(oil.id))!.historyUnknown).toBe(false);
  });

  it('history unknown — "start counting from now" on one task: due one interval after the latest reading and today', async () => {
    const w = await usedTractor('technician');
    const [oil, air] = await createTasksUnknown(w);
    const res = await w.agent.post(`${w.base}/tasks/${oil.id}/count-from-now`);
    expect(res.status).toBe(200);
    const today = todayIso(w.org.timeZone);
    expect(res.body.data).toMatchObject({ countFromMeter: 4210, countFromOn: today });
    expect(res.body.data.due).toMatchObject({
      basis: 'counted',
      dueMeter: 4710,
      dueDate: addDaysIso(today, 365),
      status: 'ok',
    });
    const list = await w.agent.get(`${w.base}/machines/${w.machine.id}/tasks`);
    const statusOf = new Map(
      list.body.data.map((t: { id: string; due: { status: string } }) => [t.id, t.due.status]),
    );
    expect(statusOf.get(air.id)).toBe('history_unknown');
  });

  it('history unknown — "start counting from now" for the whole machine answers every unknown task; a second call has nothing left (422)', async () => {
    const w = await usedTractor();
    await applyAsManager(w);
    const url = `${w.base}/machines/${w.machine.id}/count-from-now`;
    const res = await w.agent.post(url);
    expect(res.status).toBe(200);
    expect(res.body.data.map((t: { due: { dueMeter: number } }) => t.due.dueMeter).sort()).toEqual([
      4460, 4710,
    ]);
    const again = await w.agent.post(url);
    expect(again.status).toBe(422);
    expect(again.body.error.fields.task).toMatch(/No task of T-07/);
  });

  it('history unknown — a task with a recorded last service may not be re-counted (422, unchanged)', async () => {
    const w = await usedTractor();
    const task = await createTask(w.machine, { lastDoneMeter: 4000, lastDoneOn: '2025-01-01' });
    const res = await w.agent.post(`${w.base}/tasks/${task.id}/count-from-now`);
    expect(res.status).toBe(422);
    expect(res.body.error.fields.task).toMatch(/recorded last service/);
    expect((await ServiceTask.findByPk(task.id))!.countFromMeter).toBeNull();
  });

  it('count from now — 401 without sign-in, 403 for an operator, 404 for another farm; nothing changes', async () => {
    const w = await usedTractor('operator');
    const [task] = await createTasksUnknown(w);
    const url = `${w.base}/tasks/${task.id}/count-from-now`;
    expect((await request(app).post(url)).status).toBe(401);
    const refused = await w.agent.post(url);
    expect(refused.status).toBe(403);
    expect((await w.agent.post(`${w.base}/machines/${w.machine.id}/count-from-now`)).status).toBe(
      403,
    );
    const other = await createOrganization();
    const { user } = await createMember(other, 'manager');
    const stranger = await signedInAgent(app, user);
    expect((await stranger.post(url)).status).toBe(404);
    expect(
      (await stranger.post(`/api/v1/organizations/${other.id}/tasks/${task.id}/count-from-now`))
        .status,
    ).toBe(404);
    expect((await ServiceTask.findByPk(task.id))!.countFromMeter).toBeNull();
  });
});

/** Two never-done tasks flagged as they are when added through the schedule screens. */
async function createTasksUnknown(w: Awaited<ReturnType<typeof usedTractor>>) {
  const flagged = { historyUnknown: true };
  const oil = await createTask(w.machine, {
    name: 'Engine oil',
    intervalMeter: 500,
    intervalDays: 365,
    ...flagged,
  });
  const air = await createTask(w.machine, { name: 'Air filter', intervalMeter: 250, ...flagged });
  return [oil, air];
}
