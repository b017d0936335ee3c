// Issue 10 "What new users tripped on": overdue means overdue everywhere, the count cards describe
// the whole fleet, the horizon means what it says, and an empty farm is told it has no machines.
// Hand-worked farm: 10 h/day for 30 days, current 1,300 h (as in due.test.ts).
import { beforeEach, describe, expect, it } from 'vitest';
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
import { addDaysIso, todayIso } from '../../shared/domain';

const app = createApp();
type Row = { taskName: string; due: { status: string } };
const names = (rows: Row[]) => rows.map((r) => r.taskName);

async function handWorkedFarm() {
  const org = await createOrganization();
  const { user } = await createMember(org, 'manager');
  const machine = await createMachine(org, { fleetNumber: 'OD-01' });
  await addReadings(
    machine,
    [0, 10, 20, 30].map((d) => ({ daysAgo: 30 - d, value: 1000 + d * 10 })),
  );
  const today = todayIso(org.timeZone);
  // due 1,250 h, read 1,300 h: 50 h over
  await createTask(machine, { name: 'Late oil', intervalMeter: 250, lastDoneMeter: 1000 });
  // due 1,400 h: 100 h at 10 h/day → about 10 days; outside its 50 h window → ok
  await createTask(machine, { name: 'Filter', intervalMeter: 500, lastDoneMeter: 900 });
  // a yearly check 100 days off, inside its 120-day window → due soon, months ahead
  await createTask(machine, {
    name: 'Yearly check',
    intervalMeter: null,
    intervalDays: 365,
    warnMeter: null,
    warnDays: 120,
    lastDoneOn: addDaysIso(today, 100 - 365),
  });
  // due 4,000 h: 270 days
  await createTask(machine, { name: 'Coolant', intervalMeter: 3000, lastDoneMeter: 1000 });
  const agent = await signedInAgent(app, user);
  return { org, agent, url: `/api/v1/organizations/${org.id}/due` };
}

describe('due truth', () => {
  beforeEach(resetDatabase);

  it('due list — overdue first, then by date whatever the status (an ok row 10 days off before a due-soon row 100 days off)', async () => {
    const { agent, url } = await handWorkedFarm();
    const res = await agent.get(url);
    expect(res.status).toBe(200);
    expect(res.body.data.map((r: Row) => [r.taskName, r.due.status])).toEqual([
      ['Late oil', 'overdue'],
      ['Filter', 'ok'],
      ['Yearly check', 'due_soon'],
      ['Coolant', 'ok'],
    ]);
  });

  it('horizon — 7 days: the overdue task only; 30 days: and the filter; the due-soon check 100 days off in neither', async () => {
    const { agent, url } = await handWorkedFarm();
    const week = await agent.get(`${url}?horizon=7`);
    expect(names(week.body.data)).toEqual(['Late oil']);
    expect(week.body.meta.total).toBe(1);
    const month = await agent.get(`${url}?horizon=30&page=1&pageSize=25`);
    expect(names(month.body.data)).toEqual(['Late oil', 'Filter']);
    expect(month.body.meta.total).toBe(2);
    const quarter = await agent.get(`${url}?horizon=90`);
    expect(names(quarter.body.data)).toEqual(['Late oil', 'Filter']);
    // the status filter keeps the horizon for dated tasks
    const soon = await agent.get(`${url}?horizon=30&status=due_soon`);
    expect(names(soon.body.data)).toEqual([]);
  });

  it('count cards — the whole fleet at any horizon: 1 overdue, 1 due soon, 2 ok even for 7 days', async () => {
    const { agent, url } = await handWorkedFarm();
    const week = await agent.get(`${url}?horizon=7`);
    expect(week.body.meta.counts).toEqual({
      overdue: 1,
      due_soon: 1,
      history_unknown: 0,
      ok: 2,
      no_forecast: 0,
    });
    expect(week.body.meta.machines).toBe(1);
  });

  it('undated tasks — a history-unknown task is in every horizon, right after the overdue ones (it needs an answer before it can be dated)', async () => {
    const { org, agent, url } = await handWorkedFarm();
    // a machine that came with hours: a task added without its last service has history unknown
    const used = await createMachine(org, { fleetNumber: 'OD-02' });
    await addReadings(used, [
      { daysAgo: 10, value: 2000 },
      { daysAgo: 0, value: 2100 },
    ]);
    await createTask(used, { name: 'Unknown oil', historyUnknown: true });
    await agent
      .post(`/api/v1/organizations/${org.id}/machines/${used.id}/readings`)
      .send({ value: 2101 });
    const week = await agent.get(`${url}?horizon=7`);
    const rows = week.body.data as Row[];
    const firstUnknown = rows.findIndex((r) => r.due.status === 'history_unknown');
    expect(firstUnknown).toBeGreaterThan(0); // the hand-worked farm's Late oil is overdue
    expect(rows[firstUnknown].taskName).toBe('Unknown oil');
    // every overdue row comes before it, every dated one after
    expect(rows.slice(0, firstUnknown).every((r) => r.due.status === 'overdue')).toBe(true);
    expect(rows.slice(firstUnknown + 1).every((r) => r.due.status !== 'overdue')).toBe(true);
    const unknown = await agent.get(`${url}?horizon=30&status=history_unknown`);
    expect(names(unknown.body.data)).toEqual(['Unknown oil']);
  });

  it('no forecast — a task on a machine with one reading cannot be dated, so it is listed last in every horizon, not hidden', async () => {
    const { org, agent, url } = await handWorkedFarm();
    const fresh = await createMachine(org, { fleetNumber: 'OD-03' });
    await addReadings(fresh, [{ daysAgo: 0, value: 4210 }]);
    await createTask(fresh, { name: 'Fresh oil', intervalMeter: 500, lastDoneMeter: 3900 });
    const week = await agent.get(`${url}?horizon=7`);
    const rows = week.body.data as Row[];
    // the hand-worked farm's 7-day list (Late oil overdue, Filter in about 10 days is outside), then it
    expect(rows.map((r) => [r.taskName, r.due.status])).toEqual([
      ['Late oil', 'overdue'],
      ['Fresh oil', 'no_forecast'],
    ]);
  });

  it('shop week — a task past its meter is under Overdue, never under a day (not "Today")', async () => {
    const { org, agent } = await handWorkedFarm();
    const res = await agent.get(`/api/v1/organizations/${org.id}/shop-week`);
    expect(res.status).toBe(200);
    expect(names(res.body.data.overdue)).toEqual(['Late oil']);
    const dayRows = res.body.data.days.flatMap((d: { due: Row[] }) => names(d.due));
    expect(dayRows).not.toContain('Late oil');
    expect(res.body.data.totals.overdueTasks).toBe(1);
  });

  it('empty farm — no machines: counts all 0 and machines 0, so the dashboard can say so', async () => {
    const org = await createOrganization();
    const { user } = await createMember(org, 'manager');
    const agent = await signedInAgent(app, user);
    const res = await agent.get(`/api/v1/organizations/${org.id}/due`);
    expect(res.status).toBe(200);
    expect(res.body.meta).toMatchObject({ machines: 0, total: 0, stale: [] });
  });
});
