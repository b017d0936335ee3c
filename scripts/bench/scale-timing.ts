// What the scale part times with: GETs against the API running as its own process (a signed-in
// cookie per person), the bare SQL over one plain pg connection (the app's statements with their
// :named replacements turned into $n parameters), paired runs and the memory of a process.
import { readFileSync } from 'node:fs';
import { performance } from 'node:perf_hooks';
import pg from 'pg';
import { percentiles } from './report';

/** The signed-in cookie of one person (sign-in through the API). */
export async function signIn(origin: string, email: string, password: string): Promise<string> {
  const res = await fetch(`${origin}/api/v1/auth/sign-in`, {
    method: 'POST',
    headers: { 'content-type': 'application/json' },
    body: JSON.stringify({ email, password }),
  });
  const cookie = (res.headers.get('set-cookie') ?? '').split(';')[0];
  if (!res.ok || !cookie) throw new Error(`sign-in of ${email} answered ${res.status}`);
  return cookie;
}

/** One GET through the API, read to the end; ms. Anything but 200 stops the run. */
export async function timedGet(origin: string, path: string, cookie: string): Promise<number> {
  const t = performance.now();
  const res = await fetch(`${origin}${path}`, {
    headers: { cookie, 'accept-encoding': 'identity' },
  });
  const body = await res.arrayBuffer();
  const ms = performance.now() - t;
  if (res.status !== 200)
    throw new Error(`GET ${path} answered ${res.status}: ${Buffer.from(body).toString()}`);
  return ms;
}

/** A statement with :named replacements as pg text and values ($1, $2 … in order of first use). */
export function toPg(sql: string, replacements: Record<string, unknown>) {
  const values: unknown[] = [];
  const placed = new Map<string, string>();
  // `::int` casts are not replacements: a name needs a colon not preceded by one. An array is a
  // list of values, as Sequelize writes it (`ARRAY[:ids]`).
  const text = sql.replace(/(?<![:\w]):([A-Za-z_]\w*)/g, (_m, name: string) => {
    if (!(name in replacements)) throw new Error(`no value for :${name}`);
    if (!placed.has(name)) {
      const value = replacements[name];
      const list = Array.isArray(value) ? value : [value];
      const start = values.push(...list) - list.length;
      placed.set(name, list.map((_, i) => `$${start + i + 1}`).join(', '));
    }
    return placed.get(name)!;
  });
  return { text, values };
}

export interface BareStatement {
  sql: string;
  replacements: Record<string, unknown>;
}

/** The bare SQL of one request: its statements one after another on one connection; ms. */
export async function timedBare(client: pg.Client, statements: BareStatement[]): Promise<number> {
  const prepared = statements.map((s) => toPg(s.sql, s.replacements));
  const t = performance.now();
  for (const p of prepared) await client.query(p.text, p.values);
  return performance.now() - t;
}

/**
 * p95 of the API and of its bare SQL over `runs` pairs, the two alternating so both see the same
 * load from elsewhere on the machine; `warm` pairs first are not counted.
 */
export async function pairedP95(
  runs: number,
  api: () => Promise<number>,
  bare: () => Promise<number>,
  warm = 10,
) {
  const apiMs: number[] = [];
  const bareMs: number[] = [];
  for (let i = -warm; i < runs; i++) {
    const a = await api();
    const b = await bare();
    if (i < 0) continue;
    apiMs.push(a);
    bareMs.push(b);
  }
  return { api: percentiles(apiMs), bare: percentiles(bareMs) };
}

/** Resident set now and its high-water mark of a process, in MB (Linux /proc/<pid>/status). */
export function memoryMb(pid: number | 'self') {
  const status = readFileSync(`/proc/${pid}/status`, 'utf8');
  const kb = (key: string) => Number(status.match(new RegExp(`^${key}:\\s+(\\d+) kB`, 'm'))![1]);
  return { rss: kb('VmRSS') / 1024, hwm: kb('VmHWM') / 1024 };
}
