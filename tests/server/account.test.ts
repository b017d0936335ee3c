import { beforeEach, describe, expect, it } from 'vitest';
import request from 'supertest';
import { createApp } from '../../server/app';
import { User } from '../../server/models';
import { countRows, resetDatabase } from '../support/db';
import {
  createMember,
  createOrganization,
  createUser,
  signedInAgent,
  TEST_PASSWORD,
} from '../support/factories';
import { clearMail, deliveredMail, firstLink, mailTo } from '../support/mail';

const app = createApp();
const tokenOf = (text: string) => new URL(firstLink(text)).searchParams.get('token')!;
const signIn = (email: string, password = TEST_PASSWORD) =>
  request(app).post('/api/v1/auth/sign-in').send({ email, password });

describe('account — name and e-mail address', () => {
  beforeEach(async () => {
    await resetDatabase();
    await clearMail();
  });

  it('account — without sign-in — 401 on every route', async () => {
    for (const res of [
      await request(app).get('/api/v1/account'),
      await request(app).patch('/api/v1/account').send({ name: 'X' }),
      await request(app).post('/api/v1/account/email').send({}),
      await request(app).delete('/api/v1/account').send({}),
    ])
      expect(res.status).toBe(401);
  });

  it('patch — the name — 200, only the name changes; an unknown field 400', async () => {
    const user = await createUser({ name: 'Old Name', email: 'rename@test.example' });
    const agent = await signedInAgent(app, user);
    const res = await agent.patch('/api/v1/account').send({ name: '  Hollis Brant ' });
    expect(res.status).toBe(200);
    expect(res.body.data).toEqual({
      id: user.id,
      name: 'Hollis Brant',
      email: 'rename@test.example',
      pendingEmail: null,
      lastManagerOf: [],
    });
    const bad = await agent.patch('/api/v1/account').send({ email: 'x@test.example' });
    expect(bad.status).toBe(400);
    expect(bad.body.error.fields).toEqual({ email: 'Not a field of this request' });
    await user.reload();
    expect([user.name, user.email]).toEqual(['Hollis Brant', 'rename@test.example']);
  });

  it('e-mail change — takes effect only when the link sent to the new address is opened', async () => {
    const user = await createUser({ name: 'Mover', email: 'old@test.example' });
    const agent = await signedInAgent(app, user);
    const asked = await agent
      .post('/api/v1/account/email')
      .send({ email: 'New@Test.example', currentPassword: TEST_PASSWORD });
    expect(asked.status).toBe(202);
    expect(asked.body.data).toMatchObject({
      email: 'old@test.example',
      pendingEmail: 'new@test.example',
    });
    // not yet: the old address still signs in, the new one does not
    expect((await signIn('old@test.example')).status).toBe(200);
    expect((await signIn('new@test.example')).status).toBe(401);

    const mail = await mailTo('new@test.example');
    expect(mail.subject).toBe('Confirm your new e-mail address for Hourstone');
    const confirmed = await request(app)
      .post('/api/v1/account/email/confirm')
      .send({ token: tokenOf(mail.text) });
    expect(confirmed.status).toBe(200);
    expect(confirmed.body.data).toEqual({ email: 'new@test.example' });
    expect((await signIn('new@test.example')).status).toBe(200);
    expect((await signIn('old@test.example')).status).toBe(401);
    const notice = (await deliveredMail()).find((m) => m.to.includes('old@test.example'));
    expect(notice?.subject).toBe('Your Hourstone e-mail address was changed');

    const reused = await request(app)
      .post('/api/v1/account/email/confirm')
      .send({ token: tokenOf(mail.text) });
    expect(reused.status).toBe(422);
    expect((await agent.get('/api/v1/account')).body.data.pendingEmail).toBeNull();
  });

  it("e-mail change — another account's address — the same answer, no link; its owner is told", async () => {
    await createUser({ email: 'taken@test.example' });
    const user = await createUser({ email: 'me@test.example' });
    const agent = await signedInAgent(app, user);
    const res = await agent
      .post('/api/v1/account/email')
      .send({ email: 'taken@test.example', currentPassword: TEST_PASSWORD });
    expect(res.status).toBe(202);
    expect(res.body.data.pendingEmail).toBe('taken@test.example');
    const mail = await mailTo('taken@test.example');
    expect(mail.subject).toBe('Someone tried to move a Hourstone account to your address');
    expect(mail.text).not.toMatch(/token=/);
    await user.reload();
    expect(user.email).toBe('me@test.example');
  });

  it('e-mail change — wrong current password 422, bad address 400, own address 422; nothing sent', async () => {
    const user = await createUser({ email: 'same@test.example' });
    const agent = await signedInAgent(app, user);
    const wrong = await agent
      .post('/api/v1/account/email')
      .send({ email: 'else@test.example', currentPassword: 'not-my-password' });
    expect(wrong.status).toBe(422);
    expect(wrong.body.error.fields).toEqual({
      currentPassword: 'That is not your current password',
    });
    const bad = await agent.post('/api/v1/account/email').send({ email: 'nope' });
    expect(bad.status).toBe(400);
    expect(Object.keys(bad.body.error.fields).sort()).toEqual(['currentPassword', 'email']);
    const own = await agent
      .post('/api/v1/account/email')
      .send({ email: 'SAME@test.example', currentPassword: TEST_PASSWORD });
    expect(own.status).toBe(422);
    expect(own.body.error.fields.email).toBe('This is your e-mail address already');
    expect(await countRows('email_verifications')).toBe(0);
    expect(await countRows('notifications')).toBe(0);
  });
});

