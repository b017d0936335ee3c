// Season services through the API (issue 11): a pre-season or storage task is created on a
// machine with season months and its due date read back from the machine's schedule; a change of
// the machine's season months moves it; without season months it has no date; the refusals name
// the field and write nothing. Dates worked by hand: with no reading and no service the season
// counts from today (shared/domain/season-dates.ts), so the year is today's or the next, while the
// day is fixed — 1 Aug − 21 days = 11 Jul, 31 Oct + 14 days = 14 Nov, 1 Apr − 21 days = 11 Mar.
import { beforeEach, describe, expect, it } from 'vitest';
import { createApp } from '../../server/app';
import { countRows, resetDatabase } from '../support/db';
import {
  createMachine,
  createMember,
  createOrganization,
  createTask,
  signedInAgent,
} from '../support/factories';
import { ServiceTask } from '../../server/models';
import { todayIso } from '../../shared/domain';

const app = createApp();
const HARVEST = [8, 9, 10];

/** The first year whose `monthDay` (mm-dd) falls on or after today (the farm is in Chicago). */
function yearOnOrAfterToday(monthDay: string): number {
  const today = todayIso('America/Chicago');
  const year = Number(today.slice(0, 4));
  return today <= `${year}-${monthDay}` ? year : year + 1;
}

async function farm(seasonMonths = HARVEST) {
  const org = await createOrganization();
  const { user } = await createMember(org, 'manager');
  const machine = await createMachine(org, { category: 'combine', seasonMonths });
  const agent = await signedInAgent(app, user);
  const api = `/api/v1/organizations/${org.id}`;
  return { org, machine, agent, api, tasksUrl: `${api}/machines/${machine.id}/tasks` };
}

const preSeason = {
  name: 'Pre-season inspection',
  seasonAnchor: 'before_start',
  seasonOffsetDays: 21,
};

