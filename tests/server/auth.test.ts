import { beforeEach, describe, expect, it } from 'vitest';
import request from 'supertest';
import { createApp } from '../../server/app';
import { countRows, resetDatabase } from '../support/db';
import {
  createMember,
  createOrganization,
  signedInAgent,
  TEST_PASSWORD,
} from '../support/factories';
import { clearMail, firstLink, mailTo } from '../support/mail';

const app = createApp();

describe('auth — sign-in', () => {
  beforeEach(async () => {
    await resetDatabase();
    await clearMail();
  });

  it('sign-in — right password — 200 with the user, memberships and an httpOnly SameSite=Lax cookie', async () => {
    const org = await createOrganization({ name: 'Alpha Farm' });
    const { user } = await createMember(org, 'manager');
    const res = await request(app)
      .post('/api/v1/auth/sign-in')
      .send({ email: user.email, password: TEST_PASSWORD });
    expect(res.status).toBe(200);
    expect(res.body.data.user).toEqual({ id: user.id, email: user.email, name: user.name });
    expect(res.body.data.memberships).toEqual([
      {
        id: expect.any(String),
        role: 'manager',
        organization: {
          id: org.id,
          name: 'Alpha Farm',
          kind: 'farm',
          timeZone: 'America/Chicago',
          units: 'metric',
          currency: 'USD',
        },
      },
    ]);
    const cookie = String(res.headers['set-cookie']);
    expect(cookie).toMatch(/^hs_session=/);
    expect(cookie).toMatch(/HttpOnly/i);
    expect(cookie).toMatch(/SameSite=Lax/i);
    expect(cookie).toMatch(/Max-Age=\d+/);
    expect(cookie).not.toMatch(/Secure/i); // plain http on loopback
  });

  it('sign-in — cookie is Secure when the request came over https (behind a trusted proxy)', async () => {
    const org = await createOrganization();
    const { user } = await createMember(org, 'manager');
    const res = await request(app)
      .post('/api/v1/auth/sign-in')
      .set('X-Forwarded-Proto', 'https')
      .send({ email: user.email, password: TEST_PASSWORD });
    expect(res.status).toBe(200);
    expect(String(res.headers['set-cookie'])).toMatch(/Secure/i);
  });

  it('sign-in — wrong password or unknown e-mail — 401 with the same message', async () => {
    const org = await createOrganization();
    const { user } = await createMember(org, 'manager');
    const wrong = await request(app)
      .post('/api/v1/auth/sign-in')
      .send({ email: user.email, password: 'nope-nope-nope' });
    const unknown = await request(app)
      .post('/api/v1/auth/sign-in')
      .send({ email: 'nobody@test.example', password: 'x' });
    expect(wrong.status).toBe(401);
    expect(unknown.status).toBe(401);
    expect(wrong.body.error.code).toBe('invalid_credentials');
    expect(unknown.body.error.message).toBe(wrong.body.error.message);
    expect(wrong.headers['set-cookie']).toBeUndefined();
  });

  it('sign-in — bad input — 400 naming each field', async () => {
    const res = await request(app)
      .post('/api/v1/auth/sign-in')
      .send({ email: 'not-an-email', password: '' });
    expect(res.status).toBe(400);
    expect(res.body.error.fields.email).toMatch(/valid e-mail/);
    expect(res.body.error.fields.password).toMatch(/password/i);
  });

  // Throttling (failures per address, the progressive delay per account): sign-in-throttle.test.ts.

  it('me — without a session — 401; after sign-out — 401', async () => {
    expect((await request(app).get('/api/v1/me')).status).toBe(401);
    const org = await createOrganization();
    const { user } = await createMember(org, 'technician');
    const agent = await signedInAgent(app, user);
    expect((await agent.get('/api/v1/me')).status).toBe(200);
    const out = await agent.post('/api/v1/auth/sign-out');
    expect(out.status).toBe(204);
    expect((await agent.get('/api/v1/me')).status).toBe(401);
  });

  it('me — a tampered session token — 401', async () => {
    const res = await request(app)
      .get('/api/v1/me')
      .set('Cookie', 'hs_session=eyJhbGciOiJIUzI1NiJ9.e30.bad');
    expect(res.status).toBe(401);
  });

  it('session probe — 200 signedIn false without a session, with a tampered token and after sign-out; the same user and memberships as /me when signed in', async () => {
    const signedOut = { data: { signedIn: false } };
    const anonymous = await request(app).get('/api/v1/session');
    expect(anonymous.status).toBe(200);
    expect(anonymous.body).toEqual(signedOut);
    const tampered = await request(app)
      .get('/api/v1/session')
      .set('Cookie', 'hs_session=eyJhbGciOiJIUzI1NiJ9.e30.bad');
    expect([tampered.status, tampered.body]).toEqual([200, signedOut]);

    const org = await createOrganization();
    const { user } = await createMember(org, 'operator');
    const agent = await signedInAgent(app, user);
    const probe = await agent.get('/api/v1/session');
    const me = await agent.get('/api/v1/me');
    expect(probe.status).toBe(200);
    expect(probe.body).toEqual({ data: { signedIn: true, me: me.body.data } });
    expect(probe.body.data.me.user.id).toBe(user.id);
    expect(probe.body.data.me.memberships.map((m: { role: string }) => m.role)).toEqual([
      'operator',
    ]);
    await agent.post('/api/v1/auth/sign-out');
    expect((await agent.get('/api/v1/session')).body).toEqual(signedOut);
  });

  it('helmet — security headers are set', async () => {
    const res = await request(app).get('/api/v1/health');
    expect(res.headers['x-content-type-options']).toBe('nosniff');
    expect(res.headers['content-security-policy']).toMatch(/default-src 'self'/);
    expect(res.headers['x-powered-by']).toBeUndefined();
  });
});

