// The write routes to fuzz, read from the OpenAPI document (so a new route is covered as soon as
// `route()` registers it), sent as the right person to the populated world, with a fingerprint of
// every table to show that a refusal wrote nothing.
import { randomBytes, randomUUID } from 'node:crypto';
import type { Express } from 'express';
import request from 'supertest';
import { QueryTypes } from 'sequelize';
import { buildOpenApiDocument } from '../../server/openapi';
import { sequelize } from '../../server/db';
import { todayIso } from '../../shared/domain';
import type { FuzzBody, FuzzHints, JsonSchema } from './fuzz-arbitraries';
import { nextTransactionId } from './db-snapshot';
import type { PopulatedWorld } from './populated-world';

export interface WriteRoute {
  method: 'post' | 'put' | 'patch';
  /** OpenAPI path, e.g. /organizations/{orgId}/machines */
  path: string;
  schema: JsonSchema;
  /** 'apiKey': sent with the world's organization API key and no session (telematics) */
  access: 'public' | 'user' | 'org' | 'apiKey';
}

/** Dealer-side routes: called by the dealer's advisor on the dealer's own organization. */
const DEALER_SIDE = new Set([
  'post /organizations/{orgId}/customer-invitations',
  'post /organizations/{orgId}/customers/{customerId}/reminders',
  'post /organizations/{orgId}/bookings',
]);

/**
 * Tables a refused request may write by design, left out of the fingerprint: rate-limit and
 * sign-in-failure counters (they count refusals), and the session's last-seen time.
 */
const BOOKKEEPING_TABLES = new Set([
  'schema_migrations',
  'rate_limit_hits',
  'sign_in_throttle',
  'sessions',
]);
/** Rows a refused request may add by design: the log of farm data a dealer read before it. */
const BOOKKEEPING_ROWS: Record<string, string> = { audit_events: "action <> 'dealer.read'" };
/** Columns a refused request may write by design: a key's last use (it was used, then refused). */
const BOOKKEEPING_COLUMNS: Record<string, string> = { api_keys: 'last_used_at' };

type Operation = {
  security?: Record<string, unknown>[];
  requestBody?: { content: Record<string, { schema: JsonSchema }> };
};

/** Every POST, PUT and PATCH route with a JSON body; the others are listed as skipped. */
export function writeRoutes(): { routes: WriteRoute[]; skipped: string[] } {
  const doc = buildOpenApiDocument() as unknown as {
    paths: Record<string, Record<string, Operation>>;
  };
  const routes: WriteRoute[] = [];
  const skipped: string[] = [];
  for (const [path, ops] of Object.entries(doc.paths)) {
    for (const method of ['post', 'put', 'patch'] as const) {
      const op = ops[method];
      if (!op) continue;
      const json = op.requestBody?.content['application/json'];
      if (!json) {
        const kind = op.requestBody ? Object.keys(op.requestBody.content).join(', ') : 'no body';
        skipped.push(`${method.toUpperCase()} ${path} (${kind})`);
        continue;
      }
      const access = !op.security
        ? 'public'
        : op.security.some((s) => 'apiKey' in s)
          ? 'apiKey'
          : path.startsWith('/organizations/{orgId}')
            ? 'org'
            : 'user';
      routes.push({ method, path, schema: json.schema, access });
    }
  }
  return { routes, skipped };
}

export const routeName = (r: Pick<WriteRoute, 'method' | 'path'>) =>
  `${r.method.toUpperCase()} ${r.path}`;

const DAY = 86_400_000;
const farmDay = (days: number) => todayIso('America/Chicago', new Date(Date.now() + days * DAY));
const hoursAgo = (h: number) => new Date(Date.now() - h * 3_600_000).toISOString();

/**
 * The world's ids, meter values and dates by the body fields that take them (the latest reading
 * is 4,350 km, ten days ago), so that bodies pass the domain's rules often enough to be stored.
 */
export function fuzzHints(w: PopulatedWorld): FuzzHints {
  const i = w.ids;
  const byField: Record<string, string[]> = {
    machineId: [i.machineId],
    machineIds: [i.machineId],
    taskId: [i.taskId],
    taskIds: [i.taskId, i.otherTaskId],
    meterId: [i.meterId],
    technicianIds: [i.technicianUserId, i.managerUserId],
    operatorIds: [i.operatorUserId],
    assignedTo: [i.technicianUserId],
    closesDefectIds: [i.defectId],
    serviceRecordId: [i.recordId],
    customerId: [w.farmId],
    organizationId: [w.farmId],
    templateId: [i.scheduleTemplateId],
    itemId: w.checklistItemIds,
    // e-mail fields are plain strings in the document (trimmed and lower-cased before the check)
    email: [w.emails.advisor, w.emails.technician, 'new.person@example.com'],
    // an ISO 15143-3 snapshot names the world's machine by its serial number or telematics id
    SerialNumber: [w.serialNumber, 'NOT-OURS-1'],
    PIN: [w.serialNumber],
    EquipmentID: [w.serialNumber],
  };
  const numbers = {
    value: [4400, 4600, 5200],
    meterValue: [4400, 4700],
    lastDoneMeter: [4000, 4300],
    oldFinalValue: [4400],
    newStartValue: [0, 12],
    Hour: [4400, 4600],
  };
  const dates = {
    performedOn: [farmDay(0), farmDay(-2)],
    lastDoneOn: [farmDay(-5), farmDay(-20)],
    plannedFor: [farmDay(3), farmDay(20)],
    proposedFor: [farmDay(5), farmDay(30)],
    takenAt: [hoursAgo(1), hoursAgo(72)],
    performedAt: [hoursAgo(0.5)],
    replacedAt: [hoursAgo(48)],
    resetAt: [hoursAgo(24)],
    datetime: [hoursAgo(1), hoursAgo(2)],
  };
  const all = [...Object.values(i), w.farmId, w.dealerId];
  return { byField, all, emails: [w.emails.advisor, w.emails.technician], numbers, dates };
}

