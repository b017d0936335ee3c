import { beforeEach, describe, expect, it } from 'vitest';
import request from 'supertest';
import { createApp } from '../../server/app';
import { countRows, resetDatabase } from '../support/db';
import {
  addReadings,
  createMachine,
  createMember,
  createOrganization,
  signedInAgent,
} from '../support/factories';
import { AuditEvent, Defect, Machine, MachineOperator } from '../../server/models';
import { todayIso } from '../../shared/domain';

const app = createApp();

async function shop() {
  const org = await createOrganization({ timeZone: 'America/Chicago' });
  const { user: tech } = await createMember(org, 'technician');
  const { user: manager } = await createMember(org, 'manager');
  const { user: op } = await createMember(org, 'operator');
  const t1 = await createMachine(org, { fleetNumber: 'T-01' });
  const t2 = await createMachine(org, { fleetNumber: 'T-02' });
  const { user: other } = await createMember(org, 'operator');
  await MachineOperator.create({ organizationId: org.id, machineId: t2.id, userId: other.id });
  const base = `/api/v1/organizations/${org.id}`;
  return {
    org,
    tech,
    manager,
    op,
    t1,
    t2,
    base,
    techAgent: await signedInAgent(app, tech),
    opAgent: await signedInAgent(app, op),
    otherAgent: await signedInAgent(app, other),
  };
}

const report = (
  agent: Awaited<ReturnType<typeof signedInAgent>>,
  base: string,
  machineId: string,
  body: Record<string, unknown>,
) => agent.post(`${base}/machines/${machineId}/defects`).send(body);

