// Season hours and season plans (issue 17) through the API: the season use worked by hand, plans
// as entered (a value, or an area at a work rate: hours = area ÷ rate, a definition), every bad
// body refused naming its field with nothing written, and a plan moving the forecast.
import { beforeEach, describe, expect, it } from 'vitest';
import { createApp } from '../../server/app';
import { Machine } from '../../server/models';
import { resetDatabase } from '../support/db';
import {
  addReadings,
  createMachine,
  createMember,
  createOrganization,
  createTask,
  signedInAgent,
} from '../support/factories';

const app = createApp();
const DAY = 86_400_000;
const daysAgo = (iso: string) => (Date.now() - Date.parse(`${iso}T12:00:00Z`)) / DAY;

/** Daily readings from `from` to `to` (ISO), `perDay(date)` hours a day, starting at `start`. */
function daily(from: string, to: string, perDay: (iso: string) => number, start = 1000) {
  const points: { daysAgo: number; value: number }[] = [];
  let value = start;
  for (let t = Date.parse(`${from}T12:00:00Z`); t <= Date.parse(`${to}T12:00:00Z`); t += DAY) {
    const iso = new Date(t).toISOString().slice(0, 10);
    points.push({ daysAgo: daysAgo(iso), value });
    value += perDay(iso);
  }
  return points;
}
const inHarvest = (iso: string) => ['07', '08', '09'].includes(iso.slice(5, 7));

describe('season hours — this season against last', () => {
  beforeEach(resetDatabase);

  it('GET season-hours — 4 h/day through Jul–Sep 2025, 5 h/day through Jul–Sep 2026 — 366 h against 457.5 h', async () => {
    // Readings at noon, each holding the value before that day's use; between two readings the
    // meter rises linearly, so a day's use falls from its noon to the next. The season runs from
    // 1 July 00:00 to 1 October 00:00: 91 whole days of use plus half of 30 September's —
    // 91.5 × 4 = 366 h in 2025 and 91.5 × 5 = 457.5 h in 2026.
    const org = await createOrganization({ timeZone: 'UTC' });
    const { user } = await createMember(org, 'manager');
    const combine = await createMachine(org, { fleetNumber: 'C-9', seasonMonths: [7, 8, 9] });
    await addReadings(
      combine,
      daily('2025-01-01', '2026-11-30', (iso) => (inHarvest(iso) ? (iso < '2026' ? 4 : 5) : 0)),
    );
    const agent = await signedInAgent(app, user);
    const res = await agent
      .get(`/api/v1/organizations/${org.id}/season-hours?year=2026`)
      .expect(200);
    expect(res.body.meta.year).toBe(2026);
    expect(res.body.data).toEqual([
      {
        machine: { id: combine.id, fleetNumber: 'C-9', name: combine.name },
        unit: 'h',
        seasonMonths: [7, 8, 9],
        thisSeason: 457.5,
        lastSeasonToDate: 366,
        lastSeason: 366,
        plan: null,
      },
    ]);
  });

  it('GET season-hours — year=1999 — 400 naming year', async () => {
    const org = await createOrganization();
    const { user } = await createMember(org, 'manager');
    const agent = await signedInAgent(app, user);
    const res = await agent
      .get(`/api/v1/organizations/${org.id}/season-hours?year=1999`)
      .expect(400);
    expect(res.body.error.fields.year).toMatch(/2000/);
  });
});

