// Organization API keys (issue 13): made, listed and revoked by a manager only; the secret shown
// once and stored as a hash; a key reaches the machine-data routes and nothing else, cannot read,
// cannot write another organization's machines, is refused from the moment it is revoked, and is
// held to its quota per minute with a 429 and Retry-After.
import { beforeEach, describe, expect, it } from 'vitest';
import request from 'supertest';
import { createHash } from 'node:crypto';
import { createApp } from '../../server/app';
import { sequelize } from '../../server/db';
import { buildOpenApiDocument } from '../../server/openapi';
import { API_KEY_REQUESTS_PER_MINUTE } from '../../server/middlewares/api-key-auth';
import { AuditEvent } from '../../server/models';
import { ApiKey } from '../../server/models/api-key';
import { countRows, resetDatabase } from '../support/db';
import {
  createMachine,
  createMember,
  createOrganization,
  signedInAgent,
} from '../support/factories';

const app = createApp();
const SNAPSHOT = '/api/v1/telematics/iso15143-3';
const hourAgo = () => new Date(Date.now() - 3_600_000).toISOString();

async function farmWithKey() {
  const org = await createOrganization({ timeZone: 'America/Chicago' });
  const { user: manager } = await createMember(org, 'manager');
  const agent = await signedInAgent(app, manager);
  const machine = await createMachine(org, { fleetNumber: 'T-02' });
  await machine.update({ serialNumber: 'TMS-RC-0001' });
  const made = await agent
    .post(`/api/v1/organizations/${org.id}/api-keys`)
    .send({ name: 'Yard feed' });
  expect(made.status).toBe(201);
  return {
    org,
    manager,
    agent,
    machine,
    key: made.body.data.secret as string,
    made: made.body.data,
  };
}

const snapshot = (serial: string, hour: number, at = hourAgo()) => ({
  Fleet: {
    version: '1',
    Equipment: [
      {
        EquipmentHeader: { OEMName: 'Tamsin', Model: 'RC 210', SerialNumber: serial },
        CumulativeOperatingHours: { datetime: at, Hour: hour },
      },
    ],
  },
});

const post = (key: string, body: object) =>
  request(app).post(SNAPSHOT).set('Authorization', `Bearer ${key}`).send(body);

describe('API keys — made, listed and revoked by the manager', () => {
  beforeEach(resetDatabase);

  it('create — 201 with the secret once (hs_<prefix>_…), stored as its SHA-256 only; audited', async () => {
    const { org, agent, key, made } = await farmWithKey();
    expect(key).toMatch(/^hs_[a-z0-9]{8}_[A-Za-z0-9_-]{43}$/);
    expect(made).toMatchObject({ name: 'Yard feed', scopes: ['readings:write'], lastUsedAt: null });
    expect(key.startsWith(`hs_${made.prefix}_`)).toBe(true);
    const row = await ApiKey.findByPk(made.id);
    const secret = key.split('_').slice(2).join('_');
    expect(row!.secretHash.equals(createHash('sha256').update(secret).digest())).toBe(true);
    expect(JSON.stringify(row!.toJSON())).not.toContain(secret);
    const list = await agent.get(`/api/v1/organizations/${org.id}/api-keys`);
    expect(list.status).toBe(200);
    expect(list.body.data).toHaveLength(1);
    expect(list.body.data[0]).not.toHaveProperty('secret');
    expect(list.text).not.toContain(secret);
    const audit = await AuditEvent.findOne({ where: { action: 'api_key.create' } });
    expect(audit?.entityId).toBe(made.id);
  });

  it('bad input — 400 naming the field; an unknown scope is refused; nothing written', async () => {
    const { org, agent } = await farmWithKey();
    const before = await countRows('api_keys');
    const url = `/api/v1/organizations/${org.id}/api-keys`;
    const noName = await agent.post(url).send({ name: '' });
    expect(noName.status).toBe(400);
    expect(noName.body.error.fields.name).toMatch(/Name the key/);
    const scope = await agent.post(url).send({ name: 'x', scopes: ['readings:read'] });
    expect(scope.status).toBe(400);
    expect(scope.body.error.fields['scopes.0']).toMatch(/readings:write/);
    expect(await countRows('api_keys')).toBe(before);
  });

  it.each(['technician', 'operator'] as const)(
    '%s — 403 on list, create and revoke',
    async (role) => {
      const { org, made } = await farmWithKey();
      const { user } = await createMember(org, role);
      const agent = await signedInAgent(app, user);
      const url = `/api/v1/organizations/${org.id}/api-keys`;
      expect((await agent.get(url)).status).toBe(403);
      expect((await agent.post(url).send({ name: 'mine' })).status).toBe(403);
      expect((await agent.delete(`${url}/${made.id}`)).status).toBe(403);
    },
  );

  it("another farm's manager — 404 on the farm's keys; its own revoke of this key's id is 404", async () => {
    const { org, made } = await farmWithKey();
    const other = await createOrganization();
    const { user } = await createMember(other, 'manager');
    const agent = await signedInAgent(app, user);
    expect((await agent.get(`/api/v1/organizations/${org.id}/api-keys`)).status).toBe(404);
    expect(
      (await agent.delete(`/api/v1/organizations/${other.id}/api-keys/${made.id}`)).status,
    ).toBe(404);
    expect((await ApiKey.findByPk(made.id))!.revokedAt).toBeNull();
  });

  it('revoke — the very next request with the key is 401; the key stays listed as revoked; audited', async () => {
    const { org, agent, key, made } = await farmWithKey();
    expect((await post(key, snapshot('TMS-RC-0001', 100))).status).toBe(200);
    expect((await agent.delete(`/api/v1/organizations/${org.id}/api-keys/${made.id}`)).status).toBe(
      204,
    );
    const refused = await post(key, snapshot('TMS-RC-0001', 101));
    expect(refused.status).toBe(401);
    expect(refused.body.error.message).toMatch(/revoked/);
    const list = await agent.get(`/api/v1/organizations/${org.id}/api-keys`);
    expect(list.body.data[0].revokedAt).not.toBeNull();
    expect(list.body.data[0].lastUsedAt).not.toBeNull();
    expect(await AuditEvent.count({ where: { action: 'api_key.revoke', entityId: made.id } })).toBe(
      1,
    );
  });
});

