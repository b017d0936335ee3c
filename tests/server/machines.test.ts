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
import { Machine, MachineOperator } from '../../server/models';

const app = createApp();
const base = (orgId: string) => `/api/v1/organizations/${orgId}/machines`;

describe('machines API', () => {
  beforeEach(resetDatabase);

  it('machines — 401 without sign-in', async () => {
    const org = await createOrganization();
    expect((await request(app).get(base(org.id))).status).toBe(401);
    expect((await request(app).post(base(org.id)).send({})).status).toBe(401);
  });

  it('machines — manager creates a machine; 201 with the presented shape and abilities', async () => {
    const org = await createOrganization();
    const { user } = await createMember(org, 'manager');
    const { user: op } = await createMember(org, 'operator');
    const agent = await signedInAgent(app, user);
    const res = await agent.post(base(org.id)).send({
      fleetNumber: 'T-09',
      name: 'Loader tractor',
      category: 'tractor',
      make: 'Example',
      year: 2019,
      listPriceMinor: 12_000_000,
      meterUnit: 'h',
      operatorIds: [op.id],
    });
    expect(res.status).toBe(201);
    expect(res.body.data).toMatchObject({
      fleetNumber: 'T-09',
      name: 'Loader tractor',
      category: 'tractor',
      status: 'in_service',
      meterUnit: 'h',
      listPriceMinor: 12_000_000,
      operatorIds: [op.id],
      lastReading: null,
    });
    expect(res.body.abilities).toMatchObject({
      update: true,
      editSchedule: true,
      logReading: true,
    });
    expect(await countRows('audit_events')).toBe(1);
  });

  it('machines — bad input — 400 naming each field; nothing written', async () => {
    const org = await createOrganization();
    const { user } = await createMember(org, 'manager');
    const agent = await signedInAgent(app, user);
    const res = await agent
      .post(base(org.id))
      .send({ fleetNumber: '', name: 'X', category: 'hovercraft', meterUnit: 'miles', year: 1800 });
    expect(res.status).toBe(400);
    expect(Object.keys(res.body.error.fields).sort()).toEqual([
      'category',
      'fleetNumber',
      'meterUnit',
      'year',
    ]);
    expect(res.body.error.fields.category).toMatch(/Category must be one of/);
    expect(await countRows('machines')).toBe(0);
  });

  it('machines — a fleet number used already (any case) — 422 on fleetNumber; nothing written', async () => {
    const org = await createOrganization();
    const { user } = await createMember(org, 'manager');
    await createMachine(org, { fleetNumber: 'T-01', name: 'First' });
    const agent = await signedInAgent(app, user);
    const res = await agent
      .post(base(org.id))
      .send({ fleetNumber: 't-01', name: 'Second', category: 'tractor' });
    expect(res.status).toBe(422);
    expect(res.body.error.fields.fleetNumber).toMatch(/used by First/);
    expect(await countRows('machines')).toBe(1);
  });

  it('machines — technician and operator may not create or edit (403), nothing changes', async () => {
    const org = await createOrganization();
    const machine = await createMachine(org, { name: 'Keep me' });
    for (const role of ['technician', 'operator'] as const) {
      const { user } = await createMember(org, role);
      const agent = await signedInAgent(app, user);
      expect(
        (await agent.post(base(org.id)).send({ fleetNumber: 'Z', name: 'Z', category: 'other' }))
          .status,
      ).toBe(403);
      expect(
        (await agent.patch(`${base(org.id)}/${machine.id}`).send({ name: 'Changed' })).status,
      ).toBe(403);
    }
    expect((await Machine.findByPk(machine.id))!.name).toBe('Keep me');
    expect(await countRows('machines')).toBe(1);
  });

  it("machines — another organization's machine — 404 on read and write, nothing changes", async () => {
    const mine = await createOrganization();
    const theirs = await createOrganization();
    const { user } = await createMember(mine, 'manager');
    const foreign = await createMachine(theirs, { name: 'Theirs' });
    const agent = await signedInAgent(app, user);
    expect((await agent.get(`${base(mine.id)}/${foreign.id}`)).status).toBe(404);
    expect(
      (await agent.patch(`${base(mine.id)}/${foreign.id}`).send({ name: 'Mine now' })).status,
    ).toBe(404);
    expect((await agent.get(`${base(theirs.id)}/${foreign.id}`)).status).toBe(404);
    expect(
      (await agent.post(`${base(mine.id)}/${foreign.id}/readings`).send({ value: 5 })).status,
    ).toBe(404);
    expect((await Machine.findByPk(foreign.id))!.name).toBe('Theirs');
    expect(await countRows('meter_readings')).toBe(0);
  });

  it('machines — retire (sold) and tag out via PATCH; readings refused on a sold machine', async () => {
    const org = await createOrganization();
    const { user } = await createMember(org, 'manager');
    const machine = await createMachine(org);
    const agent = await signedInAgent(app, user);
    const sold = await agent.patch(`${base(org.id)}/${machine.id}`).send({ status: 'sold' });
    expect(sold.status).toBe(200);
    expect(sold.body.data.status).toBe('sold');
    expect(sold.body.abilities.logReading).toBe(false);
    const reading = await agent.post(`${base(org.id)}/${machine.id}/readings`).send({ value: 10 });
    expect(reading.status).toBe(403);
    expect(reading.body.error.message).toMatch(/sold/);
  });

  it('machines — list pages, filters and sorts on the server', async () => {
    const org = await createOrganization();
    const { user } = await createMember(org, 'manager');
    for (let i = 1; i <= 7; i++)
      await createMachine(org, { fleetNumber: `T-0${i}`, category: i % 2 ? 'tractor' : 'baler' });
    const agent = await signedInAgent(app, user);
    const page2 = await agent.get(`${base(org.id)}?pageSize=3&page=2`);
    expect(page2.status).toBe(200);
    expect(page2.body.meta).toEqual({ total: 7, page: 2, pageSize: 3 });
    expect(page2.body.data.map((m: { fleetNumber: string }) => m.fleetNumber)).toEqual([
      'T-04',
      'T-05',
      'T-06',
    ]);
    const balers = await agent.get(`${base(org.id)}?category=baler&sort=fleetNumber&order=desc`);
    expect(balers.body.data.map((m: { fleetNumber: string }) => m.fleetNumber)).toEqual([
      'T-06',
      'T-04',
      'T-02',
    ]);
    const bad = await agent.get(`${base(org.id)}?pageSize=5000`);
    expect(bad.status).toBe(400);
    expect(bad.body.error.fields.pageSize).toBeDefined();
  });

  it('machines — due state filter: only machines with an overdue task', async () => {
    const org = await createOrganization();
    const { user } = await createMember(org, 'manager');
    const late = await createMachine(org, { fleetNumber: 'A-1' });
    const fine = await createMachine(org, { fleetNumber: 'A-2' });
    await addReadings(late, [
      { daysAgo: 20, value: 900 },
      { daysAgo: 0, value: 1000 },
    ]);
    await addReadings(fine, [
      { daysAgo: 20, value: 900 },
      { daysAgo: 0, value: 1000 },
    ]);
    await createTask(late, { lastDoneMeter: 700, lastDoneOn: null });
    await createTask(fine, { lastDoneMeter: 950, lastDoneOn: null });
    const agent = await signedInAgent(app, user);
    const res = await agent.get(`${base(org.id)}?dueStatus=overdue`);
    expect(res.body.data.map((m: { fleetNumber: string }) => m.fleetNumber)).toEqual(['A-1']);
    expect(res.body.data[0].dueStatus).toBe('overdue');
  });

  it('machines — an operator sees only assigned machines where assignments exist, and machines without any', async () => {
    const org = await createOrganization();
    const { user: lena } = await createMember(org, 'operator');
    const { user: sam } = await createMember(org, 'operator');
    const hers = await createMachine(org, { fleetNumber: 'H-1' });
    const his = await createMachine(org, { fleetNumber: 'H-2' });
    await createMachine(org, { fleetNumber: 'H-3' });
    await MachineOperator.bulkCreate([
      { organizationId: org.id, machineId: hers.id, userId: lena.id },
      { organizationId: org.id, machineId: his.id, userId: sam.id },
    ]);
    const agent = await signedInAgent(app, lena);
    const list = await agent.get(base(org.id));
    expect(list.body.data.map((m: { fleetNumber: string }) => m.fleetNumber)).toEqual([
      'H-1',
      'H-3',
    ]);
    expect((await agent.get(`${base(org.id)}/${his.id}`)).status).toBe(404);
    expect((await agent.get(`${base(org.id)}/${hers.id}`)).status).toBe(200);
  });
});