describe('auth — invitation and password reset through the mail catcher', () => {
  beforeEach(async () => {
    await resetDatabase();
    await clearMail();
  });

  it('invitation — manager invites, the link sets a password once, the person is a member', async () => {
    const org = await createOrganization({ name: 'Bravo Farm' });
    const { user: manager } = await createMember(org, 'manager');
    const agent = await signedInAgent(app, manager);
    const sent = await agent
      .post(`/api/v1/organizations/${org.id}/invitations`)
      .send({ email: 'New.Person@Test.example', name: 'New Person', role: 'operator' });
    expect(sent.status).toBe(201);
    expect(sent.body.data).toMatchObject({ email: 'new.person@test.example', role: 'operator' });

    const mail = await mailTo('new.person@test.example');
    expect(mail.subject).toContain('Bravo Farm');
    const token = new URL(firstLink(mail.text)).pathname.split('/').pop()!;

    const look = await request(app).get(`/api/v1/invitations/${token}`);
    expect(look.status).toBe(200);
    expect(look.body.data).toMatchObject({ email: 'new.person@test.example', role: 'operator' });

    const weak = await request(app)
      .post(`/api/v1/invitations/${token}/accept`)
      .send({ name: 'New Person', password: 'short' });
    expect(weak.status).toBe(400);
    expect(weak.body.error.fields.password).toMatch(/10 characters/);

    const newcomer = request.agent(app);
    const accepted = await newcomer
      .post(`/api/v1/invitations/${token}/accept`)
      .send({ name: 'New Person', password: 'a-long-enough-password' });
    expect(accepted.status).toBe(200);
    expect(accepted.body.data.memberships[0]).toMatchObject({
      role: 'operator',
      organization: { id: org.id },
    });
    expect((await newcomer.get('/api/v1/me')).status).toBe(200);

    const again = await request(app)
      .post(`/api/v1/invitations/${token}/accept`)
      .send({ name: 'X', password: 'another-long-password' });
    expect(again.status).toBe(404);
    const signIn = await request(app)
      .post('/api/v1/auth/sign-in')
      .send({ email: 'new.person@test.example', password: 'a-long-enough-password' });
    expect(signIn.status).toBe(200);
  });

  it('password reset — the e-mailed link works once; the old password stops working', async () => {
    const org = await createOrganization();
    const { user } = await createMember(org, 'technician');
    const asked = await request(app)
      .post('/api/v1/auth/password-reset')
      .send({ email: user.email });
    expect(asked.status).toBe(202);
    const unknown = await request(app)
      .post('/api/v1/auth/password-reset')
      .send({ email: 'ghost@test.example' });
    expect(unknown.status).toBe(202);
    expect(unknown.body).toEqual(asked.body);

    const mail = await mailTo(user.email);
    const token = new URL(firstLink(mail.text)).searchParams.get('token')!;
    const stored = await countRows('password_resets');
    expect(stored).toBe(1);

    const done = await request(app)
      .post('/api/v1/auth/password-reset/confirm')
      .send({ token, password: 'brand-new-password-1' });
    expect(done.status).toBe(200);
    const reused = await request(app)
      .post('/api/v1/auth/password-reset/confirm')
      .send({ token, password: 'brand-new-password-2' });
    expect(reused.status).toBe(422);
    expect(reused.body.error.fields.token).toMatch(/expired or was already used/);

    const old = await request(app)
      .post('/api/v1/auth/sign-in')
      .send({ email: user.email, password: TEST_PASSWORD });
    expect(old.status).toBe(401);
    const fresh = await request(app)
      .post('/api/v1/auth/sign-in')
      .send({ email: user.email, password: 'brand-new-password-1' });
    expect(fresh.status).toBe(200);
  });

  it('password reset — the token is stored hashed, and every message is in the notifications table', async () => {
    const org = await createOrganization();
    const { user } = await createMember(org, 'technician');
    await request(app).post('/api/v1/auth/password-reset').send({ email: user.email });
    const mail = await mailTo(user.email);
    const token = new URL(firstLink(mail.text)).searchParams.get('token')!;
    const { PasswordReset, Notification } = await import('../../server/models');
    const reset = await PasswordReset.findOne();
    expect(reset!.tokenHash).not.toContain(token);
    expect(reset!.tokenHash).toMatch(/^[0-9a-f]{64}$/);
    const notes = await Notification.findAll();
    expect(notes.map((n) => [n.kind, n.status])).toEqual([['password_reset', 'sent']]);
  });
});

