import { beforeEach, describe, expect, it } from 'vitest';
import request from 'supertest';
import { createApp } from '../../server/app';
import { countRows, resetDatabase } from '../support/db';
import {
  addReadings,
  createMachine,
  createMember,
  createOrganization,
  createTask,
  signedInAgent,
} from '../support/factories';
import { AuditEvent, MeterReading, TaskDuePoint } from '../../server/models';

const app = createApp();
const DAY = 86_400_000;
const iso = (msAgo: number) => new Date(Date.now() - msAgo).toISOString();

async function farm(role: 'manager' | 'technician' | 'operator' = 'manager') {
  const org = await createOrganization({ timeZone: 'America/Chicago' });
  const { user } = await createMember(org, role);
  const machine = await createMachine(org, { fleetNumber: 'T-01' });
  const agent = await signedInAgent(app, user);
  const url = `/api/v1/organizations/${org.id}/machines/${machine.id}/readings`;
  return { org, user, machine, agent, url };
}

describe('readings API — the rules', () => {
  beforeEach(resetDatabase);

  it('readings — 401 without sign-in; 404 for another farm; operator may log', async () => {
    const { org, url } = await farm();
    expect((await request(app).post(url).send({ value: 1 })).status).toBe(401);
    const other = await createOrganization();
    const { user: stranger } = await createMember(other, 'manager');
    const strangerAgent = await signedInAgent(app, stranger);
    expect((await strangerAgent.post(url).send({ value: 1 })).status).toBe(404);
    expect((await strangerAgent.get(url)).status).toBe(404);
    const { user: op } = await createMember(org, 'operator');
    const opAgent = await signedInAgent(app, op);
    const res = await opAgent.post(url).send({ value: 12.5, takenAt: iso(60_000) });
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({
      status: 'added',
      data: { value: 12.5, lifetimeValue: 12.5, source: 'manual' },
    });
  });

  it('readings — a reading below the previous one is refused naming the rule and the previous reading; nothing written', async () => {
    const { machine, agent, url } = await farm();
    await addReadings(machine, [{ daysAgo: 2, value: 1052 }]);
    const res = await agent.post(url).send({ value: 1040, takenAt: iso(60_000) });
    expect(res.status).toBe(422);
    expect(res.body.error.fields.value).toMatch(
      /lower than the previous reading of 1,052 h taken .* may not go backwards/,
    );
    expect(await countRows('meter_readings')).toBe(1);
  });

  it('readings — a reading above a later one is refused (inserting into history)', async () => {
    const { machine, agent, url } = await farm();
    await addReadings(machine, [
      { daysAgo: 10, value: 1000 },
      { daysAgo: 2, value: 1050 },
    ]);
    const res = await agent.post(url).send({ value: 1060, takenAt: iso(5 * DAY) });
    expect(res.status).toBe(422);
    expect(res.body.error.fields.value).toMatch(/higher than the next reading of 1,050 h/);
  });

  it('readings — a reading in the future is refused on takenAt; a few minutes of clock skew are allowed', async () => {
    const { agent, url } = await farm();
    const future = await agent
      .post(url)
      .send({ value: 10, takenAt: new Date(Date.now() + 3600_000).toISOString() });
    expect(future.status).toBe(422);
    expect(future.body.error.fields.takenAt).toMatch(/in the future/);
    const skew = await agent
      .post(url)
      .send({ value: 10, takenAt: new Date(Date.now() + 2 * 60_000).toISOString() });
    expect(skew.status).toBe(201);
  });

  it('readings — more than 24 h of engine time per elapsed day is refused', async () => {
    const { machine, agent, url } = await farm();
    await addReadings(machine, [{ daysAgo: 2, value: 1000 }]);
    const res = await agent.post(url).send({ value: 1060, takenAt: iso(60_000) });
    expect(res.status).toBe(422);
    expect(res.body.error.fields.value).toMatch(/per day/);
    expect(res.body.error.fields.value).toMatch(/1,000 h/);
    const ok = await agent.post(url).send({ value: 1040, takenAt: iso(60_000) });
    expect(ok.status).toBe(201);
  });

  it('readings — an identical repeat is accepted once and ignored after', async () => {
    const { agent, url } = await farm();
    const takenAt = iso(3600_000);
    const first = await agent.post(url).send({ value: 500, takenAt });
    const again = await agent.post(url).send({ value: 500, takenAt });
    expect(first.body.status).toBe('added');
    expect(again.status).toBe(201);
    expect(again.body.status).toBe('duplicate');
    expect(await countRows('meter_readings')).toBe(1);
  });

  it('readings — bad input — 400 naming the field; nothing written', async () => {
    const { agent, url } = await farm();
    const res = await agent.post(url).send({ value: 'lots', takenAt: 'yesterday' });
    expect(res.status).toBe(400);
    expect(res.body.error.fields.value).toMatch(/number/);
    expect(res.body.error.fields.takenAt).toMatch(/ISO date-time/);
    expect(await countRows('meter_readings')).toBe(0);
  });

  it('readings — a new reading moves the due points (summary refreshed in the same request)', async () => {
    const { machine, agent, url } = await farm();
    await addReadings(machine, [
      { daysAgo: 30, value: 1000 },
      { daysAgo: 10, value: 1100 },
    ]);
    const task = await createTask(machine, {
      intervalMeter: 250,
      lastDoneMeter: 1000,
      warnMeter: 25,
    });
    const before = (await TaskDuePoint.findByPk(task.id))!.due;
    expect(before.remainingMeter).toBe(150);
    const res = await agent.post(url).send({ value: 1230, takenAt: iso(60_000) });
    expect(res.status).toBe(201);
    const after = (await TaskDuePoint.findByPk(task.id))!.due;
    expect(after.remainingMeter).toBe(20);
    expect(after.status).toBe('due_soon');
  });

  it('bulk readings — all or nothing; a bad row is named by index and nothing is written', async () => {
    const { org, machine, agent } = await farm();
    const second = await createMachine(org, { fleetNumber: 'T-02' });
    await addReadings(second, [{ daysAgo: 1, value: 300 }]);
    const bulk = `/api/v1/organizations/${org.id}/readings/bulk`;
    const bad = await agent.post(bulk).send({
      readings: [
        { machineId: machine.id, value: 10, takenAt: iso(60_000) },
        { machineId: second.id, value: 200, takenAt: iso(60_000) },
      ],
    });
    expect(bad.status).toBe(422);
    expect(Object.keys(bad.body.error.fields)).toEqual(['readings.1.value']);
    expect(await countRows('meter_readings')).toBe(1);
    const good = await agent.post(bulk).send({
      readings: [
        { machineId: machine.id, value: 10, takenAt: iso(60_000) },
        { machineId: second.id, value: 305, takenAt: iso(60_000) },
      ],
    });
    expect(good.status).toBe(201);
    expect(good.body.data.map((d: { status: string }) => d.status)).toEqual(['added', 'added']);
    expect(await countRows('meter_readings')).toBe(3);
  });

  it('bulk readings — a machine of another farm — 422 on its row, nothing written', async () => {
    const { machine, agent, org } = await farm();
    const other = await createOrganization();
    const foreign = await createMachine(other);
    const res = await agent.post(`/api/v1/organizations/${org.id}/readings/bulk`).send({
      readings: [
        { machineId: machine.id, value: 10 },
        { machineId: foreign.id, value: 10 },
      ],
    });
    expect(res.status).toBe(422);
    expect(res.body.error.fields['readings.1.machineId']).toMatch(/No such machine/);
    expect(await countRows('meter_readings')).toBe(0);
  });
});

