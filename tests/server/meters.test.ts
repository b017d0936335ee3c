// The meters API (issue 13): list, add, rename, remove, make primary — the standard set of each
// endpoint (401, 400/422 with nothing written, 404 across farms, 403 by role, the shape).
import { beforeEach, describe, expect, it } from 'vitest';
import request from 'supertest';
import { createApp } from '../../server/app';
import { countRows, resetDatabase } from '../support/db';
import {
  addReadings,
  createMachine,
  createMember,
  createMeter,
  createOrganization,
  createTask,
  signedInAgent,
} from '../support/factories';
import { Machine, MachineMeter } from '../../server/models';

const app = createApp();
beforeEach(resetDatabase);

async function farm(role: 'manager' | 'technician' | 'operator' = 'manager') {
  const org = await createOrganization();
  const { user } = await createMember(org, role);
  const machine = await createMachine(org, { fleetNumber: 'T-02' });
  const base = `/api/v1/organizations/${org.id}/machines/${machine.id}/meters`;
  return { org, machine, base, agent: await signedInAgent(app, user) };
}

describe('meters API', () => {
  it('list — a machine starts with one primary meter from its meter unit, with its last reading', async () => {
    const { machine, base, agent } = await farm();
    await addReadings(machine, [{ daysAgo: 1, value: 812.5 }]);
    const res = await agent.get(base);
    expect(res.status).toBe(200);
    expect(res.body.data).toEqual([
      expect.objectContaining({
        kind: 'engine_hours',
        unit: 'h',
        isPrimary: true,
        readingCount: 1,
        lastReading: expect.objectContaining({ value: 812.5 }),
      }),
    ]);
    expect(res.body.abilities).toEqual({ manage: true, logReading: true });
    expect((await request(app).get(base)).status).toBe(401);
  });

  it('add — a technician adds PTO hours (unit from the kind); a second unlabelled one is 422 naming label; a bad kind is 400 naming kind', async () => {
    const { base, agent } = await farm('technician');
    const added = await agent.post(base).send({ kind: 'pto_hours' });
    expect(added.status).toBe(201);
    expect(added.body.data).toMatchObject({
      kind: 'pto_hours',
      unit: 'h',
      label: '',
      isPrimary: false,
      lastReading: null,
      readingCount: 0,
    });
    const again = await agent.post(base).send({ kind: 'pto_hours' });
    expect(again.status).toBe(422);
    expect(again.body.error.fields.label).toMatch(/already has a PTO hours meter/);
    const labelled = await agent.post(base).send({ kind: 'pto_hours', label: 'Front PTO' });
    expect(labelled.status).toBe(201);
    const bad = await agent.post(base).send({ kind: 'furlongs' });
    expect(bad.status).toBe(400);
    expect(bad.body.error.fields.kind).toMatch(/Meter kind must be one of/);
    expect(await MachineMeter.count()).toBe(3);
  });

  it('roles — an operator reads but may not add (403); another farm’s machine or meter is 404; nothing written', async () => {
    const { machine, base, agent } = await farm('operator');
    expect((await agent.get(base)).body.abilities).toEqual({ manage: false, logReading: true });
    expect((await agent.post(base).send({ kind: 'bales' })).status).toBe(403);
    const pto = await createMeter(machine, 'pto_hours');
    expect((await agent.patch(`${base}/${pto.id}`).send({ label: 'x' })).status).toBe(403);
    const other = await createOrganization();
    const { user } = await createMember(other, 'manager');
    const stranger = await signedInAgent(app, user);
    expect((await stranger.get(base)).status).toBe(404);
    // a manager of one farm naming another farm's meter under their own machine
    const { machine: own, agent: manager, org } = await farm();
    const url = `/api/v1/organizations/${org.id}/machines/${own.id}/meters/${pto.id}`;
    expect((await manager.patch(url).send({ label: 'Rear' })).status).toBe(404);
    expect((await manager.delete(url)).status).toBe(404);
    expect((await manager.post(`${url}/primary`)).status).toBe(404);
    await pto.reload();
    expect(pto.label).toBe('');
  });

  it('rename — only the fields sent; an unknown field is 400 by name', async () => {
    const { machine, base, agent } = await farm();
    const pto = await createMeter(machine, 'pto_hours');
    const res = await agent.patch(`${base}/${pto.id}`).send({ label: 'Rear PTO' });
    expect(res.status).toBe(200);
    expect(res.body.data).toMatchObject({ label: 'Rear PTO', kind: 'pto_hours', position: 1 });
    const unknown = await agent.patch(`${base}/${pto.id}`).send({ kind: 'bales' });
    expect(unknown.status).toBe(400);
  });

  it('remove — refused for the primary and for a meter with readings or tasks (422 naming meter); allowed when unused', async () => {
    const { machine, base, agent } = await farm();
    const [primary] = (await agent.get(base)).body.data;
    expect((await agent.delete(`${base}/${primary.id}`)).body.error.fields.meter).toMatch(
      /primary meter cannot be removed/,
    );
    const pto = await createMeter(machine, 'pto_hours');
    await addReadings(machine, [{ daysAgo: 1, value: 40, meterId: pto.id }]);
    const used = await agent.delete(`${base}/${pto.id}`);
    expect(used.status).toBe(422);
    expect(used.body.error.fields.meter).toMatch(/1 reading/);
    const bales = await createMeter(machine, 'bales');
    await createTask(machine, { name: 'Knotters', meterId: bales.id, intervalMeter: 5000 });
    expect((await agent.delete(`${base}/${bales.id}`)).status).toBe(422);
    const spare = await createMeter(machine, 'hectares');
    expect((await agent.delete(`${base}/${spare.id}`)).status).toBe(204);
    expect(await MachineMeter.count({ where: { machineId: machine.id } })).toBe(3);
  });

  it('make primary — the other meter stops being primary; the machine’s unit follows; a reading without meterId then goes on it', async () => {
    const { org, machine, base, agent } = await farm();
    const bales = await createMeter(machine, 'bales');
    const res = await agent.post(`${base}/${bales.id}/primary`);
    expect(res.status).toBe(200);
    expect(res.body.data).toMatchObject({ id: bales.id, isPrimary: true });
    const list = (await agent.get(base)).body.data as { id: string; isPrimary: boolean }[];
    expect(list.map((m) => [m.id, m.isPrimary])).toEqual([
      [bales.id, true],
      [expect.any(String), false],
    ]);
    expect((await Machine.findByPk(machine.id))!.meterUnit).toBe('bales');
    const reading = await agent
      .post(`/api/v1/organizations/${org.id}/machines/${machine.id}/readings`)
      .send({ value: 120 });
    expect(reading.body.data.meterId).toBe(bales.id);
    expect(await countRows('meter_readings')).toBe(1);
  });

  it('tasks — a task is bound to the meter it names, its meterId can be changed by PATCH, and the due list shows that meter’s unit', async () => {
    const { org, machine, agent } = await farm();
    const bales = await createMeter(machine, 'bales');
    const url = `/api/v1/organizations/${org.id}/machines/${machine.id}/tasks`;
    const task = await agent.post(url).send({ name: 'Knotter check', intervalMeter: 10000 });
    expect(task.status).toBe(201);
    const [primary] = await MachineMeter.findAll({
      where: { machineId: machine.id, isPrimary: true },
    });
    expect(task.body.data.meterId).toBe(primary.id);
    const moved = await agent
      .patch(`/api/v1/organizations/${org.id}/tasks/${task.body.data.id}`)
      .send({ meterId: bales.id });
    expect(moved.status).toBe(200);
    expect(moved.body.data).toMatchObject({ meterId: bales.id, name: 'Knotter check' });
    const due = await agent.get(`/api/v1/organizations/${org.id}/due`);
    expect(due.body.data[0].machine.meterUnit).toBe('bales');
  });
});
