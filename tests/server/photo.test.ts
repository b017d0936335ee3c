import { beforeEach, describe, expect, it } from 'vitest';
import request from 'supertest';
import sharp from 'sharp';
import { createApp } from '../../server/app';
import { resetDatabase } from '../support/db';
import {
  createMachine,
  createMember,
  createOrganization,
  signedInAgent,
} from '../support/factories';
import { Machine } from '../../server/models';

const app = createApp();
const png = () =>
  sharp({ create: { width: 800, height: 600, channels: 3, background: { r: 90, g: 120, b: 60 } } })
    .png()
    .toBuffer();

describe('machine photos (object store)', () => {
  beforeEach(resetDatabase);

  it('photo — a manager uploads a PNG; it is stored as WebP with a thumbnail and served only through the API', async () => {
    const org = await createOrganization();
    const { user } = await createMember(org, 'manager');
    const machine = await createMachine(org);
    const agent = await signedInAgent(app, user);
    const url = `/api/v1/organizations/${org.id}/machines/${machine.id}/photo`;
    const up = await agent.put(url).attach('photo', await png(), 'tractor.png');
    expect(up.status).toBe(200);
    expect((await Machine.findByPk(machine.id))!.photoKey).toMatch(
      new RegExp(`^org/${org.id}/machines/${machine.id}/`),
    );
    const full = await agent
      .get(url)
      .buffer(true)
      .parse((res, cb) => {
        const chunks: Buffer[] = [];
        res.on('data', (c: Buffer) => chunks.push(c));
        res.on('end', () => cb(null, Buffer.concat(chunks)));
      });
    expect(full.status).toBe(200);
    expect(full.headers['content-type']).toBe('image/webp');
    const meta = await sharp(full.body as Buffer).metadata();
    expect([meta.format, meta.width, meta.height]).toEqual(['webp', 800, 600]);
    const thumb = await agent
      .get(`${url}?size=thumb`)
      .buffer(true)
      .parse((res, cb) => {
        const chunks: Buffer[] = [];
        res.on('data', (c: Buffer) => chunks.push(c));
        res.on('end', () => cb(null, Buffer.concat(chunks)));
      });
    expect((await sharp(thumb.body as Buffer).metadata()).width).toBe(320);
    const detail = await agent.get(`/api/v1/organizations/${org.id}/machines/${machine.id}`);
    expect(detail.body.data.thumbnailUrl).toContain('size=thumb');
    expect((await request(app).get(url)).status).toBe(401);
  });

  it('photo — the type is checked by content: a text file named .jpg is refused (422 on photo); nothing stored', async () => {
    const org = await createOrganization();
    const { user } = await createMember(org, 'manager');
    const machine = await createMachine(org);
    const agent = await signedInAgent(app, user);
    const res = await agent
      .put(`/api/v1/organizations/${org.id}/machines/${machine.id}/photo`)
      .attach('photo', Buffer.from('definitely not a picture'), {
        filename: 'photo.jpg',
        contentType: 'image/jpeg',
      });
    expect(res.status).toBe(422);
    expect(res.body.error.fields.photo).toMatch(/not an image/);
    expect((await Machine.findByPk(machine.id))!.photoKey).toBeNull();
  });

  it('photo — over 10 MB is refused with 413 naming the field', async () => {
    const org = await createOrganization();
    const { user } = await createMember(org, 'manager');
    const machine = await createMachine(org);
    const agent = await signedInAgent(app, user);
    const res = await agent
      .put(`/api/v1/organizations/${org.id}/machines/${machine.id}/photo`)
      .attach('photo', Buffer.alloc(11 * 1024 * 1024), 'big.png');
    expect(res.status).toBe(413);
    expect(res.body.error.fields.photo).toMatch(/larger than 10 MB/);
  });

  it("photo — another farm's machine answers 404 (upload and download); an operator may not upload (403)", async () => {
    const org = await createOrganization();
    const other = await createOrganization();
    const { user: manager } = await createMember(org, 'manager');
    const { user: op } = await createMember(org, 'operator');
    const { user: stranger } = await createMember(other, 'manager');
    const machine = await createMachine(org);
    const url = `/api/v1/organizations/${org.id}/machines/${machine.id}/photo`;
    const managerAgent = await signedInAgent(app, manager);
    expect((await managerAgent.put(url).attach('photo', await png(), 'a.png')).status).toBe(200);
    const strangerAgent = await signedInAgent(app, stranger);
    expect((await strangerAgent.get(url)).status).toBe(404);
    expect((await strangerAgent.put(url).attach('photo', await png(), 'a.png')).status).toBe(404);
    const opAgent = await signedInAgent(app, op);
    expect((await opAgent.put(url).attach('photo', await png(), 'a.png')).status).toBe(403);
    expect((await opAgent.get(url)).status).toBe(200);
  });
});
