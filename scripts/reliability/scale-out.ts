// Scenario (c): several processes, one database. Two workers and two API processes reach
// PostgreSQL through pgbouncer in transaction-pooling mode (the workers' outbox LISTEN goes
// straight to PostgreSQL, DATABASE_DIRECT_URL). Every farm's digest hour is made due and both
// workers run the due digest on the same clock ticks (DUE_DIGEST_CRON every 10 s: node-cron fires
// both at the same second); then the mail catcher must hold exactly one digest per person. Then
// failed sign-ins are sent alternately to the two API processes: the account delay and the
// per-address limit must hold as if there were one process (their counters live in PostgreSQL).
// Needs DATABASE_URL etc. in process.env before it is imported (as mail-outage.ts).
import { tsx } from '../lib/app.mjs';
import { startService, type Service } from '../lib/processes.mjs';
import { ApiSession, sleep } from './http';

const { sequelize } = await import('../../server/db');
const { messageIdOf } = await import('../../server/infra/mailer');
const { env: appEnv } = await import('../../server/env');

export interface ScaleOutFigures {
  /** due-digest runs per worker: how many, and how many found the other holding the lock */
  digestRuns: { runs: number; skippedOnLock: number; queued: number }[];
  people: number;
  caught: number;
  duplicated: number;
  missing: number;
  /** longest time from a digest queued to sent (s) */
  deliveredWithinSeconds: number;
  accountAttempts: number;
  /** SIGN_IN_LIMIT_PER_ACCOUNT and SIGN_IN_LIMIT_PER_ADDRESS, as the APIs read them */
  accountLimit: number;
  addressLimit: number;
  accountPasswordChecked: number;
  accountStatusesByApi: Record<string, number>[];
  addressAttempts: number;
  addressPasswordChecked: number;
  addressThrottled: number;
  /** a CSV import (COPY FROM STDIN inside its transaction) through pgbouncer: rows sent, stored */
  importSent: number;
  importStored: number;
}

interface JobLine {
  msg?: string;
  job?: string;
  result?: { queued?: number } | null;
}

/** Starts a worker and collects its due-digest runs from its JSON log lines. */
function startWorker(name: string, env: NodeJS.ProcessEnv, services: Service[]) {
  const service = startService(name, tsx, ['jobs/index.ts'], { env });
  services.push(service);
  const state = { ready: false, runs: 0, skippedOnLock: 0, queued: 0 };
  let pending = '';
  service.child.stdout?.on('data', (chunk: Buffer | string) => {
    const lines = (pending + chunk.toString()).split('\n');
    pending = lines.pop() ?? '';
    for (const text of lines) {
      let line: JobLine;
      try {
        line = JSON.parse(text) as JobLine;
      } catch {
        continue;
      }
      if (line.msg?.startsWith('worker:')) state.ready = true;
      if (line.msg === 'job done' && line.job === 'due-digest') {
        state.runs++;
        if (line.result === null) state.skippedOnLock++;
        else state.queued += line.result?.queued ?? 0;
      }
    }
  });
  return state;
}

async function until(check: () => boolean | Promise<boolean>, timeoutMs: number) {
  const deadline = Date.now() + timeoutMs;
  while (Date.now() < deadline) {
    if (await check()) return true;
    await sleep(250);
  }
  return false;
}

/** One sign-in attempt with a wrong password, from `address` (X-Forwarded-For, trusted from loopback). */
async function failedSignIn(origin: string, email: string, address: string) {
  const res = await fetch(`${origin}/api/v1/auth/sign-in`, {
    method: 'POST',
    headers: { 'content-type': 'application/json', 'x-forwarded-for': address },
    body: JSON.stringify({ email, password: 'not-the-password' }),
    signal: AbortSignal.timeout(15_000),
  });
  await res.arrayBuffer();
  return res.status;
}

/**
 * A CSV import through an API behind pgbouncer: the import writes with COPY FROM STDIN on its
 * transaction's connection, which a transaction pooler must keep for the whole COPY. A new
 * machine gets three readings (1, 2 and 3 days back); returns the rows stored for it.
 */
async function importThroughPool(origin: string, email: string, password: string) {
  const session = new ApiSession(origin);
  const { orgId } = await session.signIn(email, password);
  const fleetNumber = `RX-${Date.now() % 100_000}`;
  const created = await session.request('POST', `/organizations/${orgId}/machines`, {
    fleetNumber,
    name: 'Reliability import check',
    category: 'tractor',
  });
  if (created.status !== 201)
    throw new Error(
      `creating a machine answered ${created.status}: ${JSON.stringify(created.body)}`,
    );
  const machineId = (created.body as { data: { id: string } }).data.id;
  const day = (n: number) => new Date(Date.now() - n * 86_400_000).toISOString().slice(0, 10);
  const csv = [
    'Fleet number,Taken at,Value',
    ...[3, 2, 1].map((n) => `${fleetNumber},${day(n)},${40 - n * 5}`),
  ];
  const form = new FormData();
  form.append('file', new Blob([`${csv.join('\n')}\n`], { type: 'text/csv' }), 'readings.csv');
  const answer = await session.request(
    'POST',
    `/organizations/${orgId}/readings/import/commit`,
    form,
  );
  if (answer.status >= 300)
    throw new Error(`the import answered ${answer.status}: ${JSON.stringify(answer.body)}`);
  const [rows] = (await sequelize.query(
    'SELECT count(*)::int AS n FROM meter_readings WHERE machine_id = :machineId',
    { replacements: { machineId } },
  )) as [{ n: number }[], unknown];
  return { sent: csv.length - 1, stored: rows[0].n };
}

