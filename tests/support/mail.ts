// Reads the local mail catcher that `npm test` starts (MAIL_CATCHER_URL).
import { deliverQueued } from '../../server/infra/mailer';

export interface CaughtMail {
  id: string;
  to: string[];
  subject: string;
  text: string;
  html: string | null;
  headers: Record<string, string>;
}

const base = () => {
  const url = process.env.MAIL_CATCHER_URL;
  if (!url) throw new Error('MAIL_CATCHER_URL is not set: run the tests with `npm test`.');
  return url;
};

export async function caughtMail(): Promise<CaughtMail[]> {
  const res = await fetch(`${base()}/messages`);
  return (await res.json()) as CaughtMail[];
}

export async function clearMail(): Promise<void> {
  await fetch(`${base()}/messages`, { method: 'DELETE' });
}

export async function setMailAccepting(accept: boolean): Promise<void> {
  await fetch(`${base()}/control`, {
    method: 'POST',
    headers: { 'content-type': 'application/json' },
    body: JSON.stringify({ accept }),
  });
}

/**
 * Runs the outbox delivery once, as the worker would (requests only queue their e-mail), then
 * returns everything the mail catcher holds. Delivery has finished when this reads: the send
 * resolves once the catcher has stored the message.
 */
export async function deliveredMail(): Promise<CaughtMail[]> {
  await deliverQueued({ limit: 200 });
  return caughtMail();
}

/** Delivers the outbox, then the newest mail to this address (throws when there is none). */
export async function mailTo(address: string): Promise<CaughtMail> {
  const found = (await deliveredMail()).find((m) =>
    m.to.some((t) => t.toLowerCase().includes(address.toLowerCase())),
  );
  if (!found) throw new Error(`no mail to ${address} after delivering the outbox`);
  return found;
}

/** The first http(s) link in a text. */
export function firstLink(text: string): string {
  const m = text.match(/https?:\/\/\S+/);
  if (!m) throw new Error('no link in mail');
  return m[0];
}
