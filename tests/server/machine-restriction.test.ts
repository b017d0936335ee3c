// Restricted use (server/routes/machines/status.router.ts, services/machine-restriction.ts): set
// and lifted by the farm's technicians and managers, refused to operators and dealers with words,
// shown wherever the machine is picked, and left in place by a tag-out. The walkaround yard is
// walkarounds-fixture.ts (an operator assigned to T-01, a technician and a manager).
import { beforeEach, describe, expect, it } from 'vitest';
import { Op } from 'sequelize';
import request from 'supertest';
import { resetDatabase } from '../support/db';
import {
  createMachine,
  createMember,
  createOrganization,
  createTask,
  signedInAgent,
} from '../support/factories';
import { AuditEvent, Defect, Machine } from '../../server/models';
import { loadDemo } from '../../server/seeders/demo';
import { linkDealer } from './dealer-fixture';
import { app, submission, yard } from './walkarounds-fixture';

const REASON = 'Field only — no road: left flasher out';

async function restrictionRows(machineId: string) {
  const machine = await Machine.findByPk(machineId);
  const audits = await AuditEvent.count({
    where: { entityId: machineId, action: ['machine.restrict', 'machine.lift_restriction'] },
  });
  return { reason: machine!.restrictionReason, at: machine!.restrictedAt, audits };
}

async function restrictedYard() {
  const y = await yard();
  const managerAgent = await signedInAgent(app, y.manager);
  const techAgent = await signedInAgent(app, y.tech);
  const url = `${y.base}/machines/${y.machine.id}/restriction`;
  return { ...y, managerAgent, techAgent, url, liftUrl: `${url}/lift` };
}