export async function scaleOut(options: {
  workerEnv: NodeJS.ProcessEnv;
  apiOrigins: [string, string];
  catcherUrl: string;
  accountEmail: string;
  /** a manager's sign-in for the import check */
  manager: { email: string; password: string };
  services: Service[];
}): Promise<ScaleOutFigures> {
  const { apiOrigins } = options;
  await fetch(`${options.catcherUrl}/messages`, { method: 'DELETE' });
  // every farm's digest is due whatever the hour now (hour 0: each local hour has reached it)
  await sequelize.query(`DELETE FROM notifications WHERE kind = 'due_digest'`);
  await sequelize.query(`UPDATE organizations SET digest_hour = 0 WHERE kind = 'farm'`);

  const env = {
    ...options.workerEnv,
    WORKER_JOBS: 'deliver-mail,due-digest',
    DUE_DIGEST_CRON: '*/10 * * * * *',
    LOG_LEVEL: 'info',
  };
  const workers = [1, 2].map((i) => startWorker(`worker-${i}`, env, options.services));
  if (!(await until(() => workers.every((w) => w.ready), 60_000)))
    throw new Error('the two workers did not start within 60 s');
  // two ticks seen by both: at least one where both ran the digest at the same second
  if (!(await until(() => workers.every((w) => w.runs >= 2), 45_000)))
    throw new Error('the workers did not run the due digest twice each within 45 s');
  const allSent = async () => {
    const [rows] = (await sequelize.query(
      `SELECT count(*)::int AS n, count(*) FILTER (WHERE status = 'sent')::int AS sent
       FROM notifications WHERE kind = 'due_digest'`,
    )) as [{ n: number; sent: number }[], unknown];
    return rows[0].n > 0 && rows[0].sent === rows[0].n;
  };
  await until(allSent, 30_000);
  // queued to sent: well under the minute of the delivery schedule when the NOTIFY got through
  const [[{ seconds }]] = (await sequelize.query(
    `SELECT coalesce(max(extract(epoch FROM sent_at - created_at)), -1)::float AS seconds
     FROM notifications WHERE kind = 'due_digest'`,
  )) as [{ seconds: number }[], unknown];
  const deliveredWithinSeconds = seconds;
  await sleep(1000); // a second copy, were one on its way, would have arrived by now

  const [rows] = (await sequelize.query(
    `SELECT id, recipient FROM notifications WHERE kind = 'due_digest'`,
  )) as [{ id: string; recipient: string }[], unknown];
  const caughtMail = (await (await fetch(`${options.catcherUrl}/messages`)).json()) as {
    headers: Record<string, string>;
  }[];
  const perPerson = new Map<string, number>(rows.map((r) => [r.recipient, 0]));
  const personOf = new Map(rows.map((r) => [messageIdOf(r.id), r.recipient]));
  let caught = 0;
  for (const m of caughtMail) {
    const person = personOf.get(m.headers['message-id']);
    if (!person) continue;
    caught++;
    perPerson.set(person, perPerson.get(person)! + 1);
  }

  // Sign-in throttles across the two API processes.
  const accountStatuses: Record<string, number>[] = [{}, {}];
  const ATTEMPTS = 12;
  for (let i = 0; i < ATTEMPTS; i++) {
    const status = await failedSignIn(apiOrigins[i % 2], options.accountEmail, '203.0.113.10');
    accountStatuses[i % 2][status] = (accountStatuses[i % 2][status] ?? 0) + 1;
  }
  const limit = appEnv.SIGN_IN_LIMIT_PER_ADDRESS;
  const addressAttempts = limit + 10;
  const addressStatuses: number[] = [];
  for (let i = 0; i < addressAttempts; i += 2) {
    // two at once, one to each API: unknown addresses, each tried once (no account delay)
    addressStatuses.push(
      ...(await Promise.all(
        [0, 1].map((k) =>
          failedSignIn(apiOrigins[k], `nobody${i + k}@reliability.example`, '203.0.113.20'),
        ),
      )),
    );
  }
  const imported = await importThroughPool(
    apiOrigins[1],
    options.manager.email,
    options.manager.password,
  );
  const count = (s: Record<string, number>[], status: number) =>
    s.reduce((n, c) => n + (c[status] ?? 0), 0);
  return {
    digestRuns: workers.map(({ runs, skippedOnLock, queued }) => ({ runs, skippedOnLock, queued })),
    people: rows.length,
    caught,
    duplicated: [...perPerson.values()].filter((n) => n > 1).length,
    missing: [...perPerson.values()].filter((n) => n === 0).length,
    deliveredWithinSeconds,
    accountAttempts: ATTEMPTS,
    accountLimit: appEnv.SIGN_IN_LIMIT_PER_ACCOUNT,
    addressLimit: limit,
    accountPasswordChecked: count(accountStatuses, 401),
    accountStatusesByApi: accountStatuses,
    addressAttempts,
    addressPasswordChecked: addressStatuses.filter((s) => s === 401).length,
    addressThrottled: addressStatuses.filter((s) => s === 429).length,
    importSent: imported.sent,
    importStored: imported.stored,
  };
}
