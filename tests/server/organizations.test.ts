import { beforeEach, describe, expect, it } from 'vitest';
import request from 'supertest';
import { QueryTypes } from 'sequelize';
import { sequelize } from '../../server/db';
import { Organization } from '../../server/models';
import { listObjectKeys, putObject } from '../../server/infra/storage';
import { countRows, resetDatabase } from '../support/db';
import { createMember, createOrganization, createUser, signedInAgent } from '../support/factories';
import { clearMail, deliveredMail } from '../support/mail';
import { app, farmWithFleet, linkDealer } from './dealer-fixture';

const FARM = {
  kind: 'farm',
  name: 'Quillback Acres',
  timeZone: 'Europe/Dublin',
  units: 'metric',
  currency: 'eur',
  labourRateMinor: 5500,
  seasonMonths: [9, 3, 4],
};
const api = (orgId: string) => `/api/v1/organizations/${orgId}`;

/** Rows of every table that carries organization_id, for one organization. */
async function tenantRows(organizationId: string): Promise<Record<string, number>> {
  const tables = await sequelize.query<{ table_name: string }>(
    `SELECT table_name FROM information_schema.columns
     WHERE table_schema = 'public' AND column_name = 'organization_id' ORDER BY table_name`,
    { type: QueryTypes.SELECT },
  );
  const out: Record<string, number> = {};
  for (const { table_name: t } of tables) {
    const [row] = await sequelize.query<{ n: number }>(
      `SELECT count(*)::int AS n FROM "${t}" WHERE organization_id = :organizationId`,
      { replacements: { organizationId }, type: QueryTypes.SELECT },
    );
    out[t] = row.n;
  }
  return out;
}

async function storedKeys(organizationId: string) {
  const keys: string[] = [];
  for await (const key of listObjectKeys(`org/${organizationId}/`)) keys.push(key);
  return keys.sort();
}

describe('organizations — create', () => {
  beforeEach(async () => {
    await resetDatabase();
  });

  it('create — without sign-in — 401, nothing written', async () => {
    const res = await request(app).post('/api/v1/organizations').send(FARM);
    expect(res.status).toBe(401);
    expect(await countRows('organizations')).toBe(0);
  });

  it('create — a farm, then a dealer — 201 with the settings; the creator runs both and /me lists both', async () => {
    const agent = await signedInAgent(app, await createUser());
    const farm = await agent.post('/api/v1/organizations').send(FARM);
    expect(farm.status).toBe(201);
    expect(farm.body).toEqual({
      data: {
        id: expect.any(String),
        kind: 'farm',
        name: 'Quillback Acres',
        timeZone: 'Europe/Dublin',
        currency: 'EUR',
        units: 'metric',
        labourRateMinor: 5500,
        seasonMonths: [3, 4, 9],
        digestHour: 6,
      },
      abilities: { update: true, delete: true, export: true },
    });
    const dealer = await agent.post('/api/v1/organizations').send({
      kind: 'dealer',
      name: 'Fenwright Implements',
      timeZone: 'America/Chicago',
      currency: 'USD',
    });
    expect(dealer.status).toBe(201);
    expect(dealer.body.data).toMatchObject({ kind: 'dealer', currency: 'USD', units: 'metric' });
    expect(dealer.body.abilities).toEqual({ update: true, delete: true, export: false });

    const me = await agent.get('/api/v1/me');
    const roles = me.body.data.memberships.map(
      (m: { role: string; organization: { name: string } }) => [m.organization.name, m.role],
    );
    expect(roles).toEqual([
      ['Fenwright Implements', 'advisor'],
      ['Quillback Acres', 'manager'],
    ]);
  });

  it('create — bad input — 400 naming each field and its rule, nothing written', async () => {
    const agent = await signedInAgent(app, await createUser());
    const res = await agent.post('/api/v1/organizations').send({
      kind: 'farm',
      name: ' ',
      timeZone: 'Mars/Olympus',
      currency: 'EURO',
      units: 'cubits',
      labourRateMinor: 12.5,
      seasonMonths: [4, 4, 13],
    });
    expect(res.status).toBe(400);
    expect(res.body.error.fields).toMatchObject({
      name: 'Enter a name',
      timeZone: expect.stringMatching(/IANA name/),
      currency: expect.stringMatching(/ISO 4217|at most 3/),
      units: 'Units must be one of: metric, imperial',
      labourRateMinor: expect.stringMatching(/whole number/),
      'seasonMonths.2': 'Month must be at most 12',
    });
    const noKind = await agent.post('/api/v1/organizations').send({ name: 'Kindless' });
    expect(noKind.body.error.fields).toEqual({ kind: 'Kind must be one of: farm, dealer' });
    const dealerRate = await agent
      .post('/api/v1/organizations')
      .send({ kind: 'dealer', name: 'D', timeZone: 'UTC', currency: 'USD', labourRateMinor: 1 });
    expect(dealerRate.status).toBe(400);
    expect(dealerRate.body.error.fields).toEqual({
      labourRateMinor: 'Not a field of this request',
    });
    expect(await countRows('organizations')).toBe(0);
    expect(await countRows('memberships')).toBe(0);
  });
});