describe('readings API — corrections and meter replacement', () => {
  beforeEach(resetDatabase);

  it('correct and delete — manager may, with an audit entry holding before and after', async () => {
    const { org, machine, agent } = await farm('manager');
    await addReadings(machine, [
      { daysAgo: 5, value: 100 },
      { daysAgo: 3, value: 120 },
      { daysAgo: 1, value: 140 },
    ]);
    const middle = (await MeterReading.findOne({ where: { value: 120 } }))!;
    const fix = await agent
      .patch(`/api/v1/organizations/${org.id}/readings/${middle.id}`)
      .send({ value: 125 });
    expect(fix.status).toBe(200);
    expect(fix.body.data.value).toBe(125);
    const tooHigh = await agent
      .patch(`/api/v1/organizations/${org.id}/readings/${middle.id}`)
      .send({ value: 150 });
    expect(tooHigh.status).toBe(422);
    expect(tooHigh.body.error.fields.value).toMatch(/next reading of 140 h/);
    const del = await agent.delete(`/api/v1/organizations/${org.id}/readings/${middle.id}`);
    expect(del.status).toBe(204);
    expect(await countRows('meter_readings')).toBe(2);
    const audit = await AuditEvent.findAll({ order: [['id', 'ASC']] });
    expect(audit.map((a) => a.action)).toEqual(['reading.correct', 'reading.delete']);
    expect(audit[0].changes).toMatchObject({ before: { value: 120 }, after: { value: 125 } });
  });

  it('correct and delete — an operator may not (403), nothing changes', async () => {
    const { org, machine, agent } = await farm('operator');
    await addReadings(machine, [{ daysAgo: 5, value: 100 }]);
    const r = (await MeterReading.findOne())!;
    expect(
      (await agent.patch(`/api/v1/organizations/${org.id}/readings/${r.id}`).send({ value: 101 }))
        .status,
    ).toBe(403);
    expect((await agent.delete(`/api/v1/organizations/${org.id}/readings/${r.id}`)).status).toBe(
      403,
    );
    expect((await MeterReading.findByPk(r.id))!.value).toBe(100);
  });

  it('meter replacement — lifetime values stay continuous and later readings are on the new meter', async () => {
    const { org, machine, agent, url } = await farm('technician');
    await addReadings(machine, [
      { daysAgo: 20, value: 4000 },
      { daysAgo: 10, value: 4080 },
    ]);
    const rep = await agent
      .post(`/api/v1/organizations/${org.id}/machines/${machine.id}/meter-replacements`)
      .send({
        oldFinalValue: 4100,
        newStartValue: 0,
        replacedAt: iso(5 * DAY),
        note: 'cluster failed',
      });
    expect(rep.status).toBe(201);
    const next = await agent.post(url).send({ value: 30, takenAt: iso(60_000) });
    expect(next.status).toBe(201);
    expect(next.body.data).toMatchObject({ value: 30, lifetimeValue: 4130 });
    const history = await agent.get(url);
    expect(history.body.replacements).toHaveLength(1);
    expect(
      history.body.data.map((r: { value: number; lifetimeValue: number }) => [
        r.value,
        r.lifetimeValue,
      ]),
    ).toEqual([
      [30, 4130],
      [0, 4100],
      [4100, 4100],
      [4080, 4080],
      [4000, 4000],
    ]);
    // screens show the number on the meter fitted now, and the lifetime value beside it
    const latest = await agent.get(`/api/v1/organizations/${org.id}/readings/latest`);
    expect(latest.body.data[0].lastReading).toMatchObject({ value: 30, lifetimeValue: 4130 });
    await createTask(machine, { intervalMeter: 250, lastDoneMeter: 4000 });
    const due = await agent.get(`/api/v1/organizations/${org.id}/due`);
    expect(due.body.data[0].due.dueMeter).toBe(4250);
    expect(due.body.data[0].dueOnMeter).toBe(150); // 4,250 lifetime − (4,130 − 30) offset
    // a raw value of 20 on the new meter would be lifetime 4,120: below 4,130 → backwards
    const back = await agent.post(url).send({ value: 20, takenAt: iso(30_000) });
    expect(back.status).toBe(422);
    // the refusal speaks in the meter fitted now, the lifetime value in brackets
    expect(back.body.error.fields.value).toMatch(
      /^Reading 20 h \(4,120 h lifetime\) is lower than the previous reading of 30 h \(4,130 h lifetime\) taken /,
    );
    // 300 h on the new meter, a minute after 30 h: too fast, in the same words
    const fast = await agent.post(url).send({ value: 300 });
    expect(fast.status).toBe(422);
    expect(fast.body.error.fields.value).toMatch(/^Reading 300 h \(4,400 h lifetime\) implies /);
    expect(fast.body.error.fields.value).toContain(
      'since the previous reading of 30 h (4,130 h lifetime) taken',
    );
  });
});
