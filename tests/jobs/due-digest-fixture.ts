// What the due-digest tests share: the clock they run at, one run of the job, delivery of the
// outbox, and reading the caught mail.
import { createApp } from '../../server/app';
import type { CaughtMail } from '../support/mail';
import * as dueDigest from '../../jobs/due-digest';
import * as deliverMail from '../../jobs/deliver-mail';

export const app = createApp();
export const APP_URL = process.env.APP_URL ?? 'http://127.0.0.1:4310';
// Tuesday 7 April 2026, 08:00 in Chicago (CDT, UTC−5): past the default digest hour (6).
export const NOW = new Date('2026-04-07T13:00:00Z');
/** One run of the job (it returns null only when another worker holds its lock). */
export const runDigest = async (now: Date) => (await dueDigest.perform(now))!;
export const hours = (n: number) => new Date(NOW.getTime() + n * 3_600_000);

export const mailFor = (all: CaughtMail[], email: string) =>
  all.filter((m) => m.to.some((t) => t.toLowerCase().includes(email.toLowerCase())));

export const sendAll = () => deliverMail.perform();

/** The List-* headers as the mail catcher's parser reports them (merged into one `list`). */
export function listHeaders(mail: CaughtMail) {
  return JSON.parse(mail.headers.list) as {
    unsubscribe: { url: string };
    'unsubscribe-post': { name: string };
  };
}
