import { beforeEach, describe, expect, it } from 'vitest';
import request from 'supertest';
import { createApp } from '../../server/app';
import { countRows, resetDatabase } from '../support/db';
import { createMember, createOrganization, signedInAgent } from '../support/factories';
import { clearMail } from '../support/mail';
import { Membership } from '../../server/models';

const app = createApp();

describe('members — roles and organizations', () => {
  beforeEach(async () => {
    await resetDatabase();
    await clearMail();
  });

  it('members — 401 without sign-in', async () => {
    const org = await createOrganization();
    expect((await request(app).get(`/api/v1/organizations/${org.id}/members`)).status).toBe(401);
  });

  it('members — manager lists members with abilities; may invite', async () => {
    const org = await createOrganization();
    const { user: manager } = await createMember(org, 'manager', { name: 'Ann Manager' });
    await createMember(org, 'operator', { name: 'Bob Operator' });
    const agent = await signedInAgent(app, manager);
    const res = await agent.get(`/api/v1/organizations/${org.id}/members`);
    expect(res.status).toBe(200);
    expect(res.body.abilities).toEqual({ invite: true });
    expect(
      res.body.data.map((m: { user: { name: string }; abilities: object }) => [
        m.user.name,
        m.abilities,
      ]),
    ).toEqual([
      ['Ann Manager', { update: false, remove: false }],
      ['Bob Operator', { update: true, remove: true }],
    ]);
  });

  it('members — operator sees the list without abilities; invite, role change and removal answer 403 and change nothing', async () => {
    const org = await createOrganization();
    await createMember(org, 'manager');
    const { user: op, membership } = await createMember(org, 'operator');
    const { membership: tech } = await createMember(org, 'technician');
    const agent = await signedInAgent(app, op);
    const list = await agent.get(`/api/v1/organizations/${org.id}/members`);
    expect(list.body.abilities).toEqual({ invite: false });
    const invite = await agent
      .post(`/api/v1/organizations/${org.id}/invitations`)
      .send({ email: 'x@test.example', name: 'X', role: 'operator' });
    expect(invite.status).toBe(403);
    expect(
      (
        await agent
          .patch(`/api/v1/organizations/${org.id}/members/${tech.id}`)
          .send({ role: 'manager' })
      ).status,
    ).toBe(403);
    expect((await agent.delete(`/api/v1/organizations/${org.id}/members/${tech.id}`)).status).toBe(
      403,
    );
    expect((await agent.get(`/api/v1/organizations/${org.id}/invitations`)).status).toBe(403);
    expect(await countRows('invitations')).toBe(0);
    expect((await Membership.findByPk(tech.id))!.role).toBe('technician');
    expect(membership.role).toBe('operator');
  });

  it('members — technician may not invite (403)', async () => {
    const org = await createOrganization();
    const { user } = await createMember(org, 'technician');
    const agent = await signedInAgent(app, user);
    const res = await agent
      .post(`/api/v1/organizations/${org.id}/invitations`)
      .send({ email: 'x@test.example', name: 'X', role: 'operator' });
    expect(res.status).toBe(403);
  });

  it('members — manager changes a role and removes a member; both are audited', async () => {
    const org = await createOrganization();
    const { user: manager } = await createMember(org, 'manager');
    const { membership } = await createMember(org, 'operator');
    const agent = await signedInAgent(app, manager);
    const patched = await agent
      .patch(`/api/v1/organizations/${org.id}/members/${membership.id}`)
      .send({ role: 'technician' });
    expect(patched.status).toBe(200);
    expect(patched.body.data.role).toBe('technician');
    const removed = await agent.delete(`/api/v1/organizations/${org.id}/members/${membership.id}`);
    expect(removed.status).toBe(204);
    expect(await Membership.findByPk(membership.id)).toBeNull();
    expect(await countRows('audit_events')).toBe(2);
  });

  it('members — bad role — 400 naming the field; a dealer role on a farm — 422; nothing written', async () => {
    const org = await createOrganization();
    const { user: manager } = await createMember(org, 'manager');
    const { membership } = await createMember(org, 'operator');
    const agent = await signedInAgent(app, manager);
    const bad = await agent
      .patch(`/api/v1/organizations/${org.id}/members/${membership.id}`)
      .send({ role: 'boss' });
    expect(bad.status).toBe(400);
    expect(bad.body.error.fields.role).toMatch(/Role must be one of/);
    const dealerRole = await agent
      .post(`/api/v1/organizations/${org.id}/invitations`)
      .send({ email: 'x@test.example', name: 'X', role: 'advisor' });
    expect(dealerRole.status).toBe(422);
    expect(dealerRole.body.error.fields.role).toMatch(/manager, technician, operator/);
    const badMail = await agent
      .post(`/api/v1/organizations/${org.id}/invitations`)
      .send({ email: 'nope', name: '', role: 'operator' });
    expect(badMail.status).toBe(400);
    expect(Object.keys(badMail.body.error.fields).sort()).toEqual(['email', 'name']);
    expect(await countRows('invitations')).toBe(0);
    expect((await Membership.findByPk(membership.id))!.role).toBe('operator');
  });

  it("members — another organization's members, reads and writes — 404 and nothing changes", async () => {
    const mine = await createOrganization();
    const theirs = await createOrganization();
    const { user: manager } = await createMember(mine, 'manager');
    const { membership: foreign } = await createMember(theirs, 'operator');
    const agent = await signedInAgent(app, manager);
    expect((await agent.get(`/api/v1/organizations/${theirs.id}/members`)).status).toBe(404);
    expect(
      (
        await agent
          .patch(`/api/v1/organizations/${theirs.id}/members/${foreign.id}`)
          .send({ role: 'manager' })
      ).status,
    ).toBe(404);
    expect(
      (
        await agent
          .patch(`/api/v1/organizations/${mine.id}/members/${foreign.id}`)
          .send({ role: 'manager' })
      ).status,
    ).toBe(404);
    expect(
      (await agent.delete(`/api/v1/organizations/${mine.id}/members/${foreign.id}`)).status,
    ).toBe(404);
    expect(
      (
        await agent
          .post(`/api/v1/organizations/${theirs.id}/invitations`)
          .send({ email: 'a@test.example', name: 'A', role: 'operator' })
      ).status,
    ).toBe(404);
    expect((await agent.get(`/api/v1/organizations/not-a-uuid/members`)).status).toBe(404);
    expect((await Membership.findByPk(foreign.id))!.role).toBe('operator');
    expect(await countRows('invitations')).toBe(0);
  });

  it('members — a person in two organizations sees both in /me and acts by the role of each', async () => {
    const a = await createOrganization({ name: 'A Farm' });
    const b = await createOrganization({ name: 'B Farm' });
    const { user } = await createMember(a, 'manager');
    await Membership.create({ organizationId: b.id, userId: user.id, role: 'operator' });
    const agent = await signedInAgent(app, user);
    const me = await agent.get('/api/v1/me');
    expect(
      me.body.data.memberships.map((m: { organization: { name: string }; role: string }) => [
        m.organization.name,
        m.role,
      ]),
    ).toEqual([
      ['A Farm', 'manager'],
      ['B Farm', 'operator'],
    ]);
    expect((await agent.get(`/api/v1/organizations/${a.id}/invitations`)).status).toBe(200);
    expect((await agent.get(`/api/v1/organizations/${b.id}/invitations`)).status).toBe(403);
  });
});
