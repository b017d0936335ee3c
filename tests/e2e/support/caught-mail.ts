// The mail catcher's HTTP API (scripts/mail-catcher.ts), read directly: a production server has no
// /dev/mail page. The worker delivers queued mail on its own, so a message is waited for.
import { setTimeout as sleep } from 'node:timers/promises';

export interface CaughtMessage {
  id: string;
  from: string;
  to: string[];
  subject: string;
  date: string;
  text: string;
  html: string | null;
}

function catcherUrl(): string {
  const url = process.env.MAIL_CATCHER_URL;
  if (!url) throw new Error('MAIL_CATCHER_URL is not set: run the browser tests with `npm test`');
  return url;
}

/** Every message the catcher holds, newest first. */
export async function caughtMessages(): Promise<CaughtMessage[]> {
  const response = await fetch(`${catcherUrl()}/messages`);
  if (!response.ok) throw new Error(`the mail catcher answered ${response.status}`);
  return (await response.json()) as CaughtMessage[];
}

/** The messages delivered to `address` (exactly, any case), newest first. */
export async function messagesTo(address: string): Promise<CaughtMessage[]> {
  const wanted = address.toLowerCase();
  return (await caughtMessages()).filter((m) => m.to.some((to) => to.toLowerCase() === wanted));
}

/**
 * Waits for the newest message to `address` with this subject (the worker sends within a moment
 * of the request); throws after `timeoutMs` naming what did arrive for the address.
 */
export async function waitForMessage(
  address: string,
  subject: string,
  timeoutMs = 30_000,
): Promise<CaughtMessage> {
  const deadline = Date.now() + timeoutMs;
  for (;;) {
    const found = (await messagesTo(address)).find((m) => m.subject === subject);
    if (found) return found;
    if (Date.now() > deadline) {
      const subjects = (await messagesTo(address)).map((m) => m.subject);
      throw new Error(
        `no mail "${subject}" to ${address} within ${timeoutMs} ms (it has: ${JSON.stringify(subjects)})`,
      );
    }
    await sleep(200);
  }
}

/** The only link into the app in a message's plain text. */
export function appLinkIn(message: CaughtMessage, appUrl: string): string {
  const links = message.text.match(/https?:\/\/\S+/g) ?? [];
  const own = links.filter((link) => link.startsWith(`${appUrl}/`));
  if (own.length !== 1) {
    throw new Error(`expected one link to ${appUrl} in "${message.subject}", found ${own.length}`);
  }
  return own[0]!;
}
