// Applying a class of the service library to a machine (POST …/machines/:id/apply-class).
// Decision: applying is idempotent by task name — the class's tasks the machine lacks are added,
// the ones it has are kept as they are, and applying the same class again adds nothing. Roles:
// the same as applying a template (canEditSchedule): managers and technicians; operators 403.
import { beforeEach, describe, expect, it } from 'vitest';
import request from 'supertest';
import { createApp } from '../../server/app';
import { resetDatabase } from '../support/db';
import {
  addReadings,
  createMachine,
  createMember,
  createOrganization,
  createTask,
  signedInAgent,
} from '../support/factories';
import { AuditEvent, Machine, ServiceTask } from '../../server/models';
import { serviceLibraryClass } from '../../shared/domain/service-library';
import type { MachineCategory, MeterUnit, Role } from '../../shared/constants';

const app = createApp();

async function farm(
  role: Role = 'manager',
  fleet: { meterUnit?: MeterUnit; category?: MachineCategory } = {},
) {
  const org = await createOrganization();
  const { user } = await createMember(org, role);
  const machine = await createMachine(org, { fleetNumber: 'RB-01', category: 'baler', ...fleet });
  const agent = await signedInAgent(app, user);
  const url = `/api/v1/organizations/${org.id}/machines/${machine.id}/apply-class`;
  return { org, machine, agent, url };
}

const taskCount = (machineId: string) => ServiceTask.count({ where: { machineId } });

