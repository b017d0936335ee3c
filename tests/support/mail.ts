// Reads the local mail catcher that `npm test` starts (MAIL_CATCHER_URL).
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

/** The first mail to this address, waiting briefly for delivery. */
export async function mailTo(address: string, timeoutMs = 5000): Promise<CaughtMail> {
  const until = Date.now() + timeoutMs;
  while (Date.now() < until) {
    const found = (await caughtMail()).find((m) =>
      m.to.some((t) => t.toLowerCase().includes(address.toLowerCase())),
    );
    if (found) return found;
    await new Promise((r) => setTimeout(r, 100));
  }
  throw new Error(`no mail to ${address} within ${timeoutMs} ms`);
}

/** The first http(s) link in a text. */
export function firstLink(text: string): string {
  const m = text.match(/https?:\/\/\S+/);
  if (!m) throw new Error('no link in mail');
  return m[0];
}
