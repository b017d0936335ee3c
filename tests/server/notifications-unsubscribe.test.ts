import { beforeEach, describe, expect, it } from 'vitest';
import request from 'supertest';
import { createApp } from '../../server/app';
import { countRows, resetDatabase } from '../support/db';
import { createMember, createOrganization } from '../support/factories';
import { NotificationPreference } from '../../server/models';
import { unsubscribeToken } from '../../server/services/unsubscribe-tokens';

const app = createApp();

describe('one-click unsubscribe (RFC 8058)', () => {
  beforeEach(resetDatabase);

  it('unsubscribe — 400 malformed; 404 forged; GET only asks (HTML or JSON); POST turns the digest off', async () => {
    const org = await createOrganization({ name: 'Hilltop Farm' });
    const { membership } = await createMember(org, 'manager');
    const token = unsubscribeToken(membership.id);
    expect((await request(app).post('/api/v1/unsubscribe/nonsense')).status).toBe(400);
    const forged = `${membership.id}.${'A'.repeat(43)}`;
    expect((await request(app).post(`/api/v1/unsubscribe/${forged}`)).status).toBe(404);
    // a token signed for another membership does not work for this one
    const { membership: other } = await createMember(org, 'technician');
    const swapped = `${membership.id}.${unsubscribeToken(other.id).split('.')[1]}`;
    expect((await request(app).post(`/api/v1/unsubscribe/${swapped}`)).status).toBe(404);
    expect(await countRows('notification_preferences')).toBe(0);

    const page = await request(app).get(`/api/v1/unsubscribe/${token}`).set('Accept', 'text/html');
    expect(page.status).toBe(200);
    expect(page.headers['content-type']).toMatch(/html/);
    expect(page.text).toContain('Hilltop Farm');
    expect(page.text).toContain('<form method="post">');
    const json = await request(app).get(`/api/v1/unsubscribe/${token}`);
    expect(json.body).toEqual({ data: { organization: 'Hilltop Farm' } });
    expect(await countRows('notification_preferences')).toBe(0);

    const res = await request(app)
      .post(`/api/v1/unsubscribe/${token}`)
      .type('form')
      .send('List-Unsubscribe=One-Click');
    expect(res.status).toBe(200);
    expect(res.body).toEqual({ data: { unsubscribed: true, organization: 'Hilltop Farm' } });
    expect((await NotificationPreference.findByPk(membership.id))!.frequency).toBe('off');
  });

  it('unsubscribe — 404 once the membership has ended', async () => {
    const org = await createOrganization();
    const { membership } = await createMember(org, 'manager');
    const token = unsubscribeToken(membership.id);
    await membership.destroy();
    expect((await request(app).post(`/api/v1/unsubscribe/${token}`)).status).toBe(404);
  });
});
