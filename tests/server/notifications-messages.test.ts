import { beforeEach, describe, expect, it } from 'vitest';
import request from 'supertest';
import { createApp } from '../../server/app';
import { resetDatabase } from '../support/db';
import { createMember, createOrganization, signedInAgent } from '../support/factories';
import { Notification } from '../../server/models';
import { queueMessage } from '../../server/infra/mailer';

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