describe('auth — an invitation never takes over an existing account', () => {
  beforeEach(async () => {
    await resetDatabase();
    await clearMail();
  });

  it('invitation — to an e-mail with an account: a new password is refused (422 on password); the right one joins', async () => {
    const home = await createOrganization({ name: 'Home Farm' });
    const other = await createOrganization({ name: 'Other Farm' });
    const { user: existing } = await createMember(home, 'technician');
    const { user: manager } = await createMember(other, 'manager');
    const agent = await signedInAgent(app, manager);
    await agent
      .post(`/api/v1/organizations/${other.id}/invitations`)
      .send({ email: existing.email, name: 'Whoever', role: 'operator' });
    const mail = await mailTo(existing.email);
    const token = new URL(firstLink(mail.text)).pathname.split('/').pop()!;
    const takeover = await request(app)
      .post(`/api/v1/invitations/${token}/accept`)
      .send({ name: 'Whoever', password: 'attacker-chosen-password' });
    expect(takeover.status).toBe(422);
    expect(takeover.body.error.fields.password).toMatch(/enter its current password/);
    const old = await request(app)
      .post('/api/v1/auth/sign-in')
      .send({ email: existing.email, password: TEST_PASSWORD });
    expect(old.status).toBe(200);
    expect(old.body.data.memberships).toHaveLength(1);
    const join = await request(app)
      .post(`/api/v1/invitations/${token}/accept`)
      .send({ name: existing.name, password: TEST_PASSWORD });
    expect(join.status).toBe(200);
    expect(
      join.body.data.memberships.map(
        (m: { organization: { name: string } }) => m.organization.name,
      ),
    ).toEqual(['Home Farm', 'Other Farm']);
  });
});
