import { beforeEach, describe, expect, it } from 'vitest';
import request from 'supertest';
import { ServiceBooking, ServiceRecord } from '../../server/models';
import { countRows, resetDatabase } from '../support/db';
import { signedInAgent } from '../support/factories';
import { clearMail, mailTo } from '../support/mail';
import { addDaysIso, todayIso } from '../../shared/domain';
import { api, app, dealerWorld, TZ } from './dealer-fixture';

const inDays = (n: number) => addDaysIso(todayIso(TZ), n);

async function proposed() {
  const w = await dealerWorld();
  const { org, machine, oil, hydraulic } = w.serviced;
  const res = await w.advisorAgent.post(api(w.dealer.id, '/bookings')).send({
    customerId: org.id,
    proposedFor: inDays(3),
    items: [{ machineId: machine.id, taskIds: [oil.id, hydraulic.id] }],
    note: 'We can collect it Monday morning.',
  });
  expect(res.status).toBe(201);
  return { w, booking: res.body.data, manager: await signedInAgent(app, w.serviced.manager) };
}

describe('service bookings', () => {
  beforeEach(async () => {
    await resetDatabase();
    await clearMail();
  });

  it("booking — accept: the proposal becomes a planned service record on the farm's side (date, tasks, parts) and shows in the shop week; both sides see it accepted", async () => {
    const { w, booking, manager } = await proposed();
    const { org, machine, oil, hydraulic } = w.serviced;
    expect(booking).toMatchObject({
      status: 'proposed',
      proposedFor: inDays(3),
      customer: { id: org.id, name: 'Alder Farm' },
      dealer: { id: w.dealer.id, name: 'Test Dealer' },
      proposedBy: { id: w.advisor.id },
      items: [
        {
          machine: { id: machine.id, fleetNumber: 'A-01' },
          tasks: [
            { taskId: oil.id, name: 'Engine oil and filter' },
            { taskId: hydraulic.id, name: 'Hydraulic filters' },
          ],
          serviceRecordId: null,
        },
      ],
      abilities: { accept: false, decline: false, cancel: true },
    });
    const notice = await mailTo(w.serviced.manager.email);
    expect(notice.subject).toBe(`Test Dealer proposes a service on ${inDays(3)}`);
    const list = await manager.get(api(org.id, '/bookings'));
    expect(list.status).toBe(200);
    expect(list.body.data).toHaveLength(1);
    expect(list.body.data[0].abilities).toEqual({ accept: true, decline: true, cancel: false });
    const tech = await signedInAgent(app, w.serviced.tech);
    expect((await tech.get(api(org.id, '/bookings'))).body.data[0].abilities.accept).toBe(false);
    expect((await tech.post(api(org.id, `/bookings/${booking.id}/accept`)).send({})).status).toBe(
      403,
    );

    const accepted = await manager
      .post(api(org.id, `/bookings/${booking.id}/accept`))
      .send({ note: 'Monday suits.' });
    expect(accepted.status).toBe(200);
    expect(accepted.body.data).toMatchObject({
      status: 'accepted',
      responseNote: 'Monday suits.',
      decidedBy: { id: w.serviced.manager.id },
    });
    const recordId = accepted.body.data.items[0].serviceRecordId;
    const record = (await ServiceRecord.findByPk(recordId))!;
    expect(record).toMatchObject({
      organizationId: org.id,
      machineId: machine.id,
      status: 'planned',
      plannedFor: inDays(3),
    });
    expect(record.tasks.map((t) => t.taskId)).toEqual([oil.id, hydraulic.id]);
    expect(record.parts.map((p) => [p.partNumber, p.quantity])).toEqual([
      ['OF-100', 1],
      ['HF-200', 2],
    ]);
    expect(record.notes).toBe('Booked with Test Dealer. We can collect it Monday morning.');
    const week = await manager.get(api(org.id, `/shop-week?start=${inDays(3)}`));
    expect(week.status).toBe(200);
    const planned = week.body.data.days.flatMap((d: { planned: { id: string }[] }) => d.planned);
    expect(planned.map((p: { id: string }) => p.id)).toContain(recordId);
    const dealerSide = await w.advisorAgent.get(api(w.dealer.id, '/bookings'));
    expect(dealerSide.body.data[0]).toMatchObject({
      status: 'accepted',
      abilities: { cancel: false },
    });
    expect((await mailTo(w.advisor.email)).subject).toBe(
      `Alder Farm accepted the service on ${inDays(3)}`,
    );
    // answered once only
    expect(
      (await manager.post(api(org.id, `/bookings/${booking.id}/accept`)).send({})).status,
    ).toBe(409);
    expect(
      (await manager.post(api(org.id, `/bookings/${booking.id}/decline`)).send({})).status,
    ).toBe(409);
    expect(await countRows('service_records')).toBe(1);
  });

  it('booking — decline: no service record; the dealer sees it declined with the note; a withdrawn proposal cannot be answered', async () => {
    const { w, booking, manager } = await proposed();
    const { org } = w.serviced;
    const declined = await manager
      .post(api(org.id, `/bookings/${booking.id}/decline`))
      .send({ note: 'Our own shop will do it.' });
    expect(declined.status).toBe(200);
    expect(declined.body.data).toMatchObject({
      status: 'declined',
      responseNote: 'Our own shop will do it.',
    });
    expect(await countRows('service_records')).toBe(0);
    const dealerSide = await w.advisorAgent.get(api(w.dealer.id, '/bookings?status=declined'));
    expect(dealerSide.body.data.map((b: { id: string }) => b.id)).toEqual([booking.id]);
    // a second proposal, withdrawn by the dealer
    const second = await w.advisorAgent.post(api(w.dealer.id, '/bookings')).send({
      customerId: org.id,
      proposedFor: inDays(5),
      items: [{ machineId: w.serviced.machine.id }],
    });
    const cancelled = await w.advisorAgent.post(
      api(w.dealer.id, `/bookings/${second.body.data.id}/cancel`),
    );
    expect(cancelled.body.data.status).toBe('cancelled');
    expect(
      (await manager.post(api(org.id, `/bookings/${second.body.data.id}/accept`)).send({})).status,
    ).toBe(409);
    expect(await countRows('service_records')).toBe(0);
  });

  it('booking — 401; 400/422 with nothing written (past date, unknown machine or task, unlinked customer); 404 across organizations', async () => {
    const w = await dealerWorld();
    const { org, machine, oil } = w.serviced;
    const path = api(w.dealer.id, '/bookings');
    const good = { customerId: org.id, proposedFor: inDays(2), items: [{ machineId: machine.id }] };
    expect((await request(app).post(path).send(good)).status).toBe(401);
    expect((await request(app).get(path)).status).toBe(401);
    const a = w.advisorAgent;
    const missing = await a.post(path).send({ customerId: org.id, items: [] });
    expect(missing.status).toBe(400);
    expect(Object.keys(missing.body.error.fields).sort()).toEqual(['items', 'proposedFor']);
    const past = await a.post(path).send({ ...good, proposedFor: inDays(-1) });
    expect(past.status).toBe(422);
    expect(Object.keys(past.body.error.fields)).toEqual(['proposedFor']);
    const wrong = await a.post(path).send({
      ...good,
      items: [
        { machineId: machine.id, taskIds: [oil.id, w.viewed.oil.id] },
        { machineId: w.unlinked.machine.id },
      ],
    });
    expect(wrong.status).toBe(422);
    expect(wrong.body.error.fields).toEqual({
      'items.0.taskIds.1': "No such task on A-01's schedule",
      'items.1.machineId': 'No such machine at Alder Farm',
    });
    const unlinked = await a.post(path).send({
      ...good,
      customerId: w.unlinked.org.id,
      items: [{ machineId: w.unlinked.machine.id }],
    });
    expect(unlinked.status).toBe(422);
    expect(unlinked.body.error.fields).toEqual({ customerId: 'Not one of your linked customers' });
    expect(await countRows('service_bookings')).toBe(0);

    const created = await a.post(path).send(good);
    expect(created.status).toBe(201);
    const id = created.body.data.id;
    // another farm's manager, another dealer, and the dealer through its link: 404
    const stranger = await signedInAgent(app, w.unlinked.manager);
    expect(
      (await stranger.post(api(w.unlinked.org.id, `/bookings/${id}/accept`)).send({})).status,
    ).toBe(404);
    expect((await stranger.get(api(org.id, '/bookings'))).status).toBe(404);
    const other = await signedInAgent(app, w.otherAdvisor);
    expect((await other.post(api(w.otherDealer.id, `/bookings/${id}/cancel`))).status).toBe(404);
    expect((await a.get(api(org.id, '/bookings'))).status).toBe(404);
    expect((await a.post(api(org.id, `/bookings/${id}/accept`)).send({})).status).toBe(404);
    // a farm operator sees no bookings; a farm cannot propose
    const op = await signedInAgent(app, w.serviced.op);
    expect((await op.get(api(org.id, '/bookings'))).status).toBe(403);
    const manager = await signedInAgent(app, w.serviced.manager);
    expect((await manager.post(api(org.id, '/bookings')).send(good)).status).toBe(404);
    expect((await ServiceBooking.findByPk(id))!.status).toBe('proposed');
  });
});