describe('API keys — what a key may do', () => {
  beforeEach(resetDatabase);

  it('every documented route other than the telematics ones — 401 with a key and no session', async () => {
    const { org, machine, key } = await farmWithKey();
    const paths = buildOpenApiDocument().paths as Record<string, Record<string, unknown>>;
    const fill = (p: string) =>
      p
        .replace('{orgId}', org.id)
        .replace('{machineId}', machine.id)
        .replace(/\{[^}]+\}/g, '00000000-0000-4000-8000-000000000000');
    const answers: string[] = [];
    let tried = 0;
    for (const [path, ops] of Object.entries(paths)) {
      if (path.startsWith('/telematics/')) continue;
      for (const method of Object.keys(ops) as ('get' | 'post' | 'patch' | 'put' | 'delete')[]) {
        const res = await request(app)
          [method](`/api/v1${fill(path)}`)
          .set('Authorization', `Bearer ${key}`)
          .send({});
        tried++;
        // a public route answers as it does to anyone; a signed-in one must refuse the key
        const isPublic = !(ops[method] as { security?: unknown }).security;
        if (!isPublic && res.status !== 401 && res.status !== 403)
          answers.push(`${method.toUpperCase()} ${path}: ${res.status}`);
        if (isPublic && res.status < 300 && method !== 'get' && method !== 'post')
          answers.push(`${method.toUpperCase()} ${path}: ${res.status}`);
      }
    }
    expect(tried).toBeGreaterThan(100);
    expect(answers).toEqual([]);
  });

  it('a session cookie on a telematics route — 401: only a key is taken', async () => {
    const { agent } = await farmWithKey();
    const res = await agent.post(SNAPSHOT).send(snapshot('TMS-RC-0001', 100));
    expect(res.status).toBe(401);
    expect(await countRows('meter_readings')).toBe(0);
  });

  it("another organization's machine — unknown to the key (the snapshot), 404 by id (the log)", async () => {
    const { key } = await farmWithKey();
    const other = await createOrganization();
    const theirs = await createMachine(other, { fleetNumber: 'X-01' });
    await theirs.update({ serialNumber: 'OTHER-1', telematicsId: 'their-feed-1' });
    const res = await post(key, snapshot('OTHER-1', 100));
    expect(res.status).toBe(200);
    expect(res.body.data.items[0]).toMatchObject({ status: 'unknown_equipment', machineId: null });
    for (const ref of [theirs.id, 'their-feed-1']) {
      const log = await request(app)
        .post(`/api/v1/telematics/machines/${ref}/j1939`)
        .set('Authorization', `Bearer ${key}`)
        .set('Content-Type', 'text/plain')
        .send('(1764662400.0) can0 18FEE500#7260000000000000');
      expect(log.status).toBe(404);
    }
    expect(await countRows('meter_readings')).toBe(0);
  });

  it('a wrong secret with a real prefix, or no key — 401 and the key is not marked used', async () => {
    const { key, made } = await farmWithKey();
    const wrong = `${key.slice(0, 12)}${'A'.repeat(43)}`;
    expect((await post(wrong, snapshot('TMS-RC-0001', 1))).status).toBe(401);
    expect((await request(app).post(SNAPSHOT).send(snapshot('TMS-RC-0001', 1))).status).toBe(401);
    expect((await ApiKey.findByPk(made.id))!.lastUsedAt).toBeNull();
  });

  it(`rate limit — past ${API_KEY_REQUESTS_PER_MINUTE} requests in the minute: 429 with Retry-After, nothing written`, async () => {
    const { key, made } = await farmWithKey();
    // the quota as spent, in the shared store (as another API process would have spent it)
    await sequelize.query(
      `INSERT INTO rate_limit_hits (key, hits, reset_at) VALUES (:key, :hits, now() + interval '40 seconds')`,
      { replacements: { key: `apikey:${made.id}`, hits: API_KEY_REQUESTS_PER_MINUTE } },
    );
    const res = await post(key, snapshot('TMS-RC-0001', 100));
    expect(res.status).toBe(429);
    expect(Number(res.headers['retry-after'])).toBeGreaterThan(0);
    expect(Number(res.headers['retry-after'])).toBeLessThanOrEqual(60);
    expect(res.body.error.code).toBe('throttled');
    expect(await countRows('meter_readings')).toBe(0);
  });

  it('cross-site check — a key without a session passes with a foreign Origin; with the session cookie it is refused', async () => {
    const { key, agent } = await farmWithKey();
    const fromElsewhere = await request(app)
      .post(SNAPSHOT)
      .set('Origin', 'https://elsewhere.example')
      .set('Authorization', `Bearer ${key}`)
      .send(snapshot('TMS-RC-0001', 100));
    expect(fromElsewhere.status).toBe(200);
    const withSession = await agent
      .post(SNAPSHOT)
      .set('Origin', 'https://elsewhere.example')
      .set('Authorization', `Bearer ${key}`)
      .send(snapshot('TMS-RC-0001', 101));
    expect(withSession.status).toBe(403);
    expect(withSession.body.error.code).toBe('cross_site');
  });
});
