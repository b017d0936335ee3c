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
import { MachineOperator, Notification, NotificationPreference } from '../../server/models';
import { queueMessage } from '../../server/infra/mailer';
import { digestHourOf } from '../../server/services/reminders';
import { unsubscribeToken } from '../../server/services/unsubscribe-tokens';

const app = createApp();

async function outbox(orgId: string) {
  const a = await queueMessage({
    organizationId: orgId,
    recipient: 'a@test.example',
    kind: 'due_digest',
    periodKey: 'daily:2026-04-07',
    subject: 'Due list',
    text: 'Plain body',
    html: '<p>HTML body</p>',
  });
  const b = await queueMessage({
    organizationId: orgId,
    recipient: 'b@test.example',
    kind: 'overdue',
    periodKey: 'x:1:',
    subject: 'Overdue',
    text: 'x',
  });
  await b!.update({ status: 'failed', attempts: 6, lastError: 'connection refused' });
  return { a: a!, b: b! };
}

describe('sent messages API (the outbox)', () => {
  beforeEach(resetDatabase);
  const list = (orgId: string) => `/api/v1/organizations/${orgId}/notifications`;

  it('messages — 401 without sign-in (list and one message)', async () => {
    const org = await createOrganization();
    const { a } = await outbox(org.id);
    expect((await request(app).get(list(org.id))).status).toBe(401);
    expect((await request(app).get(`${list(org.id)}/${a.id}`)).status).toBe(401);
  });

  it('messages — 400 on a bad status filter', async () => {
    const org = await createOrganization();
    const { user } = await createMember(org, 'manager');
    const res = await (await signedInAgent(app, user)).get(`${list(org.id)}?status=lost`);
    expect(res.status).toBe(400);
    expect(res.body.error.fields.status).toBe('Status is queued, sending, sent or failed');
  });

  it('messages — 404 for another farm, and for a message of another farm', async () => {
    const org = await createOrganization();
    const { a } = await outbox(org.id);
    const other = await createOrganization();
    const { user } = await createMember(other, 'manager');
    const agent = await signedInAgent(app, user);
    expect((await agent.get(list(org.id))).status).toBe(404);
    expect((await agent.get(`${list(org.id)}/${a.id}`)).status).toBe(404);
    expect((await agent.get(`${list(other.id)}/${a.id}`)).status).toBe(404);
  });

  it('messages — 403 for technicians and operators (list and one message); 400 for a bad id', async () => {
    const org = await createOrganization();
    const { a } = await outbox(org.id);
    for (const role of ['technician', 'operator'] as const) {
      const { user } = await createMember(org, role);
      const agent = await signedInAgent(app, user);
      expect((await agent.get(list(org.id))).status).toBe(403);
      expect((await agent.get(`${list(org.id)}/${a.id}`)).status).toBe(403);
    }
    const { user } = await createMember(org, 'manager');
    expect((await (await signedInAgent(app, user)).get(`${list(org.id)}/nope`)).status).toBe(400);
  });

  it('messages — 200: newest first with status, attempts and last error; counts; one message with its content', async () => {
    const org = await createOrganization();
    const { a, b } = await outbox(org.id);
    await Notification.update(
      { createdAt: new Date(Date.now() - 60_000) },
      { where: { id: a.id } },
    );
    const { user } = await createMember(org, 'manager');
    const agent = await signedInAgent(app, user);
    const res = await agent.get(list(org.id));
    expect(res.status).toBe(200);
    expect(res.body.meta).toMatchObject({
      total: 2,
      counts: { queued: 1, sending: 0, sent: 0, failed: 1 },
    });
    expect(res.body.data.map((m: { id: string }) => m.id)).toEqual([b.id, a.id]);
    expect(res.body.data[0]).toMatchObject({
      status: 'failed',
      attempts: 6,
      lastError: 'connection refused',
      kind: 'overdue',
      nextAttemptAt: null,
    });
    expect(res.body.data[0].text).toBeUndefined();
    const failed = await agent.get(`${list(org.id)}?status=failed`);
    expect(failed.body.data.map((m: { id: string }) => m.id)).toEqual([b.id]);
    const one = await agent.get(`${list(org.id)}/${a.id}`);
    expect(one.status).toBe(200);
    expect(one.body.data).toMatchObject({
      subject: 'Due list',
      text: 'Plain body',
      html: '<p>HTML body</p>',
      status: 'queued',
    });
  });

  it('messages — the content of invitations (a single-use link that sets a password) and digest unsubscribe links are never shown', async () => {
    const org = await createOrganization();
    const invitation = await queueMessage({
      organizationId: org.id,
      recipient: 'new@test.example',
      kind: 'invitation',
      periodKey: 'inv-1',
      subject: 'You are invited',
      text: 'Open http://127.0.0.1/invitations/SECRET-TOKEN',
      html: '<a href="http://127.0.0.1/invitations/SECRET-TOKEN">Join</a>',
    });
    const digest = await queueMessage({
      organizationId: org.id,
      recipient: 'tech@test.example',
      kind: 'due_digest',
      periodKey: 'daily:2026-04-07',
      subject: 'Due list',
      text: 'Stop these e-mails: http://127.0.0.1/api/v1/unsubscribe/abc.SIGNATURE',
      html: '<a href="http://127.0.0.1/api/v1/unsubscribe/abc.SIGNATURE">Stop</a>',
    });
    const { user } = await createMember(org, 'manager');
    const agent = await signedInAgent(app, user);
    const inv = (await agent.get(`${list(org.id)}/${invitation!.id}`)).body.data;
    expect(JSON.stringify(inv)).not.toContain('SECRET-TOKEN');
    expect(inv.html).toBeNull();
    expect(inv.text).toMatch(/not shown/);
    const dig = (await agent.get(`${list(org.id)}/${digest!.id}`)).body.data;
    expect(JSON.stringify(dig)).not.toContain('SIGNATURE');
    expect(dig.text).toContain('/api/v1/unsubscribe/…');
  });
});

