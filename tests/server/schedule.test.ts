import { beforeEach, describe, expect, it } from 'vitest';
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
