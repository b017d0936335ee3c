import { beforeEach, describe, expect, it } from 'vitest';
import request from 'supertest';
import {
  AuditEvent,
  DealerLink,
  Membership,
  ServiceRecord,
  ServiceTask,
  TaskDuePoint,
} from '../../server/models';
import { countRows, resetDatabase } from '../support/db';
import { createMember, signedInAgent } from '../support/factories';
import { todayIso } from '../../shared/domain';
import { api, app, dealerWorld, linkDealer, TZ } from './dealer-fixture';

describe('dealer access to a linked farm', () => {
  beforeEach(resetDatabase);

  it('dealer access — no dealer sees a farm it is not linked to (404), nor through a pending or revoked link, nor another dealer', async () => {
    const w = await dealerWorld();
    await linkDealer(w.dealer, w.unlinked.org, 'service', 'revoked');
    const pending = await DealerLink.create({
      dealerOrganizationId: w.dealer.id,
      farmOrganizationId: null,
      access: 'view',
      status: 'pending',
      initiatedBy: 'dealer',
      invitedBy: w.advisor.id,
      invitedEmail: 'someone@test.example',
      tokenHash: 'x'.repeat(64),
      expiresAt: new Date(Date.now() + 86_400_000),
      acceptedBy: null,
      acceptedAt: null,
      revokedBy: null,
      revokedAt: null,
    });
    expect(pending.status).toBe('pending');
    const a = w.advisorAgent;
    expect((await a.get(api(w.serviced.org.id, '/machines'))).status).toBe(200);
    expect((await a.get(api(w.viewed.org.id, '/machines'))).status).toBe(200);
    for (const path of ['/machines', '/due', `/machines/${w.unlinked.machine.id}`])
      expect((await a.get(api(w.unlinked.org.id, path))).status).toBe(404);
    // a machine id of the unlinked farm asked under a linked farm's id
    expect((await a.get(api(w.serviced.org.id, `/machines/${w.unlinked.machine.id}`))).status).toBe(
      404,
    );
    const other = await signedInAgent(app, w.otherAdvisor);
    expect((await other.get(api(w.serviced.org.id, '/machines'))).status).toBe(404);
    expect((await request(app).get(api(w.serviced.org.id, '/machines'))).status).toBe(401);
  });

  it('dealer access — revoking ends access on the next request (404); changing service to view hides history at once', async () => {
    const w = await dealerWorld();
    const a = w.advisorAgent;
    const history = api(w.serviced.org.id, `/machines/${w.serviced.machine.id}/service-records`);
    expect((await a.get(history)).status).toBe(200);
    const manager = await signedInAgent(app, w.serviced.manager);
    const changed = await manager
      .patch(api(w.serviced.org.id, `/dealers/${w.serviceLink.id}`))
      .send({ access: 'view' });
    expect(changed.status).toBe(200);
    expect(changed.body.data).toMatchObject({ access: 'view', status: 'active' });
    expect((await a.get(history)).status).toBe(404);
    expect((await a.get(api(w.serviced.org.id, '/machines'))).status).toBe(200);
    const revoked = await manager.post(
      api(w.serviced.org.id, `/dealers/${w.serviceLink.id}/revoke`),
    );
    expect(revoked.status).toBe(200);
    expect(revoked.body.data.status).toBe('revoked');
    for (const path of ['/machines', '/due', `/machines/${w.serviced.machine.id}/readings`])
      expect((await a.get(api(w.serviced.org.id, path))).status).toBe(404);
    // the board no longer lists the farm either
    const board = await a.get(api(w.dealer.id, '/board?horizon=90'));
    expect(
      board.body.data.map((r: { customer: { name: string } }) => r.customer.name),
    ).not.toContain('Alder Farm');
  });

  it('dealer access — `view` reads machines, readings, due points and tasks, but never service history (404) and writes nothing', async () => {
    const w = await dealerWorld();
    const a = w.advisorAgent;
    const { org, machine, oil } = w.viewed;
    const record = await ServiceRecord.create({
      organizationId: org.id,
      machineId: machine.id,
      status: 'planned',
      plannedFor: todayIso(TZ),
      performedOn: null,
      meterValue: null,
      meterLifetime: null,
      readingId: null,
      labourHours: null,
      createdBy: null,
      completedBy: null,
      completedAt: null,
    });
    for (const path of [
      '/machines',
      `/machines/${machine.id}`,
      `/machines/${machine.id}/readings`,
      '/readings/latest',
      '/due',
      `/machines/${machine.id}/due`,
      `/machines/${machine.id}/tasks`,
    ]) {
      const res = await a.get(api(org.id, path));
      expect([path, res.status]).toEqual([path, 200]);
    }
    const detail = await a.get(api(org.id, `/machines/${machine.id}`));
    expect(detail.body.abilities).toEqual({
      update: false,
      editSchedule: false,
      setLastDone: false,
      logReading: false,
      correctReading: false,
      replaceMeter: false,
      returnToService: false,
      restrict: false,
      liftRestriction: false,
    });
    for (const path of [
      `/machines/${machine.id}/service-records`,
      `/service-records/${record.id}`,
      `/machines/${machine.id}/measurements`,
      `/machines/${machine.id}/measurements/series?name=Clutch`,
      '/shop-week',
      '/members',
      '/defects',
      '/walkarounds',
      '/notifications',
      '/audit-events',
      '/bookings',
    ]) {
      const res = await a.get(api(org.id, path));
      expect([path, res.status]).toEqual([path, 404]);
    }
    const readingsBefore = await countRows('meter_readings');
    const writes = [
      a.post(api(org.id, `/machines/${machine.id}/readings`)).send({ value: 1310 }),
      a.patch(api(org.id, `/machines/${machine.id}`)).send({ name: 'Renamed' }),
      a.post(api(org.id, `/machines/${machine.id}/service-records`)).send({
        status: 'completed',
        performedOn: todayIso(TZ),
        meterValue: 1301,
        taskIds: [oil.id],
      }),
      a
        .put(api(org.id, `/tasks/${oil.id}/last-done`))
        .send({ lastDoneMeter: 1300, lastDoneOn: todayIso(TZ) }),
      a.post(api(org.id, '/machines')).send({ fleetNumber: 'X', name: 'X', category: 'tractor' }),
    ];
    for (const res of await Promise.all(writes)) expect(res.status).toBe(404);
    expect(await countRows('meter_readings')).toBe(readingsBefore);
    expect(await countRows('service_records')).toBe(1);
    expect((await ServiceTask.findByPk(oil.id))!.lastDoneMeter).toBe(1000);
  });

  it('dealer access — a `service` link records a service that resets the farm task and its due point; schedule, readings and team stay the farm\u2019s', async () => {
    const w = await dealerWorld();
    const a = w.advisorAgent;
    const { org, machine, oil, hydraulic } = w.serviced;
    const before = (await TaskDuePoint.findOne({ where: { taskId: oil.id } }))!;
    expect(before.status).toBe('overdue');
    const res = await a.post(api(org.id, `/machines/${machine.id}/service-records`)).send({
      status: 'completed',
      performedOn: todayIso(TZ),
      meterValue: 1320,
      taskIds: [oil.id],
      notes: 'Done at the dealer shop',
    });
    expect(res.status).toBe(201);
    expect(res.body.resets).toEqual([
      expect.objectContaining({ taskId: oil.id, reset: true, lastDoneMeter: 1320 }),
    ]);
    const task = (await ServiceTask.findByPk(oil.id))!;
    expect([task.lastDoneMeter, task.lastDoneOn]).toEqual([1320, todayIso(TZ)]);
    const after = (await TaskDuePoint.findOne({ where: { taskId: oil.id } }))!;
    expect(after.status).toBe('ok');
    expect(after.due.dueMeter).toBe(1570);
    expect((await ServiceTask.findByPk(hydraulic.id))!.lastDoneMeter).toBe(900);
    // the farm sees it in the history; the dealer sees the history too
    const history = await a.get(api(org.id, `/machines/${machine.id}/service-records`));
    expect(history.status).toBe(200);
    expect(history.body.data).toHaveLength(1);
    // a plan, then its completion, through the same link
    const plan = await a.post(api(org.id, `/machines/${machine.id}/service-records`)).send({
      status: 'planned',
      plannedFor: todayIso(TZ),
      taskIds: [hydraulic.id],
    });
    expect(plan.status).toBe(201);
    expect(plan.body.abilities).toMatchObject({ complete: true, cancel: true });
    const done = await a
      .post(api(org.id, `/service-records/${plan.body.data.id}/complete`))
      .send({ performedOn: todayIso(TZ), meterValue: 1320 });
    expect([done.status, done.body.error?.message]).toEqual([200, undefined]);
    expect((await ServiceTask.findByPk(hydraulic.id))!.lastDoneMeter).toBe(1320);
    // what stays with the farm: schedule edits, last-done, readings entry, machines, team
    for (const res2 of [
      await a
        .post(api(org.id, `/machines/${machine.id}/tasks`))
        .send({ name: 'New', intervalMeter: 100 }),
      await a.patch(api(org.id, `/tasks/${oil.id}`)).send({ intervalMeter: 300 }),
      await a.post(api(org.id, `/machines/${machine.id}/readings`)).send({ value: 1330 }),
      await a.patch(api(org.id, `/machines/${machine.id}`)).send({ name: 'Renamed' }),
      await a.get(api(org.id, '/members')),
      await a.get(api(org.id, '/defects')),
    ])
      expect(res2.status).toBe(404);
  });

  it('dealer access — every dealer read is in the farm audit log; the manager reads it filtered by dealer (technician 403, dealer 404)', async () => {
    const w = await dealerWorld();
    const a = w.advisorAgent;
    const { org, machine } = w.serviced;
    await a.get(api(org.id, '/machines'));
    await a.get(api(org.id, `/machines/${machine.id}/readings?limit=5`));
    const reads = await AuditEvent.findAll({
      where: { organizationId: org.id, action: 'dealer.read' },
      order: [['id', 'ASC']],
    });
    expect(reads.map((e) => [e.entityType, e.entityId, e.changes.path])).toEqual([
      ['machines', null, `/api/v1/organizations/${org.id}/machines`],
      [
        'machines/readings',
        machine.id,
        `/api/v1/organizations/${org.id}/machines/${machine.id}/readings`,
      ],
    ]);
    expect(reads[0].actorUserId).toBe(w.advisor.id);
    expect(reads[0].changes).toMatchObject({
      dealerOrganizationId: w.dealer.id,
      access: 'service',
    });
    // a farm member's own reads are not logged
    const tech = await signedInAgent(app, w.serviced.tech);
    await tech.get(api(org.id, '/machines'));
    expect(await AuditEvent.count({ where: { action: 'dealer.read' } })).toBe(2);

    const manager = await signedInAgent(app, w.serviced.manager);
    const log = await manager.get(api(org.id, `/audit-events?dealerOrganizationId=${w.dealer.id}`));
    expect(log.status).toBe(200);
    expect(log.body.meta.total).toBe(2);
    expect(log.body.data[0]).toMatchObject({
      action: 'dealer.read',
      entityType: 'machines/readings',
      actor: { id: w.advisor.id },
      dealer: { id: w.dealer.id, name: 'Test Dealer' },
    });
    expect(log.body.dealers).toEqual([{ id: w.dealer.id, name: 'Test Dealer' }]);
    const other = await manager.get(
      api(org.id, `/audit-events?dealerOrganizationId=${w.otherDealer.id}`),
    );
    expect(other.body.data).toEqual([]);
    expect((await manager.get(api(org.id, '/audit-events?pageSize=0'))).status).toBe(400);
    expect((await tech.get(api(org.id, '/audit-events'))).status).toBe(403);
    expect((await a.get(api(org.id, '/audit-events'))).status).toBe(404);
    const strangerOrg = w.unlinked.org;
    const stranger = await signedInAgent(app, w.unlinked.manager);
    expect((await stranger.get(api(org.id, '/audit-events'))).status).toBe(404);
    expect((await request(app).get(api(strangerOrg.id, '/audit-events'))).status).toBe(401);
  });

  it('dealer access — an advisor who is also a member of the farm acts as the member (no dealer reads logged)', async () => {
    const w = await dealerWorld();
    const { user } = await createMember(w.dealer, 'advisor');
    await Membership.create({
      organizationId: w.serviced.org.id,
      userId: user.id,
      role: 'technician',
    });
    const agent = await signedInAgent(app, user);
    expect((await agent.get(api(w.serviced.org.id, '/members'))).status).toBe(200);
    expect(await AuditEvent.count({ where: { action: 'dealer.read' } })).toBe(0);
  });
});