describe('organizations — settings', () => {
  beforeEach(async () => {
    await resetDatabase();
  });

  it('get — any member 200 with abilities by role; another organization 404; a linked dealer 404', async () => {
    const { org, manager, op } = await farmWithFleet('Settings Farm');
    const other = await createOrganization();
    const asOperator = await signedInAgent(app, op);
    const mine = await asOperator.get(api(org.id));
    expect(mine.status).toBe(200);
    expect(mine.body.abilities).toEqual({ update: false, delete: false, export: false });
    expect((await asOperator.get(api(other.id))).status).toBe(404);
    expect((await (await signedInAgent(app, manager)).get(api(org.id))).body.abilities).toEqual({
      update: true,
      delete: true,
      export: true,
    });
    const dealer = await createOrganization({ kind: 'dealer', name: 'Linked Dealer' });
    const { user: advisor } = await createMember(dealer, 'advisor');
    await linkDealer(dealer, org, 'service');
    expect((await (await signedInAgent(app, advisor)).get(api(org.id))).status).toBe(404);
  });

  it('patch — manager — 200 changing only the fields sent', async () => {
    const { org, manager } = await farmWithFleet('Patch Farm');
    await org.update({ currency: 'GBP', labourRateMinor: 4000, seasonMonths: [5, 6] });
    const res = await (
      await signedInAgent(app, manager)
    )
      .patch(api(org.id))
      .send({ digestHour: 5, name: 'Patch Farm North' });
    expect(res.status).toBe(200);
    expect(res.body.data).toMatchObject({
      name: 'Patch Farm North',
      digestHour: 5,
      currency: 'GBP',
      labourRateMinor: 4000,
      seasonMonths: [5, 6],
      timeZone: 'America/Chicago',
    });
    await org.reload();
    expect([org.name, org.digestHour, org.currency]).toEqual(['Patch Farm North', 5, 'GBP']);
  });

  it('patch — technician 403, another organization 404, bad input 400; nothing changes', async () => {
    const { org, manager, tech } = await farmWithFleet('Guarded Farm');
    const other = await createOrganization({ name: 'Not Yours' });
    const asTech = await signedInAgent(app, tech);
    expect((await asTech.patch(api(org.id)).send({ name: 'Mine now' })).status).toBe(403);
    const asManager = await signedInAgent(app, manager);
    expect((await asManager.patch(api(other.id)).send({ name: 'Mine now' })).status).toBe(404);
    const bad = await asManager.patch(api(org.id)).send({ digestHour: 24, colour: 'red' });
    expect(bad.status).toBe(400);
    expect(bad.body.error.fields).toEqual({
      digestHour: 'Digest hour must be at most 23',
      colour: 'Not a field of this request',
    });
    await Promise.all([org.reload(), other.reload()]);
    expect([org.name, org.digestHour, other.name]).toEqual(['Guarded Farm', 6, 'Not Yours']);
  });

  it("patch — a dealer's advisor sending a farm's setting — 422 naming it, nothing changes", async () => {
    const dealer = await createOrganization({ kind: 'dealer', name: 'Parts Counter' });
    const { user } = await createMember(dealer, 'advisor');
    const res = await (
      await signedInAgent(app, user)
    )
      .patch(api(dealer.id))
      .send({ name: 'Parts Counter East', labourRateMinor: 100 });
    expect(res.status).toBe(422);
    expect(res.body.error.fields).toEqual({
      labourRateMinor: 'Only a farm has this setting, not a dealer',
    });
    await dealer.reload();
    expect(dealer.name).toBe('Parts Counter');
    // units are a dealer's too: they pick its parts forecast's stock units
    const units = await (
      await signedInAgent(app, user)
    )
      .patch(api(dealer.id))
      .send({ units: 'imperial' });
    expect(units.status).toBe(200);
    await dealer.reload();
    expect(dealer.units).toBe('imperial');
  });
});