describe('sent messages API — a message being sent', () => {
  beforeEach(resetDatabase);

  it('messages — a message claimed by a worker shows as sending, counted apart, with no next try; the sending filter finds it', async () => {
    const org = await createOrganization();
    const { a } = await outbox(org.id);
    await a.update({ status: 'sending', attempts: 1, claimedUntil: new Date(Date.now() + 60_000) });
    const { user } = await createMember(org, 'manager');
    const agent = await signedInAgent(app, user);
    const url = `/api/v1/organizations/${org.id}/notifications`;
    const res = await agent.get(url);
    expect(res.body.meta.counts).toEqual({ queued: 0, sending: 1, sent: 0, failed: 1 });
    expect(res.body.meta.total).toBe(2);
    const sending = await agent.get(`${url}?status=sending`);
    expect(sending.status).toBe(200);
    expect(sending.body.meta.total).toBe(1);
    expect(sending.body.data).toEqual([
      expect.objectContaining({ id: a.id, status: 'sending', attempts: 1, nextAttemptAt: null }),
    ]);
  });
});

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

describe('one-click unsubscribe (RFC 8058)', () => {
  beforeEach(resetDatabase);

  it('unsubscribe — 400 malformed; 404 forged; GET only asks (HTML or JSON); POST turns the digest off', async () => {
    const org = await createOrganization({ name: 'Hilltop Farm' });
    const { membership } = await createMember(org, 'manager');
    const token = unsubscribeToken(membership.id);
    expect((await request(app).post('/api/v1/unsubscribe/nonsense')).status).toBe(400);
    const forged = `${membership.id}.${'A'.repeat(43)}`;
    expect((await request(app).post(`/api/v1/unsubscribe/${forged}`)).status).toBe(404);
    // a token signed for another membership does not work for this one
    const { membership: other } = await createMember(org, 'technician');
    const swapped = `${membership.id}.${unsubscribeToken(other.id).split('.')[1]}`;
    expect((await request(app).post(`/api/v1/unsubscribe/${swapped}`)).status).toBe(404);
    expect(await countRows('notification_preferences')).toBe(0);

    const page = await request(app).get(`/api/v1/unsubscribe/${token}`).set('Accept', 'text/html');
    expect(page.status).toBe(200);
    expect(page.headers['content-type']).toMatch(/html/);
    expect(page.text).toContain('Hilltop Farm');
    expect(page.text).toContain('<form method="post">');
    const json = await request(app).get(`/api/v1/unsubscribe/${token}`);
    expect(json.body).toEqual({ data: { organization: 'Hilltop Farm' } });
    expect(await countRows('notification_preferences')).toBe(0);

    const res = await request(app)
      .post(`/api/v1/unsubscribe/${token}`)
      .type('form')
      .send('List-Unsubscribe=One-Click');
    expect(res.status).toBe(200);
    expect(res.body).toEqual({ data: { unsubscribed: true, organization: 'Hilltop Farm' } });
    expect((await NotificationPreference.findByPk(membership.id))!.frequency).toBe('off');
  });

  it('unsubscribe — 404 once the membership has ended', async () => {
    const org = await createOrganization();
    const { membership } = await createMember(org, 'manager');
    const token = unsubscribeToken(membership.id);
    await membership.destroy();
    expect((await request(app).post(`/api/v1/unsubscribe/${token}`)).status).toBe(404);
  });
});
