import { beforeEach, describe, expect, it } from 'vitest';
import sharp from 'sharp';
import { resetDatabase } from '../support/db';
import { createMember, createOrganization, signedInAgent } from '../support/factories';
import { answers, app, hoursAgo, submission, yard } from './walkarounds-fixture';

const png = () =>
  sharp({ create: { width: 400, height: 300, channels: 3, background: { r: 120, g: 30, b: 30 } } })
    .jpeg()
    .toBuffer();

describe('walkarounds — submitting', () => {
  beforeEach(resetDatabase);

  it('walkaround photos — uploaded first, attached to an item, served only to people who may see the machine', async () => {
    const y = await yard();
    const photoUrl = `${y.base}/machines/${y.machine.id}/walkaround-photos`;
    const wrong = await y.opAgent
      .post(photoUrl)
      .attach('photo', Buffer.from('not a photo'), 'x.jpg');
    expect(wrong.status).toBe(422);
    expect(wrong.body.error.fields.photo).toMatch(/not an image/);
    const up = await y.opAgent.post(photoUrl).attach('photo', await png(), 'shield.jpg');
    expect(up.status).toBe(201);
    const photoId = up.body.data.id;
    const res = await y.opAgent.post(`${y.base}/walkarounds`).send(
      submission(y.machine.id, {
        performedAt: hoursAgo(8),
        items: answers({ shields: { result: 'fail', note: 'Rear guard bent', photoId } }),
      }),
    );
    expect(res.status).toBe(201);
    const item = res.body.data.items.find((i: { itemId: string }) => i.itemId === 'shields');
    expect(item).toMatchObject({ photoId, thumbnailUrl: `${up.body.data.photoUrl}?size=thumb` });
    expect(res.body.defects[0]).toMatchObject({
      severity: 'critical',
      photoUrl: up.body.data.photoUrl,
    });
    const got = await y.opAgent.get(up.body.data.thumbnailUrl);
    expect(got.status).toBe(200);
    expect(got.headers['content-type']).toBe('image/webp');
    // used once only
    const reuse = await y.opAgent.post(`${y.base}/walkarounds`).send(
      submission(y.machine.id, {
        purpose: 'inspection',
        items: answers({ shields: { result: 'fail', photoId } }),
      }),
    );
    expect(reuse.status).toBe(403);
    const techAgent = await signedInAgent(app, y.tech);
    const reused = await techAgent.post(`${y.base}/walkarounds`).send(
      submission(y.machine.id, {
        purpose: 'inspection',
        meterValue: 2006,
        items: answers({ shields: { result: 'fail', photoId } }),
      }),
    );
    expect(reused.status).toBe(422);
    expect(Object.values(reused.body.error.fields)).toContain(
      'This photo belongs to another walkaround',
    );
    const other = await createOrganization();
    const { user: stranger } = await createMember(other, 'manager');
    const strangerAgent = await signedInAgent(app, stranger);
    expect((await strangerAgent.get(up.body.data.photoUrl)).status).toBe(404);
    expect((await strangerAgent.post(photoUrl).attach('photo', await png(), 'a.jpg')).status).toBe(
      404,
    );
  });
});