describe('machine restriction — set and lift', () => {
  beforeEach(resetDatabase);

  it('restriction — 401 without sign-in; the manager sets it (200, audited), the technician lifts it with a note', async () => {
    const y = await restrictedYard();
    expect((await request(app).post(y.url).send({ reason: REASON })).status).toBe(401);

    const set = await y.managerAgent.post(y.url).send({ reason: `  ${REASON} ` });
    expect(set.status).toBe(200);
    expect(set.body.data.machine).toMatchObject({
      fleetNumber: 'T-01',
      status: 'in_service',
      restricted: true,
    });
    expect(set.body.data.restriction.reason).toBe(REASON);
    expect(Date.parse(set.body.data.restriction.since)).not.toBeNaN();
    const event = await AuditEvent.findOne({
      where: { action: 'machine.restrict', entityId: y.machine.id },
    });
    expect(event).toMatchObject({
      actorUserId: y.manager.id,
      changes: { reason: REASON, before: null },
    });
    // the same reason again changes nothing and writes no second entry
    expect((await y.managerAgent.post(y.url).send({ reason: REASON })).status).toBe(200);
    expect((await restrictionRows(y.machine.id)).audits).toBe(1);

    const detail = await y.managerAgent.get(`${y.base}/machines/${y.machine.id}`);
    expect(detail.body.data.restriction.reason).toBe(REASON);
    expect(detail.body.abilities).toMatchObject({ restrict: true, liftRestriction: true });

    const lifted = await y.techAgent
      .post(y.liftUrl)
      .send({ note: 'Bulb replaced, all lights tested' });
    expect(lifted.status).toBe(200);
    expect(lifted.body.data).toMatchObject({ machine: { restricted: false }, restriction: null });
    const lift = await AuditEvent.findOne({
      where: { action: 'machine.lift_restriction', entityId: y.machine.id },
    });
    expect(lift).toMatchObject({
      actorUserId: y.tech.id,
      changes: { reason: REASON, note: 'Bulb replaced, all lights tested' },
    });
    expect(await restrictionRows(y.machine.id)).toEqual({ reason: null, at: null, audits: 2 });

    const again = await y.techAgent.post(y.liftUrl).send({});
    expect(again.status).toBe(409);
    expect(again.body.error).toMatchObject({
      code: 'not_restricted',
      message: 'T-01 is not restricted; there is nothing to lift',
    });
  });

  it('restriction — an operator is refused (403, told to report a defect); nothing written', async () => {
    const y = await restrictedYard();
    const refused = await y.opAgent.post(y.url).send({ reason: REASON });
    expect(refused.status).toBe(403);
    expect(refused.body.error.message).toMatch(
      /^Only a technician or manager of the farm sets or lifts a restriction/,
    );
    await y.managerAgent.post(y.url).send({ reason: REASON });
    expect((await y.opAgent.post(y.liftUrl).send({})).status).toBe(403);
    expect(await restrictionRows(y.machine.id)).toMatchObject({ reason: REASON, audits: 1 });
  });

  it.each(['service', 'view'] as const)(
    'restriction — a dealer advisor with a %s link is refused (403 in words) and is not told the reason',
    async (access) => {
      const y = await restrictedYard();
      const dealer = await createOrganization({ name: 'Test Dealer', kind: 'dealer' });
      const { user: advisor } = await createMember(dealer, 'advisor');
      await linkDealer(dealer, y.org, access);
      const advisorAgent = await signedInAgent(app, advisor);
      const refused = await advisorAgent.post(y.url).send({ reason: REASON });
      expect(refused.status).toBe(403);
      expect(refused.body.error.message).toBe(
        "A dealer's advisor never sets or lifts a farm's restriction; the farm's technician or manager does",
      );
      expect(await restrictionRows(y.machine.id)).toMatchObject({ reason: null, audits: 0 });
      await y.managerAgent.post(y.url).send({ reason: REASON });
      expect((await advisorAgent.post(y.liftUrl).send({})).status).toBe(403);
      // the dealer sees that it is restricted, not why (as with a tag-out's reason)
      const seen = await advisorAgent.get(`${y.base}/machines/${y.machine.id}`);
      expect(seen.body.data.restriction).toEqual({ reason: null, since: expect.any(String) });
      expect(seen.body.abilities).toMatchObject({ restrict: false, liftRestriction: false });
      expect(await restrictionRows(y.machine.id)).toMatchObject({ reason: REASON, audits: 1 });
    },
  );

  it("restriction — another farm's machine id answers 404 to a manager; nothing written", async () => {
    const y = await restrictedYard();
    const other = await createOrganization();
    const theirs = await createMachine(other, { fleetNumber: 'X-01' });
    const foreign = `${y.base}/machines/${theirs.id}/restriction`;
    expect((await y.managerAgent.post(foreign).send({ reason: REASON })).status).toBe(404);
    expect((await y.managerAgent.post(`${foreign}/lift`).send({})).status).toBe(404);
    expect(await restrictionRows(theirs.id)).toMatchObject({ reason: null, audits: 0 });
  });

  it.each([
    ['no reason', {}, 'reason', /^Say what the machine may and may not be used for/],
    [
      'a blank reason',
      { reason: '   ' },
      'reason',
      /^Say what the machine may and may not be used for/,
    ],
    ['two characters', { reason: 'ab' }, 'reason', /at least 3 characters/],
    ['301 characters', { reason: 'x'.repeat(301) }, 'reason', /at most 300 characters/],
    ['a number', { reason: 42 }, 'reason', /^Say what/],
    ['a line break', { reason: 'Field only\nno road' }, 'reason', /control characters/],
    ['an unknown field', { reason: REASON, until: '2030-01-01' }, 'until', /Not a field/],
  ])(
    'restriction — %s is refused naming the field; nothing written',
    async (_case, body, field, rule) => {
      const y = await restrictedYard();
      const res = await y.managerAgent.post(y.url).send(body);
      // the app answers a body its schema refuses with 400 and the field (DEVELOPERS.md)
      expect(res.status).toBe(400);
      expect(res.body.error.fields[field]).toMatch(rule);
      expect(await restrictionRows(y.machine.id)).toEqual({ reason: null, at: null, audits: 0 });
    },
  );

  it('restriction lift — a note of 301 characters is refused naming it; the restriction stays', async () => {
    const y = await restrictedYard();
    await y.managerAgent.post(y.url).send({ reason: REASON });
    const res = await y.managerAgent.post(y.liftUrl).send({ note: 'x'.repeat(301) });
    expect(res.status).toBe(400);
    expect(res.body.error.fields.note).toMatch(/at most 300 characters/);
    expect(await restrictionRows(y.machine.id)).toMatchObject({ reason: REASON, audits: 1 });
  });

  it('restriction — a sold machine takes none (409)', async () => {
    const y = await restrictedYard();
    const sold = await createMachine(y.org, { fleetNumber: 'S-01', status: 'sold' });
    const res = await y.managerAgent
      .post(`${y.base}/machines/${sold.id}/restriction`)
      .send({ reason: REASON });
    expect(res.status).toBe(409);
    expect(res.body.error.code).toBe('machine_sold');
    expect(await restrictionRows(sold.id)).toMatchObject({ reason: null, audits: 0 });
  });
});

