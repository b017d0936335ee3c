import { beforeEach, describe, expect, it } from 'vitest';
import request from 'supertest';
import { format, getISOWeek, getISOWeekYear, parseISO, startOfISOWeek } from 'date-fns';
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
import { isoWeekOf } from '../../server/services/shop-outlook-weeks';
import { api, app, dealerWorld, TZ } from './dealer-fixture';

// The shop's next 16 weeks (issue 17). Calendar tasks (every 30 days) make the dates exact:
// a task last done on day D falls due on D + 30, whatever the meter does. The weeks are
// Mondays in the farm's time zone, checked against date-fns (startOfISOWeek, getISOWeek).
const today = () => todayIso(TZ);
const monday = () => format(startOfISOWeek(parseISO(today())), 'yyyy-MM-dd');
const isoWeek = (iso: string) => {
  const d = parseISO(iso);
  return `${getISOWeekYear(d)}-W${String(getISOWeek(d)).padStart(2, '0')}`;
};
/** A calendar task falling due on `on` (last done 30 days before). */
const dueOn = (on: string) => ({
  intervalMeter: null,
  intervalDays: 30,
  warnMeter: null,
  lastDoneMeter: null,
  lastDoneOn: addDaysIso(on, -30),
});

/**
 * Hand-worked farm (M = this week's Monday):
 *   A  due M+2   1.5 h   OF-100 ×1, engine oil 18 L             → week 1
 *   B  overdue (due 10 days ago)  no labour given   OF-100 ×1   → week 1 (overdue counts there)
 *   C  due M+17  2 h     AF-300 ×1                               → week 3
 *   D  due M+19  0.5 h                                           → week 3
 *   E  due M+66  3 h                                             → week 10
 *   a meter task on a machine with no readings: no forecast      → no week (undated 1)
 *   a plan on M+15 covering C and E                              → week 3, planned
 * Week 1: labour 1.5 h, 1 without labour, OF-100 = 1 + 1 = 2 (2 services, 1 machine, first
 *         needed M: the overdue one's parts are wanted on the week's Monday), oil 18 L.
 * Week 2: nothing. Week 3: labour 2 + 0.5 = 2.5 h, of which 0.5 h unplanned (C is on the plan);
 *         planned 1 visit, 2 tasks, 2 + 3 = 5 h. Week 10: 3 h, none unplanned (E is on the plan).
 */
async function farm() {
  const org = await createOrganization({ name: 'Hollin Farm', timeZone: TZ });
  const { user: manager } = await createMember(org, 'manager');
  const { user: tech } = await createMember(org, 'technician');
  const { user: op } = await createMember(org, 'operator');
  const machine = await createMachine(org, { fleetNumber: 'T-01', name: 'Row-crop tractor' });
  await addReadings(machine, [
    { daysAgo: 30, value: 1000 },
    { daysAgo: 2, value: 1140 },
  ]);
  const M = monday();
  const oil = [{ kind: 'Engine oil 15W-40', volume: 18, unit: 'L' as const }];
  const filter = [{ partNumber: 'OF-100', description: 'Oil filter', quantity: 1 }];
  const a = await createTask(machine, {
    name: 'A',
    ...dueOn(addDaysIso(M, 2)),
    labourHours: 1.5,
    parts: filter,
    fluids: oil,
  });
  const b = await createTask(machine, {
    name: 'B',
    ...dueOn(addDaysIso(today(), -10)),
    labourHours: null,
    parts: filter,
  });
  const c = await createTask(machine, {
    name: 'C',
    ...dueOn(addDaysIso(M, 17)),
    labourHours: 2,
    parts: [{ partNumber: 'AF-300', description: 'Air filter', quantity: 1 }],
  });
  const d = await createTask(machine, { name: 'D', ...dueOn(addDaysIso(M, 19)), labourHours: 0.5 });
  const e = await createTask(machine, { name: 'E', ...dueOn(addDaysIso(M, 66)), labourHours: 3 });
  const idle = await createMachine(org, { fleetNumber: 'T-02', name: 'Yard loader' });
  await createTask(idle, { name: 'Loader oil', intervalMeter: 500 });
  const techAgent = await signedInAgent(app, tech);
  const plan = await techAgent
    .post(api(org.id, `/machines/${machine.id}/service-records`))
    .send({ status: 'planned', plannedFor: addDaysIso(M, 15), taskIds: [c.id, e.id] });
  expect(plan.status).toBe(201);
  return { org, manager, tech, op, machine, a, b, c, d, e, techAgent, planId: plan.body.data.id };
}

const names = (week: { services: { taskName: string }[] }) =>
  week.services.map((s) => s.taskName).sort();