describe('account — password change', () => {
  beforeEach(async () => {
    await resetDatabase();
  });

  it('password — with the current one — every other session ends, this one stays', async () => {
    const user = await createUser();
    const here = await signedInAgent(app, user);
    const phone = await signedInAgent(app, user);
    const res = await here
      .post('/api/v1/auth/password')
      .send({ currentPassword: TEST_PASSWORD, password: 'a-fresh-long-password' });
    expect(res.status).toBe(204);
    expect((await here.get('/api/v1/me')).status).toBe(200);
    expect((await phone.get('/api/v1/me')).status).toBe(401);
    expect((await signIn(user.email, 'a-fresh-long-password')).status).toBe(200);
  });
});

describe('account — delete', () => {
  beforeEach(async () => {
    await resetDatabase();
  });

  it('delete — the last manager of a farm — 409 naming the farm; the account stays', async () => {
    const farm = await createOrganization({ name: 'Ashgrove Farm' });
    const { user } = await createMember(farm, 'manager');
    await createMember(farm, 'technician');
    const agent = await signedInAgent(app, user);
    expect((await agent.get('/api/v1/account')).body.data.lastManagerOf).toEqual([
      { id: farm.id, name: 'Ashgrove Farm' },
    ]);
    const res = await agent.delete('/api/v1/account').send({ currentPassword: TEST_PASSWORD });
    expect(res.status).toBe(409);
    expect(res.body.error.code).toBe('last_manager');
    expect(res.body.error.message).toMatch(/last manager of Ashgrove Farm/);
    expect(await User.findByPk(user.id)).not.toBeNull();
    expect((await agent.get('/api/v1/me')).status).toBe(200);
  });

  it("delete — a dealer's last advisor — 409 naming the dealer", async () => {
    const dealer = await createOrganization({ kind: 'dealer', name: 'Lone Counter' });
    const { user } = await createMember(dealer, 'advisor');
    const res = await (
      await signedInAgent(app, user)
    )
      .delete('/api/v1/account')
      .send({ currentPassword: TEST_PASSWORD });
    expect(res.status).toBe(409);
    expect(res.body.error.message).toMatch(/Lone Counter/);
  });

  it('delete — another manager remains — 204; the account, its sessions and memberships are gone, the farm stays', async () => {
    const farm = await createOrganization({ name: 'Twin Oaks' });
    const { user } = await createMember(farm, 'manager');
    const { user: other } = await createMember(farm, 'manager');
    const agent = await signedInAgent(app, user);
    const wrong = await agent.delete('/api/v1/account').send({ currentPassword: 'wrong-password' });
    expect(wrong.status).toBe(422);
    expect(await User.findByPk(user.id)).not.toBeNull();

    const res = await agent.delete('/api/v1/account').send({ currentPassword: TEST_PASSWORD });
    expect(res.status).toBe(204);
    expect(await User.findByPk(user.id)).toBeNull();
    expect((await agent.get('/api/v1/me')).status).toBe(401);
    expect((await signIn(user.email)).status).toBe(401);
    expect(await countRows('memberships')).toBe(1);
    expect((await signIn(other.email)).status).toBe(200);
  });
});
