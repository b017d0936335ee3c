import { beforeEach, describe, expect, it } from 'vitest';
import request from 'supertest';
import { DealerLink } from '../../server/models';
import { countRows, resetDatabase } from '../support/db';
import { createMember, createOrganization, signedInAgent } from '../support/factories';
import { clearMail, firstLink, mailTo } from '../support/mail';
import { api, app, farmWithFleet, linkDealer, TZ } from './dealer-fixture';

async function dealerAndFarm() {
  const dealer = await createOrganization({ name: 'Tern Dealer', kind: 'dealer', timeZone: TZ });
  const { user: advisor } = await createMember(dealer, 'advisor', {
    email: 'advisor@tern.example',
  });
  const farm = await farmWithFleet('Hazel Farm');
  return { dealer, advisor, farm, advisorAgent: await signedInAgent(app, advisor) };
}

describe('dealer links — a dealer asks, the farm manager accepts', () => {
  beforeEach(async () => {
    await resetDatabase();
    await clearMail();
  });

  it('customer invitation — e-mails a single-use link; the manager picks the farm and access; the link works once', async () => {
    const w = await dealerAndFarm();
    const res = await w.advisorAgent
      .post(api(w.dealer.id, '/customer-invitations'))
      .send({ email: w.farm.manager.email, message: 'We service your tractors.' });
    expect(res.status).toBe(201);
    expect(res.body.data).toMatchObject({
      status: 'pending',
      customer: null,
      invitedEmail: w.farm.manager.email,
    });
    const mail = await mailTo(w.farm.manager.email);
    expect(mail.subject).toBe('Tern Dealer asks to see your machines on Hourstone');
    expect(mail.text).toContain('We service your tractors.');
    const token = firstLink(mail.text).split('/dealer-invitations/')[1];
    // 32 random bytes in base64url: ⌈32 × 8 / 6⌉ = 43 characters, no padding (derived)
    expect(token).toMatch(/^[A-Za-z0-9_-]{43}$/);
    // not shared until accepted
    expect((await w.advisorAgent.get(api(w.farm.org.id, '/machines'))).status).toBe(404);

    const manager = await signedInAgent(app, w.farm.manager);
    expect((await request(app).get(`/api/v1/dealer-invitations/${token}`)).status).toBe(401);
    const shown = await manager.get(`/api/v1/dealer-invitations/${token}`);
    expect(shown.status).toBe(200);
    expect(shown.body.data).toMatchObject({
      dealer: { id: w.dealer.id, name: 'Tern Dealer' },
      farms: [{ id: w.farm.org.id, name: 'Hazel Farm', linked: false }],
    });
    // a technician of the farm may not accept for it; nothing changes
    const tech = await signedInAgent(app, w.farm.tech);
    const refused = await tech
      .post(`/api/v1/dealer-invitations/${token}/accept`)
      .send({ organizationId: w.farm.org.id, access: 'service' });
    expect(refused.status).toBe(422);
    expect(refused.body.error.fields).toEqual({ organizationId: 'Choose a farm you manage' });
    const bad = await manager
      .post(`/api/v1/dealer-invitations/${token}/accept`)
      .send({ organizationId: w.farm.org.id, access: 'everything' });
    expect(bad.status).toBe(400);
    expect(bad.body.error.fields.access).toBeTruthy();
    expect((await DealerLink.findByPk(res.body.data.id))!.status).toBe('pending');

    const accepted = await manager
      .post(`/api/v1/dealer-invitations/${token}/accept`)
      .send({ organizationId: w.farm.org.id, access: 'service' });
    expect(accepted.status).toBe(200);
    expect(accepted.body.data).toMatchObject({
      dealer: { id: w.dealer.id },
      access: 'service',
      status: 'active',
      initiatedBy: 'dealer',
    });
    expect((await w.advisorAgent.get(api(w.farm.org.id, '/machines'))).status).toBe(200);
    const again = await manager
      .post(`/api/v1/dealer-invitations/${token}/accept`)
      .send({ organizationId: w.farm.org.id, access: 'view' });
    expect(again.status).toBe(404);
    expect((await manager.get(`/api/v1/dealer-invitations/${token}`)).status).toBe(404);

    const customers = await w.advisorAgent.get(api(w.dealer.id, '/customers'));
    expect(customers.status).toBe(200);
    expect(customers.body.data).toEqual([
      expect.objectContaining({
        status: 'active',
        customer: { id: w.farm.org.id, name: 'Hazel Farm' },
        access: 'service',
        machineCount: 1,
      }),
    ]);
  });

  it('customer invitation — 401, 400 with nothing written, 404 from a farm, withdraw while pending', async () => {
    const w = await dealerAndFarm();
    const path = api(w.dealer.id, '/customer-invitations');
    expect((await request(app).post(path).send({ email: 'x@y.example' })).status).toBe(401);
    const bad = await w.advisorAgent.post(path).send({ email: 'not-an-email' });
    expect(bad.status).toBe(400);
    expect(bad.body.error.fields.email).toBeTruthy();
    expect(await countRows('dealer_links')).toBe(0);
    expect(await countRows('notifications')).toBe(0);
    // the farm is not a dealer: its members have no customers page
    const manager = await signedInAgent(app, w.farm.manager);
    expect(
      (
        await manager
          .post(api(w.farm.org.id, '/customer-invitations'))
          .send({ email: 'a@b.example' })
      ).status,
    ).toBe(404);
    expect((await manager.get(api(w.farm.org.id, '/customers'))).status).toBe(404);
    // another dealer's advisor cannot see or withdraw it
    const created = await w.advisorAgent.post(path).send({ email: 'owner@farm.example' });
    const other = await createOrganization({ kind: 'dealer' });
    const { user } = await createMember(other, 'advisor');
    const otherAgent = await signedInAgent(app, user);
    expect(
      (await otherAgent.delete(api(other.id, `/customer-invitations/${created.body.data.id}`)))
        .status,
    ).toBe(404);
    expect((await otherAgent.get(api(w.dealer.id, '/customers'))).status).toBe(404);
    const withdrawn = await w.advisorAgent.delete(
      api(w.dealer.id, `/customer-invitations/${created.body.data.id}`),
    );
    expect(withdrawn.status).toBe(204);
    expect((await w.advisorAgent.get(api(w.dealer.id, '/customers'))).body.data).toEqual([]);
  });
});