describe('shop outlook — the next weeks of a farm shop', () => {
  beforeEach(async () => {
    await resetDatabase();
  });

  it('ISO week of a Monday — the week of its Thursday, as date-fns counts it (ISO 8601)', () => {
    // 2026-12-28 is in 2026-W53 (2026 has 53 weeks); 2024-12-30 is in 2025-W01
    for (const d of ['2026-12-28', '2024-12-30', '2021-01-04', '2020-12-28', '2027-03-01'])
      expect(isoWeekOf(d)).toBe(isoWeek(d));
    expect(isoWeekOf('2026-12-28')).toBe('2026-W53');
    expect(isoWeekOf('2024-12-30')).toBe('2025-W01');
  });

  it('16 weeks from this Monday — services, labour, parts and plans per week as worked by hand', async () => {
    const f = await farm();
    const res = await f.techAgent.get(api(f.org.id, '/shop-outlook'));
    expect(res.status).toBe(200);
    const data = res.body.data;
    const M = monday();
    expect(data).toMatchObject({ asOf: today(), start: M, end: addDaysIso(M, 111), undated: 1 });
    expect(data.weeks).toHaveLength(16);
    data.weeks.forEach((w: { start: string; end: string; isoWeek: string }, i: number) => {
      expect(w.start).toBe(addDaysIso(M, i * 7));
      expect(w.end).toBe(addDaysIso(M, i * 7 + 6));
      expect(w.isoWeek).toBe(isoWeek(w.start));
    });
    const [w1, w2, w3] = data.weeks;
    expect(names(w1)).toEqual(['A', 'B']);
    expect(w1).toMatchObject({
      labourHours: 1.5,
      labourUnknown: 1,
      unplannedLabourHours: 1.5,
      planned: [],
      plannedLabourHours: 0,
    });
    expect(w1.services.find((s: { taskName: string }) => s.taskName === 'B')).toMatchObject({
      status: 'overdue',
      labourHours: null,
      plannedOn: null,
      customer: null,
      machine: { fleetNumber: 'T-01' },
    });
    expect(w1.parts).toEqual([
      {
        partNumber: 'OF-100',
        description: 'Oil filter',
        quantity: 2,
        machines: 1,
        services: 2,
        firstNeededOn: M,
      },
    ]);
    expect(w1.fluids).toMatchObject([{ kind: 'Engine oil 15W-40', unit: 'L', volume: 18 }]);
    expect(w2).toMatchObject({ services: [], labourHours: 0, labourUnknown: 0, planned: [] });
    expect(names(w3)).toEqual(['C', 'D']);
    expect(w3).toMatchObject({
      labourHours: 2.5,
      labourUnknown: 0,
      unplannedLabourHours: 0.5,
      plannedLabourHours: 5,
      plannedLabourUnknown: 0,
    });
    expect(w3.planned).toEqual([
      {
        id: f.planId,
        plannedFor: addDaysIso(M, 15),
        machine: { id: f.machine.id, fleetNumber: 'T-01', name: 'Row-crop tractor' },
        customer: null,
        tasks: 2,
        labourHours: 5,
        labourUnknown: 0,
      },
    ]);
    expect(w3.parts.map((p: { partNumber: string }) => p.partNumber)).toEqual(['AF-300']);
    expect(names(data.weeks[9])).toEqual(['E']);
    expect(data.weeks[9]).toMatchObject({ labourHours: 3, unplannedLabourHours: 0 });
    expect(data.weeks[9].services[0].plannedOn).toBe(addDaysIso(M, 15));
    // nothing else is in any week
    const all = data.weeks.flatMap(names).sort();
    expect(all).toEqual(['A', 'B', 'C', 'D', 'E']);

    const four = await f.techAgent.get(api(f.org.id, '/shop-outlook')).query({ weeks: 4 });
    expect(four.status).toBe(200);
    expect(four.body.data.weeks).toHaveLength(4);
    expect(four.body.data.end).toBe(addDaysIso(M, 27));
    expect(four.body.data.weeks.flatMap(names).sort()).toEqual(['A', 'B', 'C', 'D']);
  });

  it('roles — 401 signed out, 200 manager and technician, 403 operator, 404 another farm and every dealer', async () => {
    const f = await farm();
    const url = api(f.org.id, '/shop-outlook');
    expect((await request(app).get(url)).status).toBe(401);
    expect((await (await signedInAgent(app, f.manager)).get(url)).status).toBe(200);
    expect((await f.techAgent.get(url)).status).toBe(200);
    const op = await (await signedInAgent(app, f.op)).get(url);
    expect(op.status).toBe(403);
    const other = await createOrganization();
    const { user: stranger } = await createMember(other, 'manager');
    expect((await (await signedInAgent(app, stranger)).get(url)).status).toBe(404);
    // a dealer's advisor, even with a service link, is not routed to a farm's outlook
    const w = await dealerWorld();
    const linked = await w.advisorAgent.get(api(w.serviced.org.id, '/shop-outlook'));
    expect(linked.status).toBe(404);
    const unlinked = await w.advisorAgent.get(api(w.unlinked.org.id, '/shop-outlook'));
    expect(unlinked.status).toBe(404);
  });

  it('bad weeks — 400 naming weeks and its rule (0, 27, 2.5, "x")', async () => {
    const f = await farm();
    for (const weeks of ['0', '27', '2.5', 'x']) {
      const res = await f.techAgent.get(api(f.org.id, '/shop-outlook')).query({ weeks });
      expect(res.status).toBe(400);
      expect(Object.keys(res.body.error.fields)).toEqual(['weeks']);
    }
    const zero = await f.techAgent.get(api(f.org.id, '/shop-outlook')).query({ weeks: 0 });
    expect(zero.body.error.fields.weeks).toBe('Weeks must be 1 to 26');
  });
});