describe('defects', () => {
  beforeEach(resetDatabase);

  it('defects — 401 without sign-in; an operator reports one (201); bad input 400 naming the field, nothing written', async () => {
    const s = await shop();
    expect((await request(app).get(`${s.base}/defects`)).status).toBe(401);
    const bad = await report(s.opAgent, s.base, s.t1.id, { title: '', severity: 'urgent' });
    expect(bad.status).toBe(400);
    expect(bad.body.error.fields).toEqual({
      title: 'Say what is wrong',
      severity: 'Severity must be one of: critical, major, minor',
    });
    expect(await countRows('defects')).toBe(0);
    const res = await report(s.opAgent, s.base, s.t1.id, {
      title: 'Cab door latch broken',
      description: 'Door swings open on rough ground',
    });
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({
      data: {
        title: 'Cab door latch broken',
        severity: 'major',
        status: 'open',
        machine: { fleetNumber: 'T-01', status: 'in_service' },
        reportedBy: { id: s.op.id },
        assignedTo: null,
      },
      abilities: { update: false, close: false, returnToService: false },
      taggedOut: false,
      message: null,
    });
  });

  it('defects — the shop list: worst first, filters by severity, machine and assignee; operators see only their machines', async () => {
    const s = await shop();
    await report(s.techAgent, s.base, s.t1.id, { title: 'Seat torn', severity: 'minor' });
    await report(s.techAgent, s.base, s.t1.id, { title: 'Steering play', severity: 'critical' });
    await report(s.techAgent, s.base, s.t2.id, { title: 'Hydraulic weep at the loader valve' });
    const list = await s.techAgent.get(`${s.base}/defects`);
    expect(list.status).toBe(200);
    expect(list.body.data.map((d: { title: string }) => d.title)).toEqual([
      'Steering play',
      'Hydraulic weep at the loader valve',
      'Seat torn',
    ]);
    expect(list.body.meta).toMatchObject({
      total: 3,
      activeBySeverity: { critical: 1, major: 1, minor: 1 },
    });
    expect(list.body.abilities).toEqual({ update: true, close: true, returnToService: true });
    const minor = await s.techAgent.get(`${s.base}/defects?severity=minor`);
    expect(minor.body.data.map((d: { title: string }) => d.title)).toEqual(['Seat torn']);
    const t2 = await s.techAgent.get(`${s.base}/machines/${s.t2.id}/defects`);
    expect(t2.body.data).toHaveLength(1);
    // T-02 is assigned to another operator: this operator sees T-01's defects only
    const mine = await s.opAgent.get(`${s.base}/defects`);
    expect(
      mine.body.data.map((d: { machine: { fleetNumber: string } }) => d.machine.fleetNumber),
    ).toEqual(['T-01', 'T-01']);
    expect((await s.opAgent.get(`${s.base}/machines/${s.t2.id}/defects`)).status).toBe(404);
    const hidden = list.body.data.find(
      (d: { machine: { id: string } }) => d.machine.id === s.t2.id,
    );
    expect((await s.opAgent.get(`${s.base}/defects/${hidden.id}`)).status).toBe(404);
    const first = list.body.data[0].id;
    await s.techAgent.patch(`${s.base}/defects/${first}`).send({ assignedTo: s.tech.id });
    const assigned = await s.techAgent.get(`${s.base}/defects?assignedTo=me`);
    expect(assigned.body.data.map((d: { id: string }) => d.id)).toEqual([first]);
    const unassigned = await s.techAgent.get(`${s.base}/defects?assignedTo=none`);
    expect(unassigned.body.data).toHaveLength(2);
    const badQuery = await s.techAgent.get(`${s.base}/defects?status=closed`);
    expect(badQuery.status).toBe(400);
    expect(badQuery.body.error.fields.status).toMatch(/active, all, open, in_repair or fixed/);
  });

  it('defects — 404 across organizations (list filter, detail, update, close, report)', async () => {
    const s = await shop();
    const res = await report(s.techAgent, s.base, s.t1.id, {
      title: 'Mirror cracked',
      severity: 'minor',
    });
    const id = res.body.data.id;
    const other = await createOrganization();
    const { user: stranger } = await createMember(other, 'manager');
    const a = await signedInAgent(app, stranger);
    expect((await a.get(`${s.base}/defects`)).status).toBe(404);
    expect((await a.get(`/api/v1/organizations/${other.id}/defects/${id}`)).status).toBe(404);
    expect(
      (await a.get(`/api/v1/organizations/${other.id}/defects?machineId=${s.t1.id}`)).status,
    ).toBe(404);
    expect(
      (
        await a
          .patch(`/api/v1/organizations/${other.id}/defects/${id}`)
          .send({ status: 'in_repair' })
      ).status,
    ).toBe(404);
    expect(
      (await a.post(`/api/v1/organizations/${other.id}/defects/${id}/close`).send({ note: 'x' }))
        .status,
    ).toBe(404);
    expect(
      (await report(a, `/api/v1/organizations/${other.id}`, s.t1.id, { title: 'x' })).status,
    ).toBe(404);
    expect((await Defect.findByPk(id))!.status).toBe('open');
  });

  it('defects — assign to a technician, move to in repair; an operator may not (403); assigning an operator is refused (422)', async () => {
    const s = await shop();
    const res = await report(s.opAgent, s.base, s.t1.id, {
      title: 'Beacon out',
      severity: 'minor',
    });
    const url = `${s.base}/defects/${res.body.data.id}`;
    expect((await s.opAgent.patch(url).send({ status: 'in_repair' })).status).toBe(403);
    const toOperator = await s.techAgent.patch(url).send({ assignedTo: s.op.id });
    expect(toOperator.status).toBe(422);
    expect(toOperator.body.error.fields.assignedTo).toBe(
      'Assign a technician or manager of this farm',
    );
    const fixed = await s.techAgent.patch(url).send({ status: 'fixed' });
    expect(fixed.status).toBe(400);
    expect(fixed.body.error.fields.status).toMatch(/close a defect with/);
    const ok = await s.techAgent.patch(url).send({ assignedTo: s.tech.id, status: 'in_repair' });
    expect(ok.status).toBe(200);
    expect(ok.body.data).toMatchObject({ status: 'in_repair', assignedTo: { id: s.tech.id } });
    expect(await AuditEvent.count({ where: { action: 'defect.update' } })).toBe(1);
  });

  it('defects — a critical defect tags the machine out; closing the last critical one leaves it tagged out (returning to service is its own step)', async () => {
    const s = await shop();
    const a = await report(s.opAgent, s.base, s.t1.id, {
      title: 'Brake pedal to the floor',
      severity: 'critical',
    });
    expect(a.body).toMatchObject({
      taggedOut: true,
      message: 'T-01 is tagged out: do not use it until a technician or manager clears it',
      machine: { status: 'tagged_out' },
    });
    const b = await report(s.techAgent, s.base, s.t1.id, {
      title: 'ROPS pin missing',
      severity: 'critical',
    });
    const closeUrl = (id: string) => `${s.base}/defects/${id}/close`;
    expect((await s.opAgent.post(closeUrl(a.body.data.id)).send({ note: 'done' })).status).toBe(
      403,
    );
    const noNote = await s.techAgent.post(closeUrl(a.body.data.id)).send({});
    expect(noNote.status).toBe(400);
    expect(noNote.body.error.fields.note).toMatch(/Say what was done/);
    const first = await s.techAgent
      .post(closeUrl(a.body.data.id))
      .send({ note: 'Master cylinder replaced, bled' });
    expect(first.status).toBe(200);
    expect(first.body.data).toMatchObject({
      status: 'fixed',
      fixNote: 'Master cylinder replaced, bled',
      fixedBy: { id: s.tech.id },
    });
    expect(first.body.machine.status).toBe('tagged_out');
    const second = await s.techAgent
      .post(closeUrl(b.body.data.id))
      .send({ note: 'New pin and clip' });
    expect(second.body).toMatchObject({
      machine: { status: 'tagged_out' },
      openCriticalDefects: 0,
    });
    expect((await Machine.findByPk(s.t1.id))!.status).toBe('tagged_out');
    const again = await s.techAgent.post(closeUrl(b.body.data.id)).send({ note: 'again' });
    expect(again.status).toBe(409);
    const fixedList = await s.techAgent.get(`${s.base}/defects?status=fixed`);
    expect(fixedList.body.data).toHaveLength(2);
  });

  it('close by a service record — the record must be a completed one of the same machine', async () => {
    const s = await shop();
    await addReadings(s.t1, [{ daysAgo: 5, value: 500 }]);
    await addReadings(s.t2, [{ daysAgo: 5, value: 800 }]);
    const d = await report(s.opAgent, s.base, s.t1.id, {
      title: 'Fan belt squeals',
      severity: 'minor',
    });
    const recordOn = async (machineId: string, meterValue: number) =>
      (
        await s.techAgent.post(`${s.base}/machines/${machineId}/service-records`).send({
          status: 'completed',
          performedOn: todayIso('America/Chicago'),
          meterValue,
        })
      ).body.data.id as string;
    const wrongMachine = await recordOn(s.t2.id, 805);
    const close = `${s.base}/defects/${d.body.data.id}/close`;
    const refused = await s.techAgent.post(close).send({ serviceRecordId: wrongMachine });
    expect(refused.status).toBe(422);
    expect(refused.body.error.fields.serviceRecordId).toMatch(/No such service record on T-01/);
    const right = await recordOn(s.t1.id, 505);
    const ok = await s.techAgent.post(close).send({ serviceRecordId: right });
    expect(ok.status).toBe(200);
    expect(ok.body.data).toMatchObject({ status: 'fixed', fixedByRecordId: right });
  });
});