describe('season services — API', () => {
  beforeEach(resetDatabase);

  it('season service — pre-season 21 days on an August–October combine — due 11 Jul, read back on the machine', async () => {
    const w = await farm();
    const created = await w.agent.post(w.tasksUrl).send(preSeason);
    expect(created.status, JSON.stringify(created.body)).toBe(201);
    expect(created.body.data).toMatchObject({ seasonAnchor: 'before_start', seasonOffsetDays: 21 });
    const year = yearOnOrAfterToday('08-01');
    const list = await w.agent.get(w.tasksUrl);
    expect(list.status).toBe(200);
    const task = list.body.data.find((t: { name: string }) => t.name === preSeason.name);
    expect(task.intervalDays).toBeNull();
    expect(task.due).toMatchObject({
      dueDate: `${year}-07-11`,
      effectiveDate: `${year}-07-11`,
      governs: 'calendar',
      season: { anchor: 'before_start', offsetDays: 21, seasonDate: `${year}-08-01` },
    });
  });

  it('season service — storage 14 days after the end, with a 250 h interval — due 14 Nov, on the due list', async () => {
    const w = await farm();
    const created = await w.agent.post(w.tasksUrl).send({
      name: 'Storage service',
      seasonAnchor: 'after_end',
      seasonOffsetDays: 14,
      intervalMeter: 250,
    });
    expect(created.status, JSON.stringify(created.body)).toBe(201);
    const year = yearOnOrAfterToday('10-31');
    expect(created.body.data.due).toMatchObject({
      dueDate: `${year}-11-14`,
      season: { anchor: 'after_end', offsetDays: 14, seasonDate: `${year}-10-31` },
    });
    const due = await w.agent.get(`${w.api}/machines/${w.machine.id}/due`);
    expect(due.status, JSON.stringify(due.body)).toBe(200);
    const row = due.body.data.find((r: { taskName: string }) => r.taskName === 'Storage service');
    expect(row.due.dueDate).toBe(`${year}-11-14`);
  });

  it('season service — the machine’s season months change to April–May — due moves to 11 Mar', async () => {
    const w = await farm();
    await w.agent.post(w.tasksUrl).send(preSeason).expect(201);
    const patched = await w.agent
      .patch(`${w.api}/machines/${w.machine.id}`)
      .send({ seasonMonths: [4, 5] });
    expect(patched.status, JSON.stringify(patched.body)).toBe(200);
    const year = yearOnOrAfterToday('04-01');
    const list = await w.agent.get(w.tasksUrl);
    expect(list.body.data[0].due.dueDate).toBe(`${year}-03-11`);
  });

  it('season service — a machine with no season months — no forecast, seasonDate null', async () => {
    const w = await farm([]);
    const created = await w.agent.post(w.tasksUrl).send(preSeason);
    expect(created.status).toBe(201);
    expect(created.body.data.due).toMatchObject({
      status: 'no_forecast',
      dueDate: null,
      season: { anchor: 'before_start', offsetDays: 21, seasonDate: null },
    });
  });

  it.each([
    [{ ...preSeason, intervalDays: 365 }, 'intervalDays', /clear the day interval/],
    [{ ...preSeason, seasonOffsetDays: null }, 'seasonOffsetDays', /days before the season/],
    [{ ...preSeason, seasonOffsetDays: 121 }, 'seasonOffsetDays', /at most 120/],
    [{ ...preSeason, seasonOffsetDays: 2.5 }, 'seasonOffsetDays', /whole number/],
    [{ ...preSeason, seasonAnchor: 'during' }, 'seasonAnchor', /before_start, after_end/],
    [{ ...preSeason, seasonAnchor: null }, 'seasonAnchor', /Choose before the season/],
  ])('season service — POST %j — 400 naming %s, nothing written', async (body, field, rule) => {
    const w = await farm();
    const res = await w.agent.post(w.tasksUrl).send(body);
    expect(res.status).toBe(400);
    expect(res.body.error.fields[field]).toMatch(rule);
    expect(await countRows('service_tasks')).toBe(0);
  });

  it('season service — PATCH a season onto a yearly task that keeps its day interval — 422 naming intervalDays, unchanged', async () => {
    const w = await farm();
    const task = await createTask(w.machine, { name: 'Yearly check', intervalDays: 365 });
    const url = `${w.api}/tasks/${task.id}`;
    const refused = await w.agent
      .patch(url)
      .send({ seasonAnchor: 'before_start', seasonOffsetDays: 21 });
    expect(refused.status).toBe(422);
    expect(refused.body.error.fields.intervalDays).toMatch(/season months: clear the day interval/);
    await task.reload();
    expect([task.seasonAnchor, task.seasonOffsetDays, task.intervalDays]).toEqual([
      null,
      null,
      365,
    ]);

    const half = await w.agent.patch(url).send({ seasonAnchor: 'after_end', intervalDays: null });
    expect(half.status).toBe(422);
    expect(half.body.error.fields.seasonOffsetDays).toMatch(/days before the season/);

    const ok = await w.agent
      .patch(url)
      .send({ seasonAnchor: 'before_start', seasonOffsetDays: 21, intervalDays: null });
    expect(ok.status, JSON.stringify(ok.body)).toBe(200);
    expect(ok.body.data.due.dueDate).toBe(`${yearOnOrAfterToday('08-01')}-07-11`);
    // a PATCH of the days alone keeps the anchor
    const days = await w.agent.patch(url).send({ seasonOffsetDays: 30 });
    expect(days.body.data).toMatchObject({ seasonAnchor: 'before_start', seasonOffsetDays: 30 });
  });

  it('season service — a template keeps it, and applying the template copies it to the machine', async () => {
    const w = await farm();
    const template = await w.agent.post(`${w.api}/schedule-templates`).send({
      category: 'combine',
      name: 'Combine seasons',
      tasks: [preSeason],
    });
    expect(template.status, JSON.stringify(template.body)).toBe(201);
    expect(template.body.data.tasks[0]).toMatchObject({
      seasonAnchor: 'before_start',
      seasonOffsetDays: 21,
    });
    const applied = await w.agent
      .post(`${w.api}/machines/${w.machine.id}/apply-template`)
      .send({ templateId: template.body.data.id });
    expect(applied.status).toBe(201);
    expect(applied.body.data[0]).toMatchObject({ seasonAnchor: 'before_start' });
  });

  it('season service — the combine class of the library brings its pre-season and storage services', async () => {
    const w = await farm();
    const res = await w.agent
      .post(`${w.api}/machines/${w.machine.id}/apply-class`)
      .send({ machineClass: 'combine' });
    expect(res.status).toBe(200);
    const stored = await ServiceTask.findAll({ where: { machineId: w.machine.id } });
    const season = stored
      .filter((t) => t.seasonAnchor !== null)
      .map((t) => [t.seasonAnchor, t.seasonOffsetDays, t.intervalDays]);
    expect(season).toEqual(
      expect.arrayContaining([
        ['before_start', 21, null],
        ['after_end', 14, null],
      ]),
    );
  });
});
