import { beforeEach, describe, expect, it } from 'vitest';
import request from 'supertest';
import { ServiceRecord } from '../../server/models';
import { resetDatabase } from '../support/db';
import { createMember, createOrganization, signedInAgent } from '../support/factories';
import { clearMail } from '../support/mail';
import { addDaysIso, todayIso } from '../../shared/domain';
import { mondayOf } from '../../server/services/shop-week';
import { api, app, dealerWorld, farmWithFleet, TZ } from './dealer-fixture';

// The same work is never planned twice: the record form learns (from its prefill) which open plan
// covers the chosen tasks, so it can offer to complete it instead of leaving it in the shop week;
// a dealer's proposal says which open plans it overlaps before the farm accepts it.

const inDays = (n: number) => addDaysIso(todayIso(TZ), n);

async function planVisit(
  agent: Awaited<ReturnType<typeof signedInAgent>>,
  orgId: string,
  machineId: string,
  taskIds: string[],
  on: string,
) {
  const res = await agent
    .post(api(orgId, `/machines/${machineId}/service-records`))
    .send({ status: 'planned', plannedFor: on, taskIds });
  expect(res.status).toBe(201);
  return res.body.data.id as string;
}

describe('planned visits — recording a service offers the open plan', () => {
  beforeEach(resetDatabase);

  it('prefill — names the open plans of the machine that cover a chosen task, soonest first; none for other tasks', async () => {
    const farm = await farmWithFleet('Hazel Farm');
    const agent = await signedInAgent(app, farm.manager);
    const later = await planVisit(agent, farm.org.id, farm.machine.id, [farm.oil.id], inDays(5));
    const sooner = await planVisit(
      agent,
      farm.org.id,
      farm.machine.id,
      [farm.oil.id, farm.hydraulic.id],
      inDays(2),
    );
    const prefill = (taskIds: string[]) =>
      agent.get(
        api(farm.org.id, `/machines/${farm.machine.id}/service-records/prefill`) +
          `?taskIds=${taskIds.join(',')}`,
      );
    const oil = await prefill([farm.oil.id]);
    expect(oil.status).toBe(200);
    expect(oil.body.data.plannedVisits).toEqual([
      {
        id: sooner,
        plannedFor: inDays(2),
        tasks: [
          { taskId: farm.oil.id, name: 'Engine oil and filter' },
          { taskId: farm.hydraulic.id, name: 'Hydraulic filters' },
        ],
      },
      {
        id: later,
        plannedFor: inDays(5),
        tasks: [{ taskId: farm.oil.id, name: 'Engine oil and filter' }],
      },
    ]);
    const hydraulic = await prefill([farm.hydraulic.id]);
    expect(hydraulic.body.data.plannedVisits.map((v: { id: string }) => v.id)).toEqual([sooner]);
    expect((await prefill([])).body.data.plannedVisits).toEqual([]);

    // a completed or cancelled plan is no longer open
    const done = await agent.post(api(farm.org.id, `/service-records/${sooner}/complete`)).send({
      performedOn: todayIso(TZ),
      meterValue: 1310,
      taskIds: [farm.oil.id, farm.hydraulic.id],
    });
    expect(done.status).toBe(200);
    expect((await prefill([farm.hydraulic.id])).body.data.plannedVisits).toEqual([]);
    expect(
      (await prefill([farm.oil.id])).body.data.plannedVisits.map((v: { id: string }) => v.id),
    ).toEqual([later]);
  });

  it('completing the offered plan with the visit takes it out of the shop week with its parts to pull', async () => {
    const farm = await farmWithFleet('Hazel Farm');
    const agent = await signedInAgent(app, farm.manager);
    const today = todayIso(TZ);
    const planId = await planVisit(agent, farm.org.id, farm.machine.id, [farm.oil.id], today);
    const week = () => agent.get(api(farm.org.id, `/shop-week?start=${mondayOf(today)}`));
    const plannedIds = (body: { data: { days: { planned: { id: string }[] }[] } }) =>
      body.data.days.flatMap((d) => d.planned.map((p) => p.id));
    expect(plannedIds((await week()).body)).toEqual([planId]);
    const done = await agent
      .post(api(farm.org.id, `/service-records/${planId}/complete`))
      .send({ performedOn: today, meterValue: 1310, taskIds: [farm.oil.id] });
    expect(done.status).toBe(200);
    expect(plannedIds((await week()).body)).toEqual([]);
    expect((await ServiceRecord.findByPk(planId))!.status).toBe('completed');
  });

  it('prefill — 401 without sign-in; 404 for another farm; 422 naming a bad task id', async () => {
    const farm = await farmWithFleet('Hazel Farm');
    const url = api(farm.org.id, `/machines/${farm.machine.id}/service-records/prefill`);
    expect((await request(app).get(`${url}?taskIds=${farm.oil.id}`)).status).toBe(401);
    const other = await createOrganization();
    const { user: stranger } = await createMember(other, 'manager');
    const strangerAgent = await signedInAgent(app, stranger);
    expect((await strangerAgent.get(`${url}?taskIds=${farm.oil.id}`)).status).toBe(404);
    const agent = await signedInAgent(app, farm.manager);
    const bad = await agent.get(`${url}?taskIds=not-an-id`);
    expect(bad.status).toBe(422);
    expect(bad.body.error.fields).toEqual({ 'taskIds.0': 'Must be an id (uuid)' });
  });
});