describe('machine restriction — shown, and still usable', () => {
  beforeEach(resetDatabase);

  it('restriction — the operator sees the reason on the checklist, the fleet list and the due row, and the walkaround goes through', async () => {
    const y = await restrictedYard();
    await createTask(y.machine, { name: 'Engine oil and filter', intervalMeter: 250 });
    await y.managerAgent.post(y.url).send({ reason: REASON });

    const checklist = await y.opAgent.get(y.checklistUrl);
    expect(checklist.status).toBe(200);
    expect(checklist.body.data.machine).toMatchObject({
      restricted: true,
      restriction: { reason: REASON },
    });
    const fleet = await y.opAgent.get(`${y.base}/machines`);
    expect(fleet.body.data[0].restriction.reason).toBe(REASON);
    const due = await y.opAgent.get(`${y.base}/due`);
    expect(due.body.data.length).toBeGreaterThan(0);
    expect(due.body.data[0].machine.restricted).toBe(true);

    const walked = await y.opAgent.post(`${y.base}/walkarounds`).send(submission(y.machine.id));
    expect(walked.status).toBe(201);
    expect(walked.body.machine).toMatchObject({ status: 'in_service', restricted: true });
  });

  it('restriction — a tag-out does not clear it: back in service, the machine is still restricted', async () => {
    const y = await restrictedYard();
    await y.managerAgent.post(y.url).send({ reason: REASON });
    const tagged = await y.managerAgent
      .patch(`${y.base}/machines/${y.machine.id}`)
      .send({ status: 'tagged_out' });
    expect(tagged.status).toBe(200);
    expect(tagged.body.data).toMatchObject({
      status: 'tagged_out',
      restriction: { reason: REASON },
    });
    // the operator may not start a walkaround for use: the tag-out rules while it lasts
    expect((await y.opAgent.get(y.checklistUrl)).body.error.code).toBe('tagged_out');
    const back = await y.techAgent
      .post(`${y.base}/machines/${y.machine.id}/return-to-service`)
      .send({ note: 'Shield refitted and checked' });
    expect(back.body.data).toMatchObject({ status: 'in_service', restricted: true });
    expect((await y.opAgent.get(y.checklistUrl)).body.data.machine.restriction.reason).toBe(REASON);
  });
});

describe('machine restriction — the demo', () => {
  beforeEach(resetDatabase);

  it('demo — T-02, its left rear flasher out (in repair), is restricted to field work after the finding, audited', async () => {
    await loadDemo({ reset: true });
    const restricted = await Machine.findAll({ where: { restrictionReason: { [Op.ne]: null } } });
    expect(restricted.map((m) => [m.fleetNumber, m.status, m.restrictionReason])).toEqual([
      ['T-02', 'in_service', 'Field only — no road: left rear flasher out'],
    ]);
    const t2 = restricted[0];
    const flasher = await Defect.findOne({ where: { machineId: t2.id, itemId: 'lights' } });
    expect(flasher).toMatchObject({ status: 'in_repair', description: 'Left rear flasher out' });
    expect(t2.restrictedAt!.getTime()).toBeGreaterThan(flasher!.createdAt.getTime());
    const event = await AuditEvent.findOne({
      where: { action: 'machine.restrict', entityId: t2.id },
    });
    expect(event).toMatchObject({ actorUserId: t2.restrictedBy });
    expect(t2.restrictedBy).not.toBeNull();
  });
});
