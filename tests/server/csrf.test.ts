import { beforeEach, describe, expect, it } from 'vitest';
import request from 'supertest';
import { createApp } from '../../server/app';
import { countRows, resetDatabase } from '../support/db';
import {
  createMachine,
  createMember,
  createOrganization,
  signedInAgent,
  TEST_PASSWORD,
} from '../support/factories';

const app = createApp();
const APP_ORIGIN = new URL(process.env.APP_URL ?? 'http://127.0.0.1:4310').origin;

async function managerAgent() {
  const org = await createOrganization();
  const { user } = await createMember(org, 'manager');
  return { org, user, agent: await signedInAgent(app, user) };
}

const machineBody = { fleetNumber: 'T-9', name: 'Yard tractor', category: 'tractor' };

describe('cross-site writes — Origin and Sec-Fetch-Site', () => {
  beforeEach(resetDatabase);

  it('POST from another site (Origin elsewhere) — 403 with a plain message, nothing written', async () => {
    const { org, agent } = await managerAgent();
    const res = await agent
      .post(`/api/v1/organizations/${org.id}/machines`)
      .set('Origin', 'https://evil.example')
      .send(machineBody);
    expect(res.status).toBe(403);
    expect(res.body.error).toEqual({
      code: 'cross_site',
      message: expect.stringMatching(/came from another site/),
    });
    expect(await countRows('machines')).toBe(0);
  });

  it('PATCH and DELETE with Sec-Fetch-Site: cross-site and no Origin — 403; the machine is unchanged', async () => {
    const { org, agent } = await managerAgent();
    const machine = await createMachine(org, { name: 'Kept name' });
    const url = `/api/v1/organizations/${org.id}/machines/${machine.id}`;
    const patch = await agent.patch(url).set('Sec-Fetch-Site', 'cross-site').send({ name: 'X' });
    const del = await agent.delete(url).set('Sec-Fetch-Site', 'cross-site');
    expect([patch.status, del.status]).toEqual([403, 403]);
    await machine.reload();
    expect(machine.name).toBe('Kept name');
  });

  it('sign-in from another site (login CSRF) and Origin "null" — 403, no cookie set', async () => {
    const org = await createOrganization();
    const { user } = await createMember(org, 'operator');
    for (const origin of ['https://evil.example', 'null']) {
      const res = await request(app)
        .post('/api/v1/auth/sign-in')
        .set('Origin', origin)
        .send({ email: user.email, password: TEST_PASSWORD });
      expect(res.status).toBe(403);
      expect(res.headers['set-cookie']).toBeUndefined();
    }
  });

  it('same origin — APP_URL, the request’s own host, or Sec-Fetch-Site same-origin — goes through (201)', async () => {
    const { org, agent } = await managerAgent();
    const url = `/api/v1/organizations/${org.id}/machines`;
    const fromApp = await agent
      .post(url)
      .set('Origin', APP_ORIGIN)
      .set('Sec-Fetch-Site', 'same-origin')
      .send({ ...machineBody, fleetNumber: 'T-1' });
    const fromOwnHost = await agent
      .post(url)
      .set('Host', 'farm-office.test:8080')
      .set('Origin', 'http://farm-office.test:8080')
      .send({ ...machineBody, fleetNumber: 'T-2' });
    const fetchSiteOnly = await agent
      .post(url)
      .set('Sec-Fetch-Site', 'same-origin')
      .send({ ...machineBody, fleetNumber: 'T-3' });
    expect([fromApp.status, fromOwnHost.status, fetchSiteOnly.status]).toEqual([201, 201, 201]);
  });

  it('no Origin and no Sec-Fetch-Site (a script, not a browser) — allowed; GET from anywhere — allowed', async () => {
    const { org, agent } = await managerAgent();
    const post = await agent.post(`/api/v1/organizations/${org.id}/machines`).send(machineBody);
    expect(post.status).toBe(201);
    const read = await agent
      .get(`/api/v1/organizations/${org.id}/machines`)
      .set('Origin', 'https://evil.example')
      .set('Sec-Fetch-Site', 'cross-site');
    expect(read.status).toBe(200);
  });
});

describe('bodies — JSON only (415), multipart only where a file is taken', () => {
  beforeEach(resetDatabase);

  it('form-encoded and text/plain bodies on a JSON route — 415 naming the type, nothing written', async () => {
    const { org, agent } = await managerAgent();
    const url = `/api/v1/organizations/${org.id}/machines`;
    const form = await agent.post(url).type('form').send(machineBody);
    const text = await agent
      .post(url)
      .set('Content-Type', 'text/plain')
      .send(JSON.stringify(machineBody));
    for (const res of [form, text]) {
      expect(res.status).toBe(415);
      expect(res.body.error.code).toBe('unsupported_media_type');
      expect(res.body.error.message).toMatch(/Content-Type: application\/json/);
    }
    expect(text.body.error.message).toMatch(/text\/plain/);
    expect(await countRows('machines')).toBe(0);
  });

  it('text/plain sign-in (what a cross-site form can send) — 415', async () => {
    const res = await request(app)
      .post('/api/v1/auth/sign-in')
      .set('Content-Type', 'text/plain')
      .send('{"email":"a@test.example","password":"x"}');
    expect(res.status).toBe(415);
  });

  it('multipart on a JSON route — 415; on the photo upload route it reaches the upload (not 415)', async () => {
    const { org, agent } = await managerAgent();
    const machine = await createMachine(org);
    const json = await agent
      .post(`/api/v1/organizations/${org.id}/machines`)
      .field('fleetNumber', 'T-5')
      .field('name', 'Tractor');
    expect(json.status).toBe(415);
    const upload = await agent
      .put(`/api/v1/organizations/${org.id}/machines/${machine.id}/photo`)
      .attach('photo', Buffer.from('not really an image'), 'photo.jpg');
    expect(upload.status).not.toBe(415);
    expect(upload.status).toBeLessThan(500);
  });

  it('POST without a body (sign-out) needs no content type — 204', async () => {
    const { agent } = await managerAgent();
    expect((await agent.post('/api/v1/auth/sign-out')).status).toBe(204);
  });
});
