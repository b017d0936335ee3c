import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import request from 'supertest';
import { createApp } from '../../server/app';
import { env } from '../../server/env';
import { EmailVerification, User } from '../../server/models';
import { SIGN_UP_LIMIT_PER_EMAIL } from '../../server/middlewares/sign-up-limit';
import { countRows, resetDatabase } from '../support/db';
import { createMember, createOrganization, TEST_PASSWORD } from '../support/factories';
import { caughtMail, clearMail, deliveredMail, firstLink, mailTo } from '../support/mail';

const app = createApp();
const PASSWORD = 'a-long-sign-up-password';
const signUp = (body: Record<string, unknown>) =>
  request(app).post('/api/v1/auth/sign-up').send(body);
const verify = (
  token: string,
  client: Pick<ReturnType<typeof request.agent>, 'post'> = request(app),
) => client.post('/api/v1/auth/verify-email').send({ token });
const tokenOf = (text: string) => new URL(firstLink(text)).searchParams.get('token')!;

describe('sign-up — confirming the address by an e-mailed link', () => {
  beforeEach(async () => {
    await resetDatabase();
    await clearMail();
  });

  it('sign-up — new address — 202, no account until the link; the link creates it once and signs in', async () => {
    const res = await signUp({
      name: 'Wren Okafor',
      email: 'Wren@Test.example',
      password: PASSWORD,
    });
    expect(res.status).toBe(202);
    expect(res.body).toEqual({ data: { sent: true } });
    expect(await countRows('users')).toBe(0);

    const mail = await mailTo('wren@test.example');
    expect(mail.subject).toBe('Confirm your e-mail address for Hourstone');
    const link = firstLink(mail.text);
    expect(link).toMatch(/\/verify-email\?token=[\w-]{40,}$/);
    // only the hash of the token is stored
    const stored = await EmailVerification.findOne();
    expect(stored!.tokenHash).not.toContain(tokenOf(mail.text));

    const agent = request.agent(app);
    const opened = await verify(tokenOf(mail.text), agent);
    expect(opened.status).toBe(200);
    expect(opened.body.data.user).toMatchObject({
      name: 'Wren Okafor',
      email: 'wren@test.example',
    });
    expect(opened.body.data.memberships).toEqual([]);
    expect((await agent.get('/api/v1/me')).status).toBe(200);

    const again = await verify(tokenOf(mail.text));
    expect(again.status).toBe(422);
    expect(again.body.error.fields.token).toMatch(/expired or was already used/);
    expect(await countRows('users')).toBe(1);
    const signIn = await request(app)
      .post('/api/v1/auth/sign-in')
      .send({ email: 'wren@test.example', password: PASSWORD });
    expect(signIn.status).toBe(200);
  });

  it('sign-up — address that has an account — the same answer, no link; the owner is told and nothing changes', async () => {
    const org = await createOrganization();
    const { user } = await createMember(org, 'manager', { email: 'owner@test.example' });
    const fresh = await signUp({ name: 'Fresh', email: 'fresh@test.example', password: PASSWORD });
    const known = await signUp({
      name: 'Impostor',
      email: 'OWNER@test.example',
      password: PASSWORD,
    });
    expect(known.status).toBe(fresh.status);
    expect(known.body).toEqual(fresh.body);

    const mail = await mailTo('owner@test.example');
    expect(mail.subject).toBe('Someone tried to sign up to Hourstone with your address');
    expect(mail.text).not.toMatch(/verify-email/);
    expect(await EmailVerification.count({ where: { email: 'owner@test.example' } })).toBe(0);
    await user.reload();
    expect(user.name).not.toBe('Impostor');
    const old = await request(app)
      .post('/api/v1/auth/sign-in')
      .send({ email: 'owner@test.example', password: TEST_PASSWORD });
    expect(old.status).toBe(200);
  });

  it("sign-up — a second person's attempt with the same address — each link keeps its own password", async () => {
    await signUp({ name: 'Real Owner', email: 'shared@test.example', password: PASSWORD });
    await signUp({
      name: 'Someone Else',
      email: 'shared@test.example',
      password: 'not-the-owners-one',
    });
    const links = (await deliveredMail())
      .filter((m) => m.to.includes('shared@test.example'))
      .map((m) => ({ token: tokenOf(m.text), text: m.text }));
    expect(links).toHaveLength(2);
    const owners = links.find((l) => l.text.includes('Hello Real Owner'))!;
    expect((await verify(owners.token)).status).toBe(200);

    const user = await User.findOne({ where: { email: 'shared@test.example' } });
    expect(user!.name).toBe('Real Owner');
    const stranger = await request(app)
      .post('/api/v1/auth/sign-in')
      .send({ email: 'shared@test.example', password: 'not-the-owners-one' });
    expect(stranger.status).toBe(401);
    // the other link ended with the first one's use
    const other = links.find((l) => l !== owners)!;
    expect((await verify(other.token)).status).toBe(422);
  });

  it('sign-up — bad input — 400 naming each field and its rule, nothing written or mailed', async () => {
    const res = await signUp({ name: '', email: 'not-an-email', password: 'short', role: 'x' });
    expect(res.status).toBe(400);
    expect(res.body.error.fields).toMatchObject({
      name: 'Enter a name',
      email: expect.stringMatching(/valid e-mail/),
      password: 'Use at least 10 characters',
      role: 'Not a field of this request',
    });
    expect(await countRows('email_verifications')).toBe(0);
    expect(await countRows('notifications')).toBe(0);
  });

  it('verify-email — an unknown or expired token — 422 on the token, no account', async () => {
    await signUp({ name: 'Late Person', email: 'late@test.example', password: PASSWORD });
    const token = tokenOf((await mailTo('late@test.example')).text);
    await EmailVerification.update({ expiresAt: new Date(Date.now() - 1000) }, { where: {} });
    const expired = await verify(token);
    expect(expired.status).toBe(422);
    expect(expired.body.error.fields.token).toMatch(/expired/);
    const unknown = await verify('x'.repeat(43));
    expect(unknown.status).toBe(422);
    expect(await countRows('users')).toBe(0);
  });

  it('verify-email — the address got an account meanwhile — 422, still one account', async () => {
    await signUp({ name: 'Slow Clicker', email: 'slow@test.example', password: PASSWORD });
    const token = tokenOf((await mailTo('slow@test.example')).text);
    const org = await createOrganization();
    await createMember(org, 'operator', { email: 'slow@test.example' });
    const res = await verify(token);
    expect(res.status).toBe(422);
    expect(res.body.error.fields.token).toMatch(/has an account already/);
    expect(await countRows('users')).toBe(1);
  });

  it(`sign-up — more than ${SIGN_UP_LIMIT_PER_EMAIL} for one e-mail within the hour — 429, no further mail`, async () => {
    const body = { name: 'Eager', email: 'eager@test.example', password: PASSWORD };
    for (let i = 0; i < SIGN_UP_LIMIT_PER_EMAIL; i += 1)
      expect((await signUp(body)).status).toBe(202);
    const refused = await signUp(body);
    expect(refused.status).toBe(429);
    expect(refused.body.error.code).toBe('throttled');
    expect(await countRows('email_verifications')).toBe(SIGN_UP_LIMIT_PER_EMAIL);
    // the limit is the address's, not everyone's
    expect((await signUp({ ...body, email: 'calm@test.example' })).status).toBe(202);
  });
});

describe('sign-up — SIGNUP=closed', () => {
  beforeEach(async () => {
    await resetDatabase();
    await clearMail();
    env.SIGNUP = 'closed';
  });
  afterEach(() => {
    env.SIGNUP = 'open';
  });

  it('sign-up — closed — 403 with a plain refusal, even for a bad body; nothing written', async () => {
    const status = await request(app).get('/api/v1/auth/sign-up');
    expect(status.body).toEqual({ data: { open: false } });
    for (const body of [
      { name: 'Closed Out', email: 'closed@test.example', password: PASSWORD },
      { email: 'bad' },
    ]) {
      const res = await signUp(body);
      expect(res.status).toBe(403);
      expect(res.body.error.code).toBe('sign_up_closed');
      expect(res.body.error.message).toMatch(/Sign-up is closed on this server/);
    }
    expect(await countRows('email_verifications')).toBe(0);
    expect(await caughtMail()).toEqual([]);
  });

  it('sign-up status — open — says so', async () => {
    env.SIGNUP = 'open';
    expect((await request(app).get('/api/v1/auth/sign-up')).body).toEqual({ data: { open: true } });
  });
});
