import { beforeEach, describe, expect, it } from 'vitest';
import request from 'supertest';
import sharp from 'sharp';
import { countRows, resetDatabase } from '../support/db';
import { createMember, createOrganization, signedInAgent } from '../support/factories';
import { app, completed, shop } from './service-records-fixture';

const png = () =>
  sharp({ create: { width: 640, height: 480, channels: 3, background: { r: 40, g: 90, b: 30 } } })
    .png()
    .toBuffer();
const pdf = () =>
  Buffer.from(
    '%PDF-1.4\n1 0 obj\n<< /Type /Catalog /Pages 2 0 R >>\nendobj\n2 0 obj\n<< /Type /Pages /Kids [] /Count 0 >>\nendobj\ntrailer\n<< /Root 1 0 R >>\n%%EOF\n',
  );
const binary = (res: request.Response, cb: (err: Error | null, body: Buffer) => void) => {
  const chunks: Buffer[] = [];
  res.on('data', (c: Buffer) => chunks.push(c));
  res.on('end', () => cb(null, Buffer.concat(chunks)));
};

describe('service records — attachments', () => {
  beforeEach(resetDatabase);

  async function withRecord() {
    const s = await shop();
    const res = await s.agent.post(s.records).send(completed());
    const url = `${s.base}/service-records/${res.body.data.id}/attachments`;
    return { ...s, recordId: res.body.data.id as string, url };
  }

  it('attachments — a photo gets a thumbnail; a PDF is kept as is; both served only through the API', async () => {
    const s = await withRecord();
    const photo = await s.agent.post(s.url).attach('file', await png(), 'gauge.png');
    expect(photo.status).toBe(201);
    expect(photo.body.data).toMatchObject({
      kind: 'image',
      contentType: 'image/webp',
      fileName: 'gauge.png',
    });
    const full = await s.agent.get(photo.body.data.url).buffer(true).parse(binary);
    expect(full.headers['content-disposition']).toContain('filename="gauge.webp"');
    const thumb = await s.agent.get(photo.body.data.thumbnailUrl).buffer(true).parse(binary);
    expect(thumb.status).toBe(200);
    expect((await sharp(thumb.body as Buffer).metadata()).width).toBe(320);
    const sheet = await s.agent.post(s.url).attach('file', pdf(), 'pressure test.pdf');
    expect(sheet.status).toBe(201);
    expect(sheet.body.data).toMatchObject({
      kind: 'pdf',
      thumbnailUrl: null,
      fileName: 'pressure test.pdf',
    });
    const got = await s.agent.get(sheet.body.data.url).buffer(true).parse(binary);
    expect(got.status).toBe(200);
    expect(got.headers['content-type']).toBe('application/pdf');
    expect((got.body as Buffer).subarray(0, 5).toString()).toBe('%PDF-');
    const detail = await s.agent.get(`${s.base}/service-records/${s.recordId}`);
    expect(detail.body.data.attachments).toHaveLength(2);
    expect((await request(app).get(sheet.body.data.url)).status).toBe(401);
    // operators who may see the machine may look, not attach
    const opAgent = await signedInAgent(app, s.op);
    expect((await opAgent.get(sheet.body.data.url)).status).toBe(200);
    expect((await opAgent.post(s.url).attach('file', pdf(), 'x.pdf')).status).toBe(403);
    const del = await s.agent.delete(sheet.body.data.url);
    expect(del.status).toBe(204);
    expect((await s.agent.get(sheet.body.data.url)).status).toBe(404);
  });

  it('attachments — the type is checked by content: a text file named .pdf is refused (422 on file); nothing stored', async () => {
    const s = await withRecord();
    const res = await s.agent.post(s.url).attach('file', Buffer.from('an invoice, honestly'), {
      filename: 'invoice.pdf',
      contentType: 'application/pdf',
    });
    expect(res.status).toBe(422);
    expect(res.body.error.fields.file).toMatch(/attach a photo .* or a PDF/);
    const zip = await s.agent
      .post(s.url)
      .attach('file', Buffer.from('504b0304140000000800', 'hex'), 'photo.jpg');
    expect(zip.status).toBe(422);
    expect(await countRows('service_attachments')).toBe(0);
  });

  it('attachments — over 10 MB is refused with 413 naming the field', async () => {
    const s = await withRecord();
    const big = Buffer.concat([pdf(), Buffer.alloc(10 * 1024 * 1024)]);
    const res = await s.agent.post(s.url).attach('file', big, 'huge.pdf');
    expect(res.status).toBe(413);
    expect(res.body.error.fields.file).toMatch(/larger than 10 MB/);
    expect(await countRows('service_attachments')).toBe(0);
  });

  it('attachments — not served to another organization (404 on list, file and upload)', async () => {
    const s = await withRecord();
    const up = await s.agent.post(s.url).attach('file', pdf(), 'sheet.pdf');
    const other = await createOrganization();
    const { user: stranger } = await createMember(other, 'manager');
    const strangerAgent = await signedInAgent(app, stranger);
    expect((await strangerAgent.get(up.body.data.url)).status).toBe(404);
    expect((await strangerAgent.get(`${up.body.data.url}?size=thumb`)).status).toBe(404);
    expect((await strangerAgent.post(s.url).attach('file', pdf(), 'x.pdf')).status).toBe(404);
    expect((await strangerAgent.delete(up.body.data.url)).status).toBe(404);
    // the same ids under the stranger's own organization find nothing either
    const own = up.body.data.url.replace(s.org.id, other.id);
    expect((await strangerAgent.get(own)).status).toBe(404);
  });
});