describe('season plans — entered by a manager, refused otherwise', () => {
  beforeEach(resetDatabase);

  async function setup() {
    const org = await createOrganization({ timeZone: 'UTC' });
    const manager = await createMember(org, 'manager');
    const technician = await createMember(org, 'technician');
    const machine = await createMachine(org, {
      fleetNumber: 'T-9',
      seasonMonths: [3, 4, 5, 9, 10],
    });
    const path = `/api/v1/organizations/${org.id}/machines/${machine.id}/season-plans/2027`;
    return {
      org,
      machine,
      path,
      agent: await signedInAgent(app, manager.user),
      tech: await signedInAgent(app, technician.user),
    };
  }

  it('PUT — 420 h — stored for 2027 and listed', async () => {
    const { org, path, agent } = await setup();
    const res = await agent.put(path).send({ value: 420 }).expect(200);
    expect(res.body.data).toMatchObject({
      year: 2027,
      value: 420,
      plannedUse: 420,
      unit: 'h',
      area: null,
    });
    const list = await agent
      .get(`/api/v1/organizations/${org.id}/season-hours?year=2027`)
      .expect(200);
    expect(list.body.data[0].plan.plannedUse).toBe(420);
  });

  it('PUT — 200 ha at 2.5 ha/h — 80 h planned (area ÷ rate)', async () => {
    const { path, agent } = await setup();
    const res = await agent
      .put(path)
      .send({ area: 200, areaUnit: 'ha', areaPerHour: 2.5 })
      .expect(200);
    expect(res.body.data).toMatchObject({
      area: 200,
      areaUnit: 'ha',
      areaPerHour: 2.5,
      plannedUse: 80,
      value: null,
    });
  });

  it.each([
    [{ value: 400, area: 10, areaUnit: 'ha', areaPerHour: 1 }, 'value', /not both/],
    [{ area: 200 }, 'areaPerHour', /work rate/],
    [{ area: 200, areaPerHour: 2 }, 'areaUnit', /unit/],
    [{ value: -5 }, 'value', /negative/],
    [{ value: 'lots' }, 'value', /number/],
    [{}, 'value', /Enter planned use/],
    [{ value: 10, colour: 'red' }, 'colour', /Not a field/],
  ])('PUT %j — 400 naming %s, nothing stored', async (body, field, rule) => {
    const { machine, path, agent } = await setup();
    const res = await agent.put(path).send(body).expect(400);
    expect(res.body.error.fields[field]).toMatch(rule);
    expect((await Machine.findByPk(machine.id))!.seasonPlans).toEqual({});
  });

  it('PUT by a technician — 403; DELETE by the manager — 204 and the plan gone', async () => {
    const { machine, path, agent, tech } = await setup();
    await tech.put(path).send({ value: 100 }).expect(403);
    await agent.put(path).send({ value: 100 }).expect(200);
    await agent.delete(path).expect(204);
    expect((await Machine.findByPk(machine.id))!.seasonPlans).toEqual({});
  });

  it('PUT — year 2101 in the path — 400 naming year', async () => {
    const { path, agent } = await setup();
    const res = await agent.put(path.replace('2027', '2101')).send({ value: 1 }).expect(400);
    expect(res.body.error.fields.year).toMatch(/2100/);
  });
});

describe('season plans — feed the forecast', () => {
  beforeEach(resetDatabase);

  it('a plan of twice last season for the coming one — the next due date comes sooner, and the forecast says it follows the plan', async () => {
    const org = await createOrganization({ timeZone: 'UTC' });
    const { user } = await createMember(org, 'manager');
    const combine = await createMachine(org, { fleetNumber: 'C-8', seasonMonths: [7, 8, 9] });
    await addReadings(
      combine,
      daily('2024-11-01', '2026-11-30', (iso) => (inHarvest(iso) ? 4 : 0)),
    );
    const values = daily('2024-11-01', '2026-11-30', (iso) => (inHarvest(iso) ? 4 : 0));
    const last = values[values.length - 1].value;
    await createTask(combine, { intervalMeter: 500, lastDoneMeter: last - 250, warnMeter: 10 });
    const agent = await signedInAgent(app, user);
    const due = async () =>
      (await agent.get(`/api/v1/organizations/${org.id}/machines/${combine.id}/due`).expect(200))
        .body.data[0].due;
    const before = await due();
    // last season about 366 h; planned 736 h for 2027 → the pace prior is about ×2
    await agent
      .put(`/api/v1/organizations/${org.id}/machines/${combine.id}/season-plans/2027`)
      .send({ value: 736 })
      .expect(200);
    const after = await due();
    expect(before.projectedDate).toMatch(/^2027-0[789]/);
    expect(after.projectedDate < before.projectedDate).toBe(true);
    const machine = await agent
      .get(`/api/v1/organizations/${org.id}/machines/${combine.id}`)
      .expect(200);
    expect(machine.body.data.usage.explanation).toMatch(/plan/);
  });
});
