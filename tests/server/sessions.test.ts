import { beforeEach, describe, expect, it } from 'vitest';
import request from 'supertest';
import { createApp } from '../../server/app';
import { sequelize } from '../../server/db';
import { Notification, Session } from '../../server/models';
import { SESSION_COOKIE } from '../../server/infra/session';
import { resetDatabase } from '../support/db';
import { createMember, createOrganization, TEST_PASSWORD } from '../support/factories';

const app = createApp();

/** Signs in and returns the session cookie ("hs_session=…"), as a second device would keep it. */
async function signIn(email: string, password = TEST_PASSWORD, userAgent = 'test-device') {
  const res = await request(app)
    .post('/api/v1/auth/sign-in')
    .set('User-Agent', userAgent)
    .send({ email, password });
  expect(res.status).toBe(200);
  return cookieOf(res);
}

function cookieOf(res: request.Response): string {
  const header = ([] as string[]).concat(res.headers['set-cookie'] ?? []);
  const cookie = header.find((c) => c.startsWith(`${SESSION_COOKIE}=`));
  if (!cookie) throw new Error('no session cookie in the answer');
  return cookie.split(';')[0];
}

const me = (cookie: string) => request(app).get('/api/v1/me').set('Cookie', cookie);

/** The token of the newest password-reset e-mail in the outbox for this address. */
async function latestResetToken(email: string): Promise<string> {
  const message = await Notification.findOne({
    where: { recipient: email, kind: 'password_reset' },
    order: [['createdAt', 'DESC']],
  });
  const link = message?.textBody.match(/https?:\/\/\S+/)?.[0];
  if (!link) throw new Error(`no reset e-mail for ${email}`);
  return new URL(link).searchParams.get('token')!;
}

async function askForReset(email: string) {
  const res = await request(app).post('/api/v1/auth/password-reset').send({ email });
  expect(res.status).toBe(202);
  return latestResetToken(email);
}

const confirmReset = (token: string, password: string) =>
  request(app).post('/api/v1/auth/password-reset/confirm').send({ token, password });

describe('sessions — ended on the server', () => {
  beforeEach(resetDatabase);

  it('sign-out — the same cookie replayed afterwards — 401, and its session row is revoked', async () => {
    const org = await createOrganization();
    const { user } = await createMember(org, 'technician');
    const cookie = await signIn(user.email);
    expect((await me(cookie)).status).toBe(200);
    const out = await request(app).post('/api/v1/auth/sign-out').set('Cookie', cookie);
    expect(out.status).toBe(204);
    expect(String(out.headers['set-cookie'])).toMatch(/hs_session=;/);
    expect((await me(cookie)).status).toBe(401);
    const [row] = await Session.findAll({ where: { userId: user.id } });
    expect(row.revokedAt).toBeInstanceOf(Date);
  });

  it('sign-out — ends only that device: another session of the same person still works', async () => {
    const org = await createOrganization();
    const { user } = await createMember(org, 'operator');
    const phone = await signIn(user.email, TEST_PASSWORD, 'phone');
    const office = await signIn(user.email, TEST_PASSWORD, 'office');
    await request(app).post('/api/v1/auth/sign-out').set('Cookie', phone);
    expect((await me(phone)).status).toBe(401);
    expect((await me(office)).status).toBe(200);
  });

  it('password reset — ends every session of the person, twice in a row; the resetting browser is signed in', async () => {
    const org = await createOrganization();
    const { user } = await createMember(org, 'manager');
    const phone = await signIn(user.email);
    const office = await signIn(user.email);

    const first = await confirmReset(await askForReset(user.email), 'first-new-password');
    expect(first.status).toBe(200);
    expect((await me(phone)).status).toBe(401);
    expect((await me(office)).status).toBe(401);
    const afterFirst = cookieOf(first);
    expect((await me(afterFirst)).status).toBe(200);

    const second = await confirmReset(await askForReset(user.email), 'second-new-password');
    expect(second.status).toBe(200);
    expect((await me(afterFirst)).status).toBe(401);
    expect((await me(cookieOf(second))).status).toBe(200);
  });

  it('password reset — a newer link voids the older one: the older answers 422 and changes nothing', async () => {
    const org = await createOrganization();
    const { user } = await createMember(org, 'technician');
    const older = await askForReset(user.email);
    const newer = await askForReset(user.email);
    expect(newer).not.toBe(older);
    const stale = await confirmReset(older, 'from-the-old-link');
    expect(stale.status).toBe(422);
    expect(stale.body.error.fields.token).toMatch(/expired or was already used/);
    await signIn(user.email, TEST_PASSWORD); // the password is unchanged
    expect((await confirmReset(newer, 'from-the-new-link')).status).toBe(200);
    await signIn(user.email, 'from-the-new-link');
  });

  it('a session past its expiry, or a token without a session id (signed before sessions) — 401', async () => {
    const org = await createOrganization();
    const { user } = await createMember(org, 'technician');
    const cookie = await signIn(user.email);
    await Session.update(
      { expiresAt: new Date(Date.now() - 1000) },
      { where: { userId: user.id } },
    );
    expect((await me(cookie)).status).toBe(401);

    const jwt = (await import('jsonwebtoken')).default;
    const legacy = jwt.sign({ sub: user.id }, process.env.JWT_SECRET!, { issuer: 'hourstone' });
    expect((await me(`${SESSION_COOKIE}=${legacy}`)).status).toBe(401);
  });

  it('session row — keeps the user agent; last seen is written at most every few minutes', async () => {
    const org = await createOrganization();
    const { user } = await createMember(org, 'technician');
    const cookie = await signIn(user.email, TEST_PASSWORD, 'Shop PC browser');
    const [row] = await Session.findAll({ where: { userId: user.id } });
    expect(row.userAgent).toBe('Shop PC browser');
    await me(cookie);
    await row.reload();
    const firstSeen = row.lastSeenAt.getTime();
    await me(cookie);
    await row.reload();
    expect(row.lastSeenAt.getTime()).toBe(firstSeen); // a second request soon after: no write
    await sequelize.query(
      `UPDATE sessions SET last_seen_at = now() - interval '10 minutes' WHERE id = :id`,
      { replacements: { id: row.id } },
    );
    await me(cookie);
    await row.reload();
    expect(Date.now() - row.lastSeenAt.getTime()).toBeLessThan(60_000);
  });
});