function pathParams(w: PopulatedWorld, dealerSide: boolean): Record<string, string> {
  const i = w.ids;
  return {
    orgId: dealerSide ? w.dealerId : w.farmId,
    machineId: i.machineId,
    taskId: i.taskId,
    readingId: i.readingId,
    recordId: i.recordId,
    defectId: i.defectId,
    templateId: i.templateId,
    linkId: i.linkId,
    bookingId: i.bookingId,
    customerId: w.farmId,
    keyId: i.apiKeyId,
    meterId: i.meterId,
    machine: i.machineId,
    id: i.membershipId,
    token: randomBytes(32).toString('base64url'),
  };
}

export interface SentBody {
  status: number;
  code: string | undefined;
  /** the fields a refusal named, with their messages */
  fields: Record<string, string>;
  /** tables whose row count or checksum changed */
  changed: string[];
}

export class RouteFuzzer {
  private tables: string[] | null = null;
  /**
   * The fingerprint of the state when the next transaction id was `lastXid`: every write takes
   * an id, so while it stays the same the checksums need not be recomputed.
   */
  private last: Map<string, string> | null = null;
  private lastXid = '';

  constructor(private readonly app: Express) {}

  /** Row count and checksum of every table but the bookkeeping ones, by table. */
  async fingerprint(): Promise<Map<string, string>> {
    if (!this.tables) {
      const rows = await sequelize.query<{ tablename: string }>(
        `SELECT tablename FROM pg_tables WHERE schemaname = 'public' ORDER BY tablename`,
        { type: QueryTypes.SELECT },
      );
      this.tables = rows.map((r) => r.tablename).filter((t) => !BOOKKEEPING_TABLES.has(t));
    }
    const sql = this.tables
      .map((t) => {
        const row = BOOKKEEPING_COLUMNS[t] ? `(to_jsonb(x) - '${BOOKKEEPING_COLUMNS[t]}')` : 'x';
        return `SELECT '${t}' AS t, count(*) || ':' || md5(coalesce(string_agg(${row}::text, '|' ORDER BY ${row}::text), '')) AS f FROM "${t}" x${BOOKKEEPING_ROWS[t] ? ` WHERE ${BOOKKEEPING_ROWS[t]}` : ''}`;
      })
      .join(' UNION ALL ');
    const rows = await sequelize.query<{ t: string; f: string }>(sql, { type: QueryTypes.SELECT });
    return new Map(rows.map((r) => [r.t, r.f]));
  }

  /** Forgets the last fingerprint: call it after changing the database between requests. */
  forget() {
    this.last = null;
  }

  /** Sends one body to the route as the person who may call it; says what changed. */
  async send(route: WriteRoute, w: PopulatedWorld, body: FuzzBody): Promise<SentBody> {
    const dealerSide = DEALER_SIDE.has(`${route.method} ${route.path}`);
    const params = pathParams(w, dealerSide);
    const url = `/api/v1${route.path.replace(/\{(\w+)\}/g, (_m, name: string) => params[name] ?? randomUUID())}`;
    const client =
      route.access === 'public' || route.access === 'apiKey'
        ? request(this.app)
        : dealerSide
          ? w.advisor
          : w.manager;
    const xidBefore = await nextTransactionId();
    if (!this.last || xidBefore !== this.lastXid) {
      this.last = await this.fingerprint();
      this.lastXid = xidBefore;
    }
    let req = client[route.method](url).set('Content-Type', 'application/json');
    if (route.access === 'apiKey') req = req.set('Authorization', `Bearer ${w.apiKey}`);
    const res = await req.send('raw' in body ? body.raw : JSON.stringify(body.json));
    const xidAfter = await nextTransactionId();
    let changed: string[] = [];
    if (xidAfter !== xidBefore) {
      const before = this.last;
      const after = await this.fingerprint();
      changed = [...after].filter(([t, f]) => before.get(t) !== f).map(([t]) => t);
      this.last = after;
      this.lastXid = xidAfter;
    }
    return {
      status: res.status,
      code: res.body?.error?.code,
      fields: res.body?.error?.fields ?? {},
      changed,
    };
  }
}
