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
import { DealerLink, Invitation } from '../../server/models';
import { sequelize } from '../../server/db';

const app = createApp();

type Step = { key: string; done: boolean; remaining: number | null; machineId: string | null };
const doneOf = (steps: Step[]) => Object.fromEntries(steps.map((s) => [s.key, s.done]));

async function newFarm() {
  const org = await createOrganization({ name: 'Fenwick Hollow' });
  const { user } = await createMember(org, 'manager');
  const agent = await signedInAgent(app, user);
  const base = `/api/v1/organizations/${org.id}`;
  return { org, user, agent, base, url: `${base}/first-run-checklist` };
}

describe('first-run checklist', () => {
  beforeEach(resetDatabase);

  it('first run — 401 without sign-in, 403 for a technician, 404 for another farm', async () => {
    const f = await newFarm();
    expect((await request(app).get(f.url)).status).toBe(401);
    const { user: tech } = await createMember(f.org, 'technician');
    const techAgent = await signedInAgent(app, tech);
    expect((await techAgent.get(f.url)).status).toBe(403);
    const refused = await techAgent.put(`${f.url}/dismissal`).send({ dismissed: true });
    expect(refused.status).toBe(403);
    const other = await newFarm();
    expect((await other.agent.get(f.url)).status).toBe(404);
    expect(await countRows('first_run_dismissals')).toBe(0);
  });

  it('first run — an empty farm: nothing is ticked and the list is offered', async () => {
    const f = await newFarm();
    const res = await f.agent.get(f.url);
    expect(res.status).toBe(200);
    expect(res.body.data).toMatchObject({ complete: false, dismissed: false, offered: true });
    expect(doneOf(res.body.data.steps)).toEqual({
      machines: false,
      schedules: false,
      lastDone: false,
      team: false,
      dealer: false,
      digestHour: false,
    });
  });

  it('first run — each step ticks from the data as it is done, until the list is complete and no longer offered', async () => {
    const f = await newFarm();
    const machine = await createMachine(f.org, { fleetNumber: 'T-01' });
    await addReadings(machine, [{ daysAgo: 1, value: 4210 }]);
    const bare = await createMachine(f.org, { fleetNumber: 'T-02' });
    const task = await f.agent
      .post(`${f.base}/machines/${machine.id}/tasks`)
      .send({ name: 'Engine oil', intervalMeter: 500 });
    expect(task.status).toBe(201);

    let steps: Step[] = (await f.agent.get(f.url)).body.data.steps;
    expect(doneOf(steps)).toMatchObject({ machines: true, schedules: false, lastDone: false });
    expect(steps.find((s) => s.key === 'schedules')).toMatchObject({
      remaining: 1,
      machineId: bare.id,
    });
    expect(steps.find((s) => s.key === 'lastDone')).toMatchObject({
      remaining: 1,
      machineId: machine.id,
    });

    await bare.update({ status: 'sold' });
    await f.agent.post(`${f.base}/tasks/${task.body.data.id}/count-from-now`);
    await Invitation.create({
      organizationId: f.org.id,
      email: 'dev@fenwick.example',
      name: 'Dev',
      role: 'technician',
      tokenHash: 'x',
      invitedBy: f.user.id,
      expiresAt: new Date(Date.now() + 86_400_000),
      acceptedAt: null,
    });
    const dealer = await createOrganization({ kind: 'dealer', name: 'Quarry Lane Equipment' });
    await DealerLink.create({
      dealerOrganizationId: dealer.id,
      farmOrganizationId: f.org.id,
      access: 'view',
      status: 'active',
      initiatedBy: 'farm',
      invitedBy: f.user.id,
      tokenHash: null,
      expiresAt: null,
      acceptedBy: null,
      acceptedAt: new Date(),
      revokedBy: null,
      revokedAt: null,
    });
    steps = (await f.agent.get(f.url)).body.data.steps;
    expect(doneOf(steps)).toEqual({
      machines: true,
      schedules: true,
      lastDone: true,
      team: true,
      dealer: true,
      digestHour: false,
    });
    // keeping the usual hour on purpose counts as choosing it
    const chosen = await f.agent.patch(`${f.base}/reminder-settings`).send({ digestHour: 6 });
    expect(chosen.status).toBe(200);
    const res = await f.agent.get(f.url);
    expect(res.body.data).toMatchObject({ complete: true, offered: false });
  });

  it('first run — putting the list away is per manager; a bad body is refused (400) and nothing stored', async () => {
    const f = await newFarm();
    const bad = await f.agent.put(`${f.url}/dismissal`).send({ dismissed: 'yes' });
    expect(bad.status).toBe(400);
    expect(bad.body.error.fields.dismissed).toBeDefined();
    expect(await countRows('first_run_dismissals')).toBe(0);
    const res = await f.agent.put(`${f.url}/dismissal`).send({ dismissed: true });
    expect(res.status).toBe(200);
    expect(res.body.data).toMatchObject({ dismissed: true, offered: false });
    expect((await f.agent.get(f.url)).body.data.offered).toBe(false);
    const { user: second } = await createMember(f.org, 'manager');
    const other = await signedInAgent(app, second);
    expect((await other.get(f.url)).body.data.offered).toBe(true);
  });

  it('first run — a farm that has recorded a service is past its first run: not offered', async () => {
    const f = await newFarm();
    const machine = await createMachine(f.org);
    await sequelize.query(
      `INSERT INTO service_records (organization_id, machine_id, performed_on, meter_value, status)
       VALUES (:org, :machine, current_date, 100, 'completed')`,
      { replacements: { org: f.org.id, machine: machine.id } },
    );
    const res = await f.agent.get(f.url);
    expect(res.body.data).toMatchObject({ complete: false, offered: false });
  });
});