describe('organizations — delete', () => {
  beforeEach(async () => {
    await resetDatabase();
    await clearMail();
  });

  it('delete — manager with the name typed — 204; its rows and files are gone, the other farm keeps all of its own, linked dealers are told', async () => {
    const gone = await farmWithFleet('Hollowmere Farm', 'H-01');
    const kept = await farmWithFleet('Stayput Farm', 'S-01');
    for (const w of [gone, kept]) {
      await putObject(
        `org/${w.org.id}/machines/${w.machine.id}/a.webp`,
        Buffer.from('x'),
        'image/webp',
      );
      await putObject(
        `org/${w.org.id}/walkarounds/${w.machine.id}/b.webp`,
        Buffer.from('y'),
        'image/webp',
      );
    }
    const dealer = await createOrganization({ kind: 'dealer', name: 'Brackenford Dealer' });
    const { user: advisor } = await createMember(dealer, 'advisor', {
      email: 'advisor@brackenford.example',
    });
    await linkDealer(dealer, gone.org, 'view');
    await linkDealer(dealer, kept.org, 'service');
    const keptBefore = await tenantRows(kept.org.id);
    expect(keptBefore.machines).toBe(1);

    const res = await (
      await signedInAgent(app, gone.manager)
    )
      .delete(api(gone.org.id))
      .send({ confirmName: 'Hollowmere Farm' });
    expect(res.status).toBe(204);

    expect(await Organization.findByPk(gone.org.id)).toBeNull();
    const leftovers = Object.entries(await tenantRows(gone.org.id)).filter(([, n]) => n > 0);
    expect(leftovers).toEqual([]);
    expect(await storedKeys(gone.org.id)).toEqual([]);
    expect(await tenantRows(kept.org.id)).toEqual(keptBefore);
    expect(await storedKeys(kept.org.id)).toHaveLength(2);
    // the people keep their accounts, without the farm
    const me = await (await signedInAgent(app, gone.manager)).get('/api/v1/me');
    expect(me.body.data.memberships).toEqual([]);

    const told = (await deliveredMail()).filter((m) => m.to.includes(advisor.email));
    expect(told.map((m) => m.subject)).toEqual(['Hollowmere Farm has left Hourstone']);
  });

  it('delete — the name mistyped — 422 naming confirmName; technician 403; other farm 404; nothing deleted', async () => {
    const { org, manager, tech } = await farmWithFleet('Careful Farm');
    const other = await createOrganization({ name: 'Elsewhere Farm' });
    const asManager = await signedInAgent(app, manager);
    const wrong = await asManager.delete(api(org.id)).send({ confirmName: 'careful farm' });
    expect(wrong.status).toBe(422);
    expect(wrong.body.error.fields.confirmName).toMatch(/exactly as it is written: Careful Farm/);
    const missing = await asManager.delete(api(org.id)).send({});
    expect(missing.status).toBe(400);
    expect(missing.body.error.fields.confirmName).toMatch(/Type the organization's name/);
    const asTech = await signedInAgent(app, tech);
    expect((await asTech.delete(api(org.id)).send({ confirmName: 'Careful Farm' })).status).toBe(
      403,
    );
    const foreign = await asManager.delete(api(other.id)).send({ confirmName: 'Elsewhere Farm' });
    expect(foreign.status).toBe(404);
    expect(await Organization.count()).toBe(2);
    expect((await tenantRows(org.id)).machines).toBe(1);
  });
});
