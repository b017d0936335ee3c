// Safety states belong to the farm: a dealer never closes, reads or names a farm's defects nor
// changes a machine's status; closing defects never releases a machine; returning it to service is
// its own noted step by the farm's technicians and managers.
import { beforeEach, describe, expect, it } from 'vitest';
import request from 'supertest';
import { countRows, resetDatabase } from '../support/db';
import { signedInAgent } from '../support/factories';
import { AuditEvent, Defect, Machine, type Organization } from '../../server/models';
import { todayIso } from '../../shared/domain';
import type { OrgAccess } from '../../server/policies/access';
import { canHandleDefects, defectAbilities } from '../../server/policies/defect';
import { canReturnToService } from '../../server/policies/machine';
import { api, app, dealerWorld, farmWithFleet, TZ } from './dealer-fixture';

const TITLE = 'Steering column: play past the limit';

/** A critical defect reported by the farm's technician: the machine is tagged out. */
async function criticalDefect(org: Organization, agent: request.Agent, machineId: string) {
  const res = await agent
    .post(api(org.id, `/machines/${machineId}/defects`))
    .send({ title: TITLE, description: 'Found on the morning check', severity: 'critical' });
  expect(res.status).toBe(201);
  expect(res.body.machine.status).toBe('tagged_out');
  return res.body.data.id as string;
}

const completed = (extra: Record<string, unknown> = {}) => ({
  status: 'completed',
  performedOn: todayIso(TZ),
  meterValue: 1305,
  ...extra,
});

const statusOf = async (id: string) => (await Machine.findByPk(id))!.status;
const defectStatus = async (id: string) => (await Defect.findByPk(id))!.status;

describe('safety states — dealers', () => {
  beforeEach(resetDatabase);

  it('service link — a service record that names a defect is refused (403) naming no defect; nothing is written, the machine stays tagged out', async () => {
    const w = await dealerWorld();
    const { org, machine, tech } = w.serviced;
    const defectId = await criticalDefect(org, await signedInAgent(app, tech), machine.id);
    const records = api(org.id, `/machines/${machine.id}/service-records`);
    for (const ids of [[defectId], ['00000000-0000-4000-8000-000000000000']]) {
      const res = await w.advisorAgent.post(records).send(completed({ closesDefectIds: ids }));
      expect(res.status).toBe(403);
      expect(Object.keys(res.body.error.fields)).toEqual(['closesDefectIds']);
      expect(JSON.stringify(res.body)).not.toContain('Steering');
    }
    const plan = await w.advisorAgent
      .post(records)
      .send({ status: 'planned', plannedFor: todayIso(TZ), closesDefectIds: [defectId] });
    expect(plan.status).toBe(403);
    expect(await countRows('service_records')).toBe(0);
    expect(await defectStatus(defectId)).toBe('open');
    expect(await statusOf(machine.id)).toBe('tagged_out');
  });

  it("service link — completing the farm's plan that names a defect leaves the defect open and the machine tagged out; no answer lists the farm's defects", async () => {
    const w = await dealerWorld();
    const { org, machine, tech } = w.serviced;
    const techAgent = await signedInAgent(app, tech);
    const defectId = await criticalDefect(org, techAgent, machine.id);
    const plan = await techAgent
      .post(api(org.id, `/machines/${machine.id}/service-records`))
      .send({ status: 'planned', plannedFor: todayIso(TZ), closesDefectIds: [defectId] });
    expect(plan.body.data.defectIds).toEqual([defectId]);
    const recordUrl = api(org.id, `/service-records/${plan.body.data.id}`);

    const seen = await w.advisorAgent.get(recordUrl);
    expect(seen.status).toBe(200);
    expect(seen.body.data.defectIds).toEqual([]);
    const history = await w.advisorAgent.get(
      api(org.id, `/machines/${machine.id}/service-records`),
    );
    expect(history.body.data[0].defectIds).toEqual([]);
    const refused = await w.advisorAgent.patch(recordUrl).send({ closesDefectIds: [defectId] });
    expect(refused.status).toBe(403);
    const sentBack = await w.advisorAgent
      .patch(recordUrl)
      .send({ closesDefectIds: [], notes: 'x' });
    expect(sentBack.status).toBe(200);
    expect(
      (await techAgent.get(recordUrl)).body.data.defectIds,
      "the dealer's empty list left the plan's defects as they were",
    ).toEqual([defectId]);

    const done = await w.advisorAgent.post(`${recordUrl}/complete`).send({
      performedOn: todayIso(TZ),
      meterValue: 1305,
      closesDefectIds: [defectId],
    });
    expect(done.status).toBe(403);
    const ok = await w.advisorAgent
      .post(`${recordUrl}/complete`)
      .send({ performedOn: todayIso(TZ), meterValue: 1305 });
    expect(ok.status).toBe(200);
    expect(ok.body.data).toMatchObject({ status: 'completed', defectIds: [] });
    expect(await defectStatus(defectId)).toBe('open');
    expect(await statusOf(machine.id)).toBe('tagged_out');
    for (const res of [seen, history, refused, sentBack, done, ok])
      expect(JSON.stringify(res.body)).not.toContain('Steering');
  });

  it.each(['service', 'view'] as const)(
    '%s link — defects, return to service and status edits answer 404; the machine page says tagged out and since when, never why',
    async (access) => {
      const w = await dealerWorld();
      const farm = access === 'service' ? w.serviced : w.viewed;
      const { org, machine, tech } = farm;
      const defectId = await criticalDefect(org, await signedInAgent(app, tech), machine.id);
      const a = w.advisorAgent;
      const refusals = await Promise.all([
        a.get(api(org.id, '/defects')),
        a.get(api(org.id, `/machines/${machine.id}/defects`)),
        a.get(api(org.id, `/defects/${defectId}`)),
        a.patch(api(org.id, `/defects/${defectId}`)).send({ severity: 'minor' }),
        a.post(api(org.id, `/defects/${defectId}/close`)).send({ note: 'fixed at the dealer' }),
        a.post(api(org.id, `/machines/${machine.id}/return-to-service`)).send({ note: 'ok' }),
        a.patch(api(org.id, `/machines/${machine.id}`)).send({ status: 'in_service' }),
      ]);
      for (const res of refusals) {
        expect(res.status).toBe(404);
        expect(JSON.stringify(res.body)).not.toContain('Steering');
      }
      const page = await a.get(api(org.id, `/machines/${machine.id}`));
      expect(page.status).toBe(200);
      expect(page.body.data.status).toBe('tagged_out');
      expect(page.body.data.tagOut).toEqual({
        since: expect.any(String),
        reason: null,
        openCriticalDefects: null,
      });
      expect(page.body.abilities.returnToService).toBe(false);
      const list = await a.get(api(org.id, '/machines'));
      for (const res of [page, list]) expect(JSON.stringify(res.body)).not.toContain('Steering');
      expect(await defectStatus(defectId)).toBe('open');
      expect(await statusOf(machine.id)).toBe('tagged_out');
    },
  );
});

