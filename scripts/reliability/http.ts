// A small HTTP client for the reliability runs: one signed-in session against the private API on
// loopback, every call bounded by a timeout, and the time each took.

export interface Answer {
  status: number; // 0 when no HTTP answer came (connection refused, timeout)
  ms: number;
  body: unknown;
  error?: string;
}

const REQUEST_TIMEOUT_MS = 15_000;

export class ApiSession {
  private cookie = '';
  constructor(readonly base: string) {}

  async request(method: string, path: string, body?: unknown): Promise<Answer> {
    const started = performance.now();
    try {
      const response = await fetch(`${this.base}/api/v1${path}`, {
        method,
        headers: {
          Accept: 'application/json',
          // a FormData body (a file upload) brings its own multipart type
          ...(body === undefined || body instanceof FormData
            ? {}
            : { 'Content-Type': 'application/json' }),
          ...(this.cookie ? { Cookie: this.cookie } : {}),
        },
        body:
          body === undefined ? undefined : body instanceof FormData ? body : JSON.stringify(body),
        signal: AbortSignal.timeout(REQUEST_TIMEOUT_MS),
      });
      const setCookie = response.headers.getSetCookie();
      if (setCookie.length) this.cookie = setCookie.map((c) => c.split(';')[0]).join('; ');
      const text = await response.text();
      let parsed: unknown = text;
      try {
        parsed = text ? JSON.parse(text) : null;
      } catch {
        // not JSON: keep the text
      }
      return { status: response.status, ms: performance.now() - started, body: parsed };
    } catch (error) {
      const e = error as Error & { cause?: { code?: string } };
      return {
        status: 0,
        ms: performance.now() - started,
        body: null,
        error: e.cause?.code ?? e.name,
      };
    }
  }

  async signIn(email: string, password: string): Promise<{ orgId: string }> {
    const answer = await this.request('POST', '/auth/sign-in', { email, password });
    if (answer.status !== 200)
      throw new Error(
        `sign-in as ${email} failed: ${answer.status} ${JSON.stringify(answer.body)}`,
      );
    const me = answer.body as {
      data: { memberships: { organization: { id: string; kind: string } }[] };
    };
    const farm = me.data.memberships.find((m) => m.organization.kind === 'farm');
    if (!farm) throw new Error(`${email} is in no farm`);
    return { orgId: farm.organization.id };
  }
}

/** The p-th percentile (0–100) of the values, nearest rank. */
export function percentile(values: number[], p: number): number {
  if (!values.length) return Number.NaN;
  const sorted = [...values].sort((a, b) => a - b);
  const rank = Math.max(1, Math.ceil((p / 100) * sorted.length));
  return sorted[rank - 1];
}

export const sleep = (ms: number) => new Promise((resolve) => setTimeout(resolve, ms));

/** Counts of each status, e.g. { 201: 1180, 503: 12 }. */
export function tally(answers: Answer[]): Record<string, number> {
  const counts: Record<string, number> = {};
  for (const a of answers) {
    const key = a.status === 0 ? `no answer (${a.error})` : String(a.status);
    counts[key] = (counts[key] ?? 0) + 1;
  }
  return counts;
}