describe('planned visits — a dealer proposal that overlaps a planned visit says so', () => {
  beforeEach(async () => {
    await resetDatabase();
    await clearMail();
  });

  it('booking — the farm sees the open plans a proposal overlaps (same task or same date) before accepting; the dealer sees none; answered, none', async () => {
    const w = await dealerWorld();
    const { org, machine, oil, hydraulic } = w.serviced;
    const manager = await signedInAgent(app, w.serviced.manager);
    const oilPlan = await planVisit(manager, org.id, machine.id, [oil.id], inDays(6));
    const sameDay = await planVisit(manager, org.id, machine.id, [], inDays(3));
    const proposed = await w.advisorAgent.post(api(w.dealer.id, '/bookings')).send({
      customerId: org.id,
      proposedFor: inDays(3),
      items: [{ machineId: machine.id, taskIds: [oil.id] }],
      note: '',
    });
    expect(proposed.status).toBe(201);
    expect(proposed.body.data.items[0].plannedVisits).toEqual([]);

    const farmSide = await manager.get(api(org.id, '/bookings'));
    expect(farmSide.status).toBe(200);
    expect(farmSide.body.data[0].items[0].plannedVisits).toEqual([
      { id: sameDay, plannedFor: inDays(3), tasks: [] },
      {
        id: oilPlan,
        plannedFor: inDays(6),
        tasks: [{ taskId: oil.id, name: 'Engine oil and filter' }],
      },
    ]);
    const dealerSide = await w.advisorAgent.get(api(w.dealer.id, '/bookings'));
    expect(dealerSide.body.data[0].items[0].plannedVisits).toEqual([]);

    // a proposal of other work on another day overlaps nothing
    const other = await w.advisorAgent.post(api(w.dealer.id, '/bookings')).send({
      customerId: org.id,
      proposedFor: inDays(9),
      items: [{ machineId: machine.id, taskIds: [hydraulic.id] }],
      note: '',
    });
    const again = await manager.get(api(org.id, '/bookings'));
    const byId = new Map(again.body.data.map((b: { id: string }) => [b.id, b]));
    expect(
      (byId.get(other.body.data.id) as { items: { plannedVisits: unknown[] }[] }).items[0]
        .plannedVisits,
    ).toEqual([]);

    const accepted = await manager
      .post(api(org.id, `/bookings/${proposed.body.data.id}/accept`))
      .send({ note: '' });
    expect(accepted.status).toBe(200);
    expect(accepted.body.data.items[0].plannedVisits).toEqual([]);
  });
});