describe('safety states — return to service', () => {
  beforeEach(resetDatabase);

  it('return to service — 401, 400 without a note, 404 across organizations, 403 for an operator, 409 while a critical defect is open, then 200 and audited', async () => {
    const farm = await farmWithFleet('Alder Farm', 'A-01');
    const other = await farmWithFleet('Birch Farm', 'B-01');
    const { org, machine, tech, manager, op } = farm;
    const url = api(org.id, `/machines/${machine.id}/return-to-service`);
    const techAgent = await signedInAgent(app, tech);
    const note = 'Steering box adjusted, play within the manual limit; test drive in the yard';

    expect((await request(app).post(url).send({ note })).status).toBe(401);
    const notTagged = await techAgent.post(url).send({ note });
    expect([notTagged.status, notTagged.body.error.code]).toEqual([409, 'not_tagged_out']);

    const defectId = await criticalDefect(org, techAgent, machine.id);
    const audits = await countRows('audit_events');
    const noNote = await techAgent.post(url).send({ note: '   ' });
    expect(noNote.status).toBe(400);
    expect(noNote.body.error.fields.note).toBe(
      'Say what was checked before returning it to service',
    );
    expect((await (await signedInAgent(app, other.manager)).post(url).send({ note })).status).toBe(
      404,
    );
    const opRes = await (await signedInAgent(app, op)).post(url).send({ note });
    expect(opRes.status).toBe(403);
    await Defect.update({ status: 'in_repair' }, { where: { id: defectId } });
    const blocked = await techAgent.post(url).send({ note });
    expect(blocked.status).toBe(409);
    expect(blocked.body.error).toMatchObject({
      code: 'critical_defects_open',
      message:
        'A-01 stays tagged out: 1 critical defect is still open (1 in repair). Close it first, then return it to service.',
    });
    expect(await countRows('audit_events')).toBe(audits);
    expect(await statusOf(machine.id)).toBe('tagged_out');

    const closed = await techAgent
      .post(api(org.id, `/defects/${defectId}/close`))
      .send({ note: 'Steering box adjusted' });
    expect(closed.body).toMatchObject({
      machine: { status: 'tagged_out' },
      openCriticalDefects: 0,
    });
    const managerAgent = await signedInAgent(app, manager);
    const detail = await managerAgent.get(api(org.id, `/machines/${machine.id}`));
    expect(detail.body.data.tagOut).toEqual({
      since: expect.any(String),
      reason: `Critical defect reported: ${TITLE}`,
      openCriticalDefects: 0,
    });
    expect(detail.body.abilities.returnToService).toBe(true);
    const res = await managerAgent.post(url).send({ note });
    expect(res.status).toBe(200);
    expect(res.body.data).toMatchObject({ fleetNumber: 'A-01', status: 'in_service' });
    const event = (await AuditEvent.findOne({ where: { action: 'machine.return_to_service' } }))!;
    expect(event).toMatchObject({ actorUserId: manager.id, entityId: machine.id });
    expect(event.changes).toEqual({ note });
    expect((await managerAgent.get(api(org.id, `/machines/${machine.id}`))).body.data.tagOut).toBe(
      null,
    );
  });

  it('closing the last critical defect — by the defect page or by a service record — leaves the machine tagged out', async () => {
    const { org, machine, tech } = await farmWithFleet('Alder Farm');
    const techAgent = await signedInAgent(app, tech);
    const first = await criticalDefect(org, techAgent, machine.id);
    const second = await criticalDefect(org, techAgent, machine.id);
    const close = await techAgent
      .post(api(org.id, `/defects/${first}/close`))
      .send({ note: 'New steering joint' });
    expect(close.body).toMatchObject({ machine: { status: 'tagged_out' }, openCriticalDefects: 1 });
    const record = await techAgent
      .post(api(org.id, `/machines/${machine.id}/service-records`))
      .send(completed({ closesDefectIds: [second], notes: 'Column bearing replaced' }));
    expect(record.status).toBe(201);
    expect(await defectStatus(second)).toBe('fixed');
    expect(await statusOf(machine.id)).toBe('tagged_out');
    expect(await AuditEvent.count({ where: { action: 'machine.return_to_service' } })).toBe(0);
  });

  it('machine edit — "in service" on a tagged-out machine is refused (422 on status) and changes nothing; the step is named', async () => {
    const { org, machine, tech, manager } = await farmWithFleet('Alder Farm');
    await criticalDefect(org, await signedInAgent(app, tech), machine.id);
    const managerAgent = await signedInAgent(app, manager);
    const res = await managerAgent
      .patch(api(org.id, `/machines/${machine.id}`))
      .send({ status: 'in_service', notes: 'back in use' });
    expect(res.status).toBe(422);
    expect(res.body.error.fields.status).toMatch(/Return to service/);
    const stored = (await Machine.findByPk(machine.id))!;
    expect([stored.status, stored.notes]).toEqual(['tagged_out', machine.notes]);
  });
});

describe('safety states — policies (truth table)', () => {
  const farm = { id: 'farm', kind: 'farm' } as unknown as Organization;
  const member = (role: 'manager' | 'technician' | 'operator'): OrgAccess => ({
    organization: farm,
    userId: 'u',
    role,
    via: 'member',
  });
  const dealer = (dealerAccess: 'view' | 'service'): OrgAccess => ({
    organization: farm,
    userId: 'u',
    role: 'advisor',
    via: 'dealer',
    dealerAccess,
    dealerOrganizationId: 'd',
    dealerLinkId: 'l',
  });
  it.each([
    ['manager', true, member('manager')],
    ['technician', true, member('technician')],
    ['operator', false, member('operator')],
    ['advisor, service link', false, dealer('service')],
    ['advisor, view link', false, dealer('view')],
  ] as const)(
    '%s — handles defects and returns machines to service: %s',
    (_who, allowed, access) => {
      expect(canHandleDefects(access)).toBe(allowed);
      expect(canReturnToService(access)).toBe(allowed);
      expect(defectAbilities(access)).toEqual({
        update: allowed,
        close: allowed,
        returnToService: allowed,
      });
    },
  );
});