describe('password change — ends the other sessions', () => {
  beforeEach(resetDatabase);

  const change = (cookie: string | null, body: object) => {
    const req = request(app).post('/api/v1/auth/password');
    return (cookie ? req.set('Cookie', cookie) : req).send(body);
  };

  it('change — 401 without sign-in', async () => {
    const res = await change(null, {
      currentPassword: TEST_PASSWORD,
      password: 'a-new-password-1',
    });
    expect(res.status).toBe(401);
  });

  it('change — 400 for a short new password and 422 for a wrong current one; the password stays', async () => {
    const org = await createOrganization();
    const { user } = await createMember(org, 'operator');
    const cookie = await signIn(user.email);
    const short = await change(cookie, { currentPassword: TEST_PASSWORD, password: 'short' });
    expect(short.status).toBe(400);
    expect(short.body.error.fields.password).toMatch(/10 characters/);
    const wrong = await change(cookie, {
      currentPassword: 'not-my-password',
      password: 'a-new-password-1',
    });
    expect(wrong.status).toBe(422);
    expect(wrong.body.error.fields.currentPassword).toMatch(/not your current password/);
    await signIn(user.email, TEST_PASSWORD);
  });

  it('change — 204: this device stays signed in, every other session ends, the new password signs in', async () => {
    const org = await createOrganization();
    const { user } = await createMember(org, 'technician');
    const here = await signIn(user.email);
    const elsewhere = await signIn(user.email);
    const res = await change(here, {
      currentPassword: TEST_PASSWORD,
      password: 'a-new-password-1',
    });
    expect(res.status).toBe(204);
    expect((await me(here)).status).toBe(200);
    expect((await me(elsewhere)).status).toBe(401);
    const old = await request(app)
      .post('/api/v1/auth/sign-in')
      .send({ email: user.email, password: TEST_PASSWORD });
    expect(old.status).toBe(401);
    await signIn(user.email, 'a-new-password-1');
  });
});

describe('memberships — a change counts from the next request', () => {
  beforeEach(resetDatabase);

  it('role change — a manager made operator loses manager pages on the very next request', async () => {
    const org = await createOrganization();
    const { user: owner } = await createMember(org, 'manager');
    const { user: deputy, membership } = await createMember(org, 'manager');
    const ownerCookie = await signIn(owner.email);
    const deputyCookie = await signIn(deputy.email);
    const invitations = `/api/v1/organizations/${org.id}/invitations`;
    expect((await request(app).get(invitations).set('Cookie', deputyCookie)).status).toBe(200);
    const demoted = await request(app)
      .patch(`/api/v1/organizations/${org.id}/members/${membership.id}`)
      .set('Cookie', ownerCookie)
      .send({ role: 'operator' });
    expect(demoted.status).toBe(200);
    expect((await request(app).get(invitations).set('Cookie', deputyCookie)).status).toBe(403);
    expect((await me(deputyCookie)).body.data.memberships[0].role).toBe('operator');
  });

  it('removal — the removed member gets 404 for the farm on the next request, and their personal calendar feed 404', async () => {
    const org = await createOrganization();
    const { user: manager } = await createMember(org, 'manager');
    const { user: tech, membership } = await createMember(org, 'technician');
    const managerCookie = await signIn(manager.email);
    const techCookie = await signIn(tech.email);
    const feeds = `/api/v1/organizations/${org.id}/calendar-feeds`;
    const feed = await request(app)
      .post(feeds)
      .set('Cookie', techCookie)
      .send({ scope: 'personal' });
    expect(feed.status).toBe(201);
    const feedPath = new URL(feed.body.data.url).pathname;
    expect((await request(app).get(feedPath)).status).toBe(200);

    const removed = await request(app)
      .delete(`/api/v1/organizations/${org.id}/members/${membership.id}`)
      .set('Cookie', managerCookie);
    expect(removed.status).toBe(204);
    expect((await request(app).get(feeds).set('Cookie', techCookie)).status).toBe(404);
    expect((await request(app).get(feedPath)).status).toBe(404);
    expect((await me(techCookie)).body.data.memberships).toEqual([]);
  });

  it('calendar feed — a link made before leaving stays dead when the person joins again', async () => {
    const org = await createOrganization();
    const { user: tech, membership } = await createMember(org, 'technician');
    const cookie = await signIn(tech.email);
    const feed = await request(app)
      .post(`/api/v1/organizations/${org.id}/calendar-feeds`)
      .set('Cookie', cookie)
      .send({ scope: 'personal' });
    const feedPath = new URL(feed.body.data.url).pathname;
    expect((await request(app).get(feedPath)).status).toBe(200);
    // Removed behind the API's back (no revocation), then back as a new membership.
    await membership.destroy();
    const { Membership } = await import('../../server/models');
    await Membership.create({ organizationId: org.id, userId: tech.id, role: 'operator' });
    expect((await request(app).get(feedPath)).status).toBe(404);
  });
});
