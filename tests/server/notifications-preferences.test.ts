import { beforeEach, describe, expect, it } from 'vitest';
import request from 'supertest';
import { createApp } from '../../server/app';
import { countRows, resetDatabase } from '../support/db';
import {
  createMachine,
  createMember,
  createOrganization,
  signedInAgent,
} from '../support/factories';
import { MachineOperator, NotificationPreference } from '../../server/models';
import { digestHourOf } from '../../server/services/reminders';

const app = createApp();

describe('digest preferences API', () => {
  beforeEach(resetDatabase);
  const url = (orgId: string) => `/api/v1/organizations/${orgId}/notification-preferences`;

  it('preferences — 401 without sign-in', async () => {
    const org = await createOrganization();
    expect((await request(app).get(url(org.id))).status).toBe(401);
    expect((await request(app).put(url(org.id)).send({ frequency: 'off' })).status).toBe(401);
  });

  it('preferences — 400 on a bad frequency or weekday; 422 for a machine of another farm; nothing written', async () => {
    const org = await createOrganization();
    const other = await createOrganization();
    const theirs = await createMachine(other);
    const { user } = await createMember(org, 'technician');
    const agent = await signedInAgent(app, user);
    const bad = await agent.put(url(org.id)).send({ frequency: 'hourly' });
    expect(bad.status).toBe(400);
    expect(bad.body.error.fields.frequency).toBeTruthy();
    const day = await agent.put(url(org.id)).send({ frequency: 'weekly', weekday: 8 });
    expect(day.status).toBe(400);
    expect(day.body.error.fields.weekday).toMatch(/1 \(Monday\) to 7/);
    const foreign = await agent
      .put(url(org.id))
      .send({ frequency: 'daily', machineIds: [theirs.id] });
    expect(foreign.status).toBe(422);
    expect(foreign.body.error.fields.machineIds).toMatch(/this farm/);
    expect(await countRows('notification_preferences')).toBe(0);
  });

  it('preferences — 404 for another farm', async () => {
    const org = await createOrganization();
    const other = await createOrganization();
    const { user } = await createMember(other, 'manager');
    const agent = await signedInAgent(app, user);
    expect((await agent.get(url(org.id))).status).toBe(404);
    expect((await agent.put(url(org.id)).send({ frequency: 'off' })).status).toBe(404);
  });

  it('preferences — 403 for a dealer advisor (reminders are for the people of a farm)', async () => {
    const dealer = await createOrganization({ kind: 'dealer' });
    const { user } = await createMember(dealer, 'advisor');
    const agent = await signedInAgent(app, user);
    expect((await agent.get(url(dealer.id))).status).toBe(403);
    expect((await agent.put(url(dealer.id)).send({ frequency: 'off' })).status).toBe(403);
  });

  it('preferences — 200: the role default, then the saved choice; an operator picks among the machines they see', async () => {
    const org = await createOrganization();
    const mine = await createMachine(org, { fleetNumber: 'A', category: 'baler' });
    const theirs = await createMachine(org, { fleetNumber: 'B' });
    const manager = await createMember(org, 'manager');
    const op = await createMember(org, 'operator');
    const colleague = await createMember(org, 'operator');
    await MachineOperator.create({
      organizationId: org.id,
      machineId: mine.id,
      userId: op.user.id,
    });
    await MachineOperator.create({
      organizationId: org.id,
      machineId: theirs.id,
      userId: colleague.user.id,
    });

    const mgr = await signedInAgent(app, manager.user);
    const m = await mgr.get(url(org.id));
    expect(m.status).toBe(200);
    expect(m.body.data).toMatchObject({ frequency: 'daily', isDefault: true });
    expect(m.body.meta).toMatchObject({ digestHour: 6, timeZone: org.timeZone });
    expect(m.body.meta.machines.map((x: { fleetNumber: string }) => x.fleetNumber)).toEqual([
      'A',
      'B',
    ]);
    expect(m.body.abilities).toEqual({ setDigestHour: true, manageFarmFeed: true });

    const opAgent = await signedInAgent(app, op.user);
    const o = await opAgent.get(url(org.id));
    expect(o.body.data).toMatchObject({ frequency: 'off', isDefault: true });
    expect(o.body.meta.machines.map((x: { fleetNumber: string }) => x.fleetNumber)).toEqual(['A']);
    expect(o.body.abilities).toEqual({ setDigestHour: false, manageFarmFeed: false });
    const saved = await opAgent
      .put(url(org.id))
      .send({ frequency: 'weekly', weekday: 5, machineIds: [mine.id], categories: ['baler'] });
    expect(saved.status).toBe(200);
    expect(saved.body.data).toEqual({
      frequency: 'weekly',
      weekday: 5,
      machineIds: [mine.id],
      categories: ['baler'],
      isDefault: false,
    });
    expect((await NotificationPreference.findByPk(op.membership.id))!.frequency).toBe('weekly');
  });
});

describe('digest hour API', () => {
  beforeEach(resetDatabase);
  const url = (orgId: string) => `/api/v1/organizations/${orgId}/reminder-settings`;

  it('digest hour — 401; 400 out of range (unchanged); 404 another farm; 403 technician; 200 manager', async () => {
    const org = await createOrganization();
    expect((await request(app).patch(url(org.id)).send({ digestHour: 7 })).status).toBe(401);
    const manager = await createMember(org, 'manager');
    const tech = await createMember(org, 'technician');
    const agent = await signedInAgent(app, manager.user);
    const bad = await agent.patch(url(org.id)).send({ digestHour: 24 });
    expect(bad.status).toBe(400);
    expect(bad.body.error.fields.digestHour).toMatch(/0 to 23/);
    expect(await digestHourOf(org.id)).toBe(6);
    const other = await createOrganization();
    expect((await agent.patch(url(other.id)).send({ digestHour: 7 })).status).toBe(404);
    const techAgent = await signedInAgent(app, tech.user);
    expect((await techAgent.patch(url(org.id)).send({ digestHour: 7 })).status).toBe(403);
    expect(await digestHourOf(org.id)).toBe(6);
    const ok = await agent.patch(url(org.id)).send({ digestHour: 5 });
    expect(ok.status).toBe(200);
    expect(ok.body.data).toEqual({ digestHour: 5, timeZone: org.timeZone });
    expect(await digestHourOf(org.id)).toBe(5);
  });
});