describe('apply a machine class', () => {
  beforeEach(resetDatabase);

  it('apply class — a new round baler — gets the class and all its tasks, none OK before a reading', async () => {
    const w = await farm();
    const res = await w.agent.post(w.url).send({ machineClass: 'round_baler' });
    expect(res.status).toBe(200);
    const expected = serviceLibraryClass('round_baler').tasks.map((t) => t.name);
    expect(res.body.data.machineClass).toBe('round_baler');
    expect(res.body.data.added.map((t: { name: string }) => t.name)).toEqual(expected);
    expect(res.body.data.kept).toEqual([]);
    const tines = res.body.data.added.find(
      (t: { name: string }) => t.name === 'Pickup tines and guards',
    );
    expect(tines.parts).toEqual([
      { partNumber: '', description: 'Pickup tine, as worn', quantity: 6, wearPart: true },
    ]);
    expect(tines.hazards).toEqual(['pto', 'raised_load']);
    expect(tines.instructions).toMatch(/operator's manual wins/);
    const machine = await w.agent.get(`/api/v1/organizations/${w.org.id}/machines/${w.machine.id}`);
    expect(machine.body.data.machineClass).toBe('round_baler');
    expect(machine.body.data.category).toBe('baler'); // the category stays
    expect(await AuditEvent.count({ where: { action: 'machine.apply_class' } })).toBe(1);
  });

  it('apply class — the same class twice — the second adds nothing and keeps every task', async () => {
    const w = await farm();
    await w.agent.post(w.url).send({ machineClass: 'round_baler' });
    const n = await taskCount(w.machine.id);
    const again = await w.agent.post(w.url).send({ machineClass: 'round_baler' });
    expect(again.status).toBe(200);
    expect(again.body.data.added).toEqual([]);
    expect(again.body.data.kept).toHaveLength(n);
    expect(await taskCount(w.machine.id)).toBe(n);
    expect(await AuditEvent.count({ where: { action: 'machine.apply_class' } })).toBe(1);
  });

  it('apply class — a task of the same name already there (other case) — kept unchanged, not doubled', async () => {
    const w = await farm();
    const own = await createTask(w.machine, { name: 'main GEARBOX oil', intervalMeter: 300 });
    const res = await w.agent.post(w.url).send({ machineClass: 'round_baler' });
    expect(res.body.data.kept).toEqual(['Main gearbox oil']);
    await own.reload();
    expect(own.intervalMeter).toBe(300);
    expect(await taskCount(w.machine.id)).toBe(serviceLibraryClass('round_baler').tasks.length);
  });

  it('apply class — a used machine at 4,210 h with no history — every added task is history unknown, none OK', async () => {
    const w = await farm();
    await addReadings(w.machine, [
      { daysAgo: 20, value: 4000 },
      { daysAgo: 0, value: 4210 },
    ]);
    const res = await w.agent.post(w.url).send({ machineClass: 'round_baler' });
    const statuses = res.body.data.added.map((t: { due: { status: string } }) => t.due.status);
    expect(statuses.length).toBeGreaterThan(5);
    expect(new Set(statuses)).toEqual(new Set(['history_unknown']));
  });

  it('apply class — bad input — 400 naming machineClass, nothing written', async () => {
    const w = await farm();
    for (const body of [{}, { machineClass: 'harvester' }, { machineClass: 3 }]) {
      const res = await w.agent.post(w.url).send(body);
      expect(res.status, JSON.stringify(body)).toBe(400);
      expect(res.body.error.fields.machineClass).toMatch(/machine class/i);
    }
    const extra = await w.agent.post(w.url).send({ machineClass: 'round_baler', tasks: [] });
    expect(extra.status).toBe(400);
    expect(await taskCount(w.machine.id)).toBe(0);
  });

  it('apply class — a km class on an hour meter — 422 naming machineClass and both units, nothing written', async () => {
    const w = await farm();
    const res = await w.agent.post(w.url).send({ machineClass: 'grain_truck' });
    expect(res.status).toBe(422);
    expect(res.body.error.fields.machineClass).toMatch(/counts in km.*counts in hours/);
    expect(await taskCount(w.machine.id)).toBe(0);
    expect((await Machine.findByPk(w.machine.id))!.machineClass).toBeNull();
  });

  // Hand-worked, km → mi (1 mi = 1.609344 km, NIST Handbook 44), rounded down to two significant
  // figures: engine oil 20,000 km → 12,427.4 mi → 12,000 mi, warning 2,000 km → 1,242.7 → 1,200 mi;
  // wheel nuts first at 100 km → 62.1 → 62 mi. Day intervals stay (365 days).
  it('apply class — the grain truck on a miles odometer — intervals in miles: 20,000 km → 12,000 mi, first wheel-nut check 62 mi', async () => {
    const w = await farm('manager', { category: 'truck', meterUnit: 'mi' });
    const res = await w.agent.post(w.url).send({ machineClass: 'grain_truck' });
    expect(res.status).toBe(200);
    type Added = { name: string; intervalMeter: number | null; warnMeter: number | null };
    const added = (name: string) =>
      res.body.data.added.find((t: Added) => t.name === name) as Added & Record<string, unknown>;
    expect(added('Engine oil and filter')).toMatchObject({
      intervalMeter: 12000,
      warnMeter: 1200,
      intervalDays: 365,
    });
    expect(added('Wheel nut torque').firstServiceMeter).toBe(62);
    expect(added('Wheel nut torque').instructions).toMatch(/1 mi = 1\.609344 km/);
    const stored = await ServiceTask.findOne({
      where: { machineId: w.machine.id, name: 'Engine oil and filter' },
    });
    expect(stored!.intervalMeter).toBe(12000);
  });

  // Hand-worked, hours → bales at 30 round bales an hour (common practice): pickup tines every
  // 50 h → 1,500 bales; main gearbox oil every 500 h → 15,000 bales, first at 50 h → 1,500 bales.
  it('apply class — a round baler counting bales — intervals in bales: 50 h → 1,500 bales, 500 h → 15,000', async () => {
    const w = await farm('manager', { meterUnit: 'bales' });
    const res = await w.agent.post(w.url).send({ machineClass: 'round_baler' });
    expect(res.status).toBe(200);
    const byName = new Map(
      res.body.data.added.map((t: { name: string }) => [t.name, t] as const),
    ) as Map<string, { intervalMeter: number | null; firstServiceMeter: number | null }>;
    expect(byName.get('Pickup tines and guards')!.intervalMeter).toBe(1500);
    expect(byName.get('Main gearbox oil')).toMatchObject({
      intervalMeter: 15000,
      firstServiceMeter: 1500,
    });
  });

  it('apply class — the truck class on a bale counter — 422 naming both of its units, nothing written', async () => {
    const w = await farm('manager', { meterUnit: 'bales' });
    const res = await w.agent.post(w.url).send({ machineClass: 'grain_truck' });
    expect(res.status).toBe(422);
    expect(res.body.error.fields.machineClass).toMatch(/counts in km or miles.*counts in bales/);
    expect(await taskCount(w.machine.id)).toBe(0);
  });

  it('apply class — a technician may (as with templates); an operator gets 403, nothing written', async () => {
    const tech = await farm('technician');
    expect((await tech.agent.post(tech.url).send({ machineClass: 'implement' })).status).toBe(200);
    const op = await farm('operator');
    const res = await op.agent.post(op.url).send({ machineClass: 'implement' });
    expect(res.status).toBe(403);
    expect(await taskCount(op.machine.id)).toBe(0);
  });

  it("apply class — another farm's machine — 404, nothing written; without sign-in 401", async () => {
    const mine = await farm();
    const other = await farm();
    const url = `/api/v1/organizations/${mine.org.id}/machines/${other.machine.id}/apply-class`;
    const res = await mine.agent.post(url).send({ machineClass: 'round_baler' });
    expect(res.status).toBe(404);
    expect(await taskCount(other.machine.id)).toBe(0);
    const anonymous = await request(app).post(mine.url).send({ machineClass: 'round_baler' });
    expect(anonymous.status).toBe(401);
  });
});