describe('dealer links — the farm grants, changes and revokes', () => {
  beforeEach(async () => {
    await resetDatabase();
    await clearMail();
  });

  it('farm dealers — the manager grants access by an advisor e-mail (active at once, advisor told), changes it and revokes it', async () => {
    const w = await dealerAndFarm();
    const manager = await signedInAgent(app, w.farm.manager);
    const granted = await manager
      .post(api(w.farm.org.id, '/dealers'))
      .send({ email: 'ADVISOR@tern.example', access: 'view' });
    expect(granted.status).toBe(201);
    expect(granted.body.data).toMatchObject({
      dealer: { id: w.dealer.id, name: 'Tern Dealer' },
      access: 'view',
      status: 'active',
      initiatedBy: 'farm',
      abilities: { update: true, revoke: true },
    });
    const mail = await mailTo('advisor@tern.example');
    expect(mail.subject).toBe('Hazel Farm linked its machines to Tern Dealer on Hourstone');
    expect((await w.advisorAgent.get(api(w.farm.org.id, '/due'))).status).toBe(200);
    const twice = await manager
      .post(api(w.farm.org.id, '/dealers'))
      .send({ email: 'advisor@tern.example', access: 'service' });
    expect(twice.status).toBe(409);
    const list = await manager.get(api(w.farm.org.id, '/dealers'));
    expect(list.body.data).toHaveLength(1);
    const id = granted.body.data.id;
    const changed = await manager
      .patch(api(w.farm.org.id, `/dealers/${id}`))
      .send({ access: 'service' });
    expect(changed.body.data.access).toBe('service');
    const revoked = await manager.post(api(w.farm.org.id, `/dealers/${id}/revoke`));
    expect(revoked.body.data).toMatchObject({ status: 'revoked', abilities: { update: false } });
    expect((await manager.post(api(w.farm.org.id, `/dealers/${id}/revoke`))).status).toBe(409);
    expect((await w.advisorAgent.get(api(w.farm.org.id, '/due'))).status).toBe(404);
    // linked again after revocation: a new link
    const relinked = await manager
      .post(api(w.farm.org.id, '/dealers'))
      .send({ email: 'advisor@tern.example', access: 'view' });
    expect(relinked.status).toBe(201);
    expect(relinked.body.data.id).not.toBe(id);
  });

  it('farm dealers — 401, 422 unknown advisor with nothing written, 403 for technician and operator, 404 across farms', async () => {
    const w = await dealerAndFarm();
    const path = api(w.farm.org.id, '/dealers');
    expect((await request(app).get(path)).status).toBe(401);
    const manager = await signedInAgent(app, w.farm.manager);
    const unknown = await manager.post(path).send({ email: 'nobody@x.example', access: 'view' });
    expect(unknown.status).toBe(422);
    expect(unknown.body.error.fields).toEqual({
      email: 'No dealer service advisor on Hourstone has this e-mail',
    });
    // a farm manager's e-mail is not a dealer's
    const farmer = await manager.post(path).send({ email: w.farm.tech.email, access: 'view' });
    expect(farmer.status).toBe(422);
    expect(await countRows('dealer_links')).toBe(0);
    for (const user of [w.farm.tech, w.farm.op]) {
      const agent = await signedInAgent(app, user);
      expect((await agent.get(path)).status).toBe(403);
      expect(
        (await agent.post(path).send({ email: 'advisor@tern.example', access: 'view' })).status,
      ).toBe(403);
    }
    const link = await linkDealer(w.dealer, w.farm.org, 'view');
    const other = await farmWithFleet('Other Farm');
    const otherManager = await signedInAgent(app, other.manager);
    expect(
      (
        await otherManager
          .patch(api(other.org.id, `/dealers/${link.id}`))
          .send({ access: 'service' })
      ).status,
    ).toBe(404);
    expect((await otherManager.patch(api(w.farm.org.id, `/dealers/${link.id}`))).status).toBe(404);
    expect((await otherManager.post(api(other.org.id, `/dealers/${link.id}/revoke`))).status).toBe(
      404,
    );
    expect((await DealerLink.findByPk(link.id))!.access).toBe('view');
    // the dealer's advisor cannot manage the farm's links through its own link
    expect((await w.advisorAgent.get(path)).status).toBe(404);
  });
});
