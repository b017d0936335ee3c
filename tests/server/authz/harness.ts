// The matrix's machinery: one request per cell (cookie, path, query, body or file), the answer a
// cell expects with foreign ids, and one checksum query over the tenant tables.
import request from 'supertest';
import { sequelize } from '../../../server/db';
import { createApp } from '../../../server/app';
import { TEST_PASSWORD } from '../../support/factories';
import type { User } from '../../../server/models';
import type { Answer, Side } from './callers';

export const app = createApp();

export interface Upload {
  field: string;
  name: string;
  type: string;
  content: Buffer;
}

/** A request as a cell builds it: the ids of the route's path, and what else it carries. */
export interface Built {
  params: Record<string, string>;
  query?: Record<string, string>;
  body?: object;
  file?: Upload;
  /** a session of the caller's own for this request (sign-out ends the one it is sent with) */
  cookie?: string | null;
}

/** One request as sent: the path with its ids filled in. */
export type Sent = Omit<Built, 'params'> & { path: string };

export async function send(method: string, cookie: string | null, sent: Sent) {
  const m = method.toLowerCase() as 'get' | 'post' | 'put' | 'patch' | 'delete';
  let req = request(app)[m](`/api/v1${sent.path}`);
  const session = sent.cookie === undefined ? cookie : sent.cookie;
  if (session) req = req.set('Cookie', session);
  if (sent.query) req = req.query(sent.query);
  if (sent.file)
    return req.attach(sent.file.field, sent.file.content, {
      filename: sent.file.name,
      contentType: sent.file.type,
    });
  if (sent.body !== undefined) return req.send(sent.body);
  return req;
}

/** `{name}` placeholders of an OpenAPI path filled from `ids`; a missing one is a harness bug. */
export function fill(path: string, ids: Record<string, string>): string {
  return path.replace(/\{(\w+)\}/g, (_, name: string) => {
    const id = ids[name];
    if (id === undefined) throw new Error(`no value for {${name}} in ${path}`);
    return encodeURIComponent(id);
  });
}

// The sign-in limiters count every attempt from one address; the matrix signs in often from one,
// and what it tests is who may do what, so it starts each route with their counters empty.
export async function clearSignInCounters(): Promise<void> {
  const [rows] = (await sequelize.query(
    `SELECT tablename FROM pg_tables WHERE schemaname = 'public'
       AND tablename IN ('rate_limit_hits', 'sign_in_throttle')`,
  )) as [{ tablename: string }[], unknown];
  for (const { tablename } of rows) await sequelize.query(`DELETE FROM "${tablename}"`);
}

/** A session cookie of the user's own, through the sign-in route as a person gets one. */
export async function sessionCookie(user: User): Promise<string> {
  await clearSignInCounters();
  const res = await request(app)
    .post('/api/v1/auth/sign-in')
    .send({ email: user.email, password: TEST_PASSWORD });
  const cookie = ([] as string[]).concat(res.headers['set-cookie'] ?? [])[0];
  if (res.status !== 200 || !cookie)
    throw new Error(
      `sign-in failed in the matrix setup: ${res.status} ${JSON.stringify(res.body)}`,
    );
  return cookie.split(';')[0];
}

// Counters a refused request may write: the sign-in limiters, sessions (last seen), the migration
// log. The audit log counts, but for the reads a dealer's request is logged as when it arrives
// (middlewares/org-access.ts logs them before the route looks the record up).
const NOT_RECORDS = new Set([
  'schema_migrations',
  'rate_limit_hits',
  'sign_in_throttle',
  'sessions',
]);
const ROWS_OF: Record<string, string> = {
  audit_events: `(SELECT * FROM audit_events WHERE action <> 'dealer.read')`,
};
let checksumSql: string | undefined;

/** A fingerprint (row count and a sum of row hashes) of every tenant table, in one query. */
export async function tenantChecksum(): Promise<string> {
  if (!checksumSql) {
    const [tables] = (await sequelize.query(
      `SELECT tablename FROM pg_tables WHERE schemaname = 'public' ORDER BY tablename`,
    )) as [{ tablename: string }[], unknown];
    const parts = tables
      .map((t) => t.tablename)
      .filter((t) => !NOT_RECORDS.has(t))
      .map(
        (t) =>
          `'${t}:' || (SELECT count(*) || ':' || coalesce(sum(hashtextextended(x::text, 0)::numeric), 0) FROM ${ROWS_OF[t] ?? `"${t}"`} x)`,
      );
    checksumSql = `SELECT concat_ws(',', ${parts.join(', ')}) AS sums`;
  }
  const [rows] = (await sequelize.query(checksumSql)) as [{ sums: string }[], unknown];
  return rows[0].sums;
}

/**
 * The id the next writing transaction will get: unchanged means nothing at all was written in
 * between (reads take no id), so the tables need no new fingerprint.
 */
export async function writeMark(): Promise<string> {
  const [rows] = (await sequelize.query(
    'SELECT pg_snapshot_xmax(pg_current_snapshot())::text AS mark',
  )) as [{ mark: string }[], unknown];
  return rows[0].mark;
}

/** The tables whose fingerprint differs between two checksums, for the failure message. */
export function changedTables(before: string, after: string): string[] {
  const a = new Set(before.split(','));
  return after
    .split(',')
    .filter((part) => !a.has(part))
    .map((part) => part.split(':')[0]);
}

/**
 * The ids a route names, as it checks them: records of its path (a foreign one is not there:
 * 404), input fields (a foreign one is refused by name: 422, or 404), or none to swap.
 */
export type IdsIn = 'path' | 'field' | 'none';

/**
 * What a caller gets with another organization's ids: 404 — the record is not there for it —
 * unless its role is refused before any lookup (the same 403 as with its own ids), or the id is an
 * input field (a 422 naming it). Never 2xx, and never an answer that tells foreign ids apart.
 */
export function foreignAnswers(own: Answer, idsIn: IdsIn): Answer[] {
  if (own === 401) return [401];
  const refusals: Answer[] = idsIn === 'field' ? [404, 422] : [404];
  return own === 403 ? [403, ...refusals] : refusals;
}

export const matches = (status: number, answer: Answer) =>
  answer === '2xx' ? status >= 200 && status < 300 : status === answer;

export const sideWords = (side: Side) => (side === 'own' ? 'own ids' : 'foreign ids');
