import { beforeEach, describe, expect, it } from 'vitest';
import request from 'supertest';
import QRCode from 'qrcode';
import { resetDatabase } from '../support/db';
import { createMember, createOrganization, signedInAgent } from '../support/factories';
import { app, yard } from './walkarounds-fixture';

describe('walkarounds — machine label', () => {
  beforeEach(resetDatabase);

  it('label.svg — a QR code of APP_URL/o/:orgId/walkaround/:machineId with the fleet number; another farm 404', async () => {
    const y = await yard();
    const url = `${y.base}/machines/${y.machine.id}/label.svg`;
    expect((await request(app).get(url)).status).toBe(401);
    const res = await y.opAgent
      .get(url)
      .buffer(true)
      .parse((r, cb) => {
        let text = '';
        r.on('data', (c: Buffer) => (text += c.toString()));
        r.on('end', () => cb(null, text));
      });
    expect(res.status).toBe(200);
    expect(res.headers['content-type']).toMatch(/^image\/svg\+xml/);
    const svg = res.body as string;
    expect(svg).toContain('>T-01</text>');
    const target = `${process.env.APP_URL ?? 'http://127.0.0.1:4310'}/o/${y.org.id}/walkaround/${y.machine.id}`;
    const expected = await QRCode.toString(target, {
      type: 'svg',
      errorCorrectionLevel: 'M',
      margin: 0,
    });
    const modules = expected.match(/<path stroke="#000000" d="([^"]+)"/)![1];
    expect(svg).toContain(modules);
    const other = await createOrganization();
    const { user: stranger } = await createMember(other, 'manager');
    expect((await (await signedInAgent(app, stranger)).get(url)).status).toBe(404);
  });
});
