import { beforeEach, describe, expect, it } from 'vitest';
import request from 'supertest';
import { format, parseISO, startOfISOWeek } from 'date-fns';
import { resetDatabase } from '../support/db';
import { signedInAgent } from '../support/factories';
import { addDaysIso, todayIso } from '../../shared/domain';
import { api, app, dealerWorld, TZ } from './dealer-fixture';

// The dealer's next 16 weeks across its customers (issue 17): the farms of dealer-fixture.ts
// (Alder: service link, Birch: view link, Cedar: not linked); weeks from this Monday, by date-fns.
const monday = () => format(startOfISOWeek(parseISO(todayIso(TZ))), 'yyyy-MM-dd');

describe('shop outlook — the dealer across its customers', () => {
  beforeEach(async () => {
    await resetDatabase();
  });

  it('linked customers only; plans of service-link customers only; its own proposal awaiting the farm, on both sides; one customer; 404 for a customer not linked', async () => {
    const w = await dealerWorld();
    const plan = (f: typeof w.serviced) =>
      f.org &&
      signedInAgent(app, f.tech).then((agent) =>
        agent.post(api(f.org.id, `/machines/${f.machine.id}/service-records`)).send({
          status: 'planned',
          plannedFor: addDaysIso(monday(), 8),
          taskIds: [f.hydraulic.id],
        }),
      );
    const [alder, birch, cedar] = await Promise.all([
      plan(w.serviced),
      plan(w.viewed),
      plan(w.unlinked),
    ]);
    for (const r of [alder, birch, cedar]) expect(r.status).toBe(201);

    const url = api(w.dealer.id, '/customer-outlook');
    const res = await w.advisorAgent.get(url);
    expect(res.status).toBe(200);
    const data = res.body.data;
    expect(data.weeks).toHaveLength(16);
    expect(data.customers.map((c: { name: string }) => c.name)).toEqual([
      'Alder Farm',
      'Birch Farm',
    ]);
    type Item = { customer: { name: string }; taskName: string; status: string };
    const services: Item[] = data.weeks.flatMap((wk: { services: Item[] }) => wk.services);
    const farms = [...new Set(services.map((s) => s.customer.name))].sort();
    expect(farms).toEqual(['Alder Farm', 'Birch Farm']);
    // the overdue oil change of each customer is in the first week
    const first = data.weeks[0].services as Item[];
    expect(
      first
        .filter((s) => s.status === 'overdue')
        .map((s) => s.customer.name)
        .sort(),
    ).toEqual(['Alder Farm', 'Birch Farm']);
    const planned = data.weeks.flatMap((wk: { planned: unknown[] }) => wk.planned);
    expect(planned).toEqual([
      expect.objectContaining({
        id: alder.body.data.id,
        customer: { id: w.serviced.org.id, name: 'Alder Farm' },
      }),
    ]);
    expect(data.weeks[1].planned).toHaveLength(1);
    expect(data.weeks[1].plannedLabourHours).toBe(1);

    // the dealer's own proposal awaiting Alder Farm, in week 4 (M+22), beside the plans
    const M = monday();
    const booking = await w.advisorAgent.post(api(w.dealer.id, '/bookings')).send({
      customerId: w.serviced.org.id,
      proposedFor: addDaysIso(M, 22),
      items: [{ machineId: w.serviced.machine.id, taskIds: [w.serviced.oil.id] }],
    });
    expect(booking.status).toBe(201);
    const proposal = {
      id: booking.body.data.id,
      plannedFor: addDaysIso(M, 22),
      machine: { id: w.serviced.machine.id, fleetNumber: 'A-01', name: 'Alder Farm tractor' },
      tasks: 1,
      labourHours: 1,
      labourUnknown: 0,
    };
    const withProposal = (await w.advisorAgent.get(url)).body.data;
    expect(withProposal.weeks[3].proposed).toEqual([
      { ...proposal, customer: { id: w.serviced.org.id, name: 'Alder Farm' } },
    ]);
    expect(withProposal.weeks[3].proposedLabourHours).toBe(1);
    expect(withProposal.weeks.flatMap((wk: { proposed: unknown[] }) => wk.proposed)).toHaveLength(
      1,
    );
    // the farm's shop sees the same proposal awaiting its decision
    const farmSide = await (
      await signedInAgent(app, w.serviced.tech)
    ).get(api(w.serviced.org.id, '/shop-outlook'));
    expect(farmSide.body.data.weeks[3].proposed).toEqual([{ ...proposal, customer: null }]);

    const one = await w.advisorAgent.get(url).query({ customerId: w.viewed.org.id, weeks: 2 });
    expect(one.status).toBe(200);
    expect(one.body.data.weeks).toHaveLength(2);
    const oneFarms = one.body.data.weeks.flatMap((wk: { services: Item[] }) =>
      wk.services.map((s) => s.customer.name),
    );
    expect(new Set(oneFarms)).toEqual(new Set(['Birch Farm']));

    const notLinked = await w.advisorAgent.get(url).query({ customerId: w.unlinked.org.id });
    expect(notLinked.status).toBe(404);
    const bad = await w.advisorAgent.get(url).query({ weeks: 0 });
    expect(bad.status).toBe(400);
    expect(bad.body.error.fields).toHaveProperty('weeks');
  });

  it('roles — an advisor without links sees empty weeks; a farm manager gets 404; signed out 401', async () => {
    const w = await dealerWorld();
    const lone = await signedInAgent(app, w.otherAdvisor);
    const res = await lone.get(api(w.otherDealer.id, '/customer-outlook'));
    expect(res.status).toBe(200);
    expect(res.body.data.customers).toEqual([]);
    expect(res.body.data.weeks.flatMap((wk: { services: unknown[] }) => wk.services)).toEqual([]);
    // another dealer's outlook is not there
    expect((await lone.get(api(w.dealer.id, '/customer-outlook'))).status).toBe(404);
    const manager = await signedInAgent(app, w.serviced.manager);
    expect((await manager.get(api(w.serviced.org.id, '/customer-outlook'))).status).toBe(404);
    expect((await request(app).get(api(w.dealer.id, '/customer-outlook'))).status).toBe(401);
  });
});
