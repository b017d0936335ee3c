import { afterAll, beforeEach, describe, expect, it, vi } from 'vitest';
import request from 'supertest';

// This file's app and worker talk to a mail server that accepts connections and never greets.
// The environment is read once, at import, so the server starts before anything else loads.
const smtp = await vi.hoisted(async () => {
  const { startHangingSmtp } = await import('../support/hanging-smtp');
  const hang = await startHangingSmtp();
  const catcher = process.env.SMTP_URL!;
  process.env.SMTP_URL = hang.url;
  process.env.SMTP_CONNECTION_TIMEOUT_MS = '1000';
  process.env.SMTP_GREETING_TIMEOUT_MS = '300';
  return { hang, catcher };
});

const { createApp } = await import('../../server/app');
const { resetDatabase } = await import('../support/db');
const { createMember, createOrganization } = await import('../support/factories');
const { caughtMail, clearMail } = await import('../support/mail');
const deliverMail = await import('../../jobs/deliver-mail');
const { Notification } = await import('../../server/models');
const { createMailTransport } = await import('../../server/infra/mailer');

const app = createApp();
const APP_HOST = new URL(process.env.APP_URL ?? 'http://127.0.0.1:4310').hostname;

describe('mail never holds up a request (the mail server hangs)', () => {
  beforeEach(async () => {
    await resetDatabase();
    await clearMail();
  });
  afterAll(() => smtp.hang.close());

  it('password reset — answers while the mail server hangs; the e-mail is queued, and the request never contacted the server', async () => {
    const org = await createOrganization();
    const { user } = await createMember(org, 'technician');
    const before = smtp.hang.connections();
    const res = await request(app).post('/api/v1/auth/password-reset').send({ email: user.email });
    expect(res.status).toBe(202);
    const rows = await Notification.findAll();
    expect(rows.map((n) => [n.kind, n.recipient, n.status, n.attempts])).toEqual([
      ['password_reset', user.email.toLowerCase(), 'queued', 0],
    ]);
    expect(smtp.hang.connections()).toBe(before);
  });

  it('delivery — an attempt against the hanging server fails on the greeting timeout and is queued again; the retry is sent once the server answers, with the same Message-ID', async () => {
    const org = await createOrganization();
    const { user } = await createMember(org, 'manager');
    await request(app).post('/api/v1/auth/password-reset').send({ email: user.email });
    const row = (await Notification.findOne())!;
    const now = new Date(row.nextAttemptAt.getTime() + 1);

    const connected = smtp.hang.nextConnection();
    expect(await deliverMail.perform(now)).toEqual({ sent: 0, failed: 0, retrying: 1 });
    await connected;
    await row.reload();
    expect(row.status).toBe('queued');
    expect(row.attempts).toBe(1);
    expect(row.lastError).toMatch(/Greeting never received/);
    expect(row.nextAttemptAt).toEqual(new Date(now.getTime() + 2 * 60_000));

    // the mail server is back (here: the catcher) and the backoff has passed
    const back = createMailTransport(smtp.catcher);
    expect(await deliverMail.perform(row.nextAttemptAt, { transport: back })).toMatchObject({
      sent: 1,
    });
    expect(await row.reload()).toMatchObject({ status: 'sent', attempts: 2 });
    const mail = (await caughtMail()).filter((m) => m.to.includes(user.email.toLowerCase()));
    expect(mail).toHaveLength(1);
    expect(mail[0].subject).toBe('Reset your Hourstone password');
    expect(mail[0].headers['message-id']).toBe(`<${row.id}@${APP_HOST}>`);
  });
});
