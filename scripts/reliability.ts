// `npm run reliability`: failure drills against a private copy of Hourstone on loopback — its own
// PostgreSQL cluster (.data/pg/test-59, port 54591), API process, mail catcher, a mail port where
// nothing listens and a mail server that accepts TCP and never answers. It prints:
//   (a) PostgreSQL restarted (pg_ctl restart -m fast) during 30 s of reading posts: readings
//       acknowledged vs stored, 5xx answers, recovery time;
//   (b) mail down, then hanging, then back: messages lost / duplicated after recovery, and the
//       due list's p95 during the hang against normal;
//   (c) two workers and two API processes through pgbouncer (transaction pooling, port 54592):
//       the due digest run by both at once sends one digest per person, and the sign-in
//       throttles hold across the two APIs.
// Every loop is bounded in count and time; the run stops itself (and everything it started)
// within RELIABILITY_TIMEOUT_MS (5 minutes). Exit 1 when a figure misses its bar.
import { spawnSync } from 'node:child_process';
import { randomBytes } from 'node:crypto';
import { readFileSync, writeFileSync } from 'node:fs';
import path from 'node:path';
import pg from 'pg';
import { findServerBinaries, startPostgres } from './lib/postgres.mjs';
import { startPgbouncer } from './lib/pgbouncer.mjs';
import { assertPortsFree, stopAll, type Service } from './lib/processes.mjs';
import { runTsScript, startApi, startMailCatcher } from './lib/app.mjs';
import { ApiSession } from './reliability/http';
import { postgresRestartUnderLoad } from './reliability/postgres-restart';
import { startHangingSmtp } from './reliability/hanging-smtp';

const PORTS = {
  pg: 54591,
  pgbouncer: 54592,
  api: 4591,
  smtp: 2591,
  catcher: 2592,
  hang: 2593,
  dead: 2594,
  pooledApis: [4595, 4596],
};
const TIMEOUT_MS = Number(process.env.RELIABILITY_TIMEOUT_MS ?? 300_000);
const DEMO_PASSWORD = 'hourstone-demo'; // the demo scenario's public password (SCENARIO.md)
const MANAGER = 'marta@larkspur.example';

const services: Service[] = [];
let cleanup: () => Promise<void> = async () => undefined;

/**
 * A test cluster trades crash safety for speed (fsync off); these drills measure what a farm's
 * server does, so the copy runs with PostgreSQL's durable defaults (reloaded, kept on restart).
 */
async function useDurableSettings(binDir: string, pgData: string, databaseUrl: string) {
  const conf = path.join(pgData, 'hourstone.conf');
  writeFileSync(
    conf,
    readFileSync(conf, 'utf8').replace(
      /^(fsync|synchronous_commit|full_page_writes) = '?off'?$/gm,
      '$1 = on',
    ),
  );
  const asPostgres = process.getuid?.() === 0 ? ['runuser', '-u', 'postgres', '--'] : [];
  const [cmd, ...args] = [...asPostgres, path.join(binDir, 'pg_ctl'), 'reload', '-D', pgData, '-s'];
  const reload = spawnSync(cmd, args, { cwd: '/', encoding: 'utf8' });
  if (reload.status !== 0) throw new Error(`pg_ctl reload failed: ${reload.stderr}`);
  const client = new pg.Client({ connectionString: databaseUrl });
  await client.connect();
  try {
    for (let i = 0; i < 20; i++) {
      const { rows } = await client.query(
        `SELECT current_setting('fsync') AS f, current_setting('synchronous_commit') AS s, current_setting('full_page_writes') AS p`,
      );
      if (rows[0].f === 'on' && rows[0].s === 'on' && rows[0].p === 'on')
        return 'durable settings: fsync, synchronous_commit and full_page_writes on';
      await new Promise((resolve) => setTimeout(resolve, 100));
    }
  } finally {
    await client.end();
  }
  throw new Error('the cluster did not take fsync/synchronous_commit/full_page_writes = on');
}

const line = (label: string, value: string | number) =>
  console.log(`  ${label.padEnd(44)} ${value}`);

async function main() {
  await assertPortsFree({
    'reliability API': PORTS.api,
    'reliability mail catcher': PORTS.smtp,
    'reliability mail catcher HTTP': PORTS.catcher,
    'reliability hanging mail server': PORTS.hang,
    'reliability dead mail port': PORTS.dead,
    'reliability API through pgbouncer': PORTS.pooledApis[0],
    'reliability second API through pgbouncer': PORTS.pooledApis[1],
    'reliability pgbouncer': PORTS.pgbouncer,
  });
  const postgres = await startPostgres({
    name: 'test-59',
    port: PORTS.pg,
    database: 'hourstone_reliability',
  });
  cleanup = async () => {
    await stopAll(services);
    await postgres.stop();
  };
  postgres.recreateDatabase('hourstone_reliability');
  const pgData = postgres.pgData!;
  const binDir = findServerBinaries()!;
  const logFile = path.join(path.dirname(pgData), 'test-59.log');
  console.log(`reliability: ${await useDurableSettings(binDir, pgData, postgres.databaseUrl)}`);

  const env: NodeJS.ProcessEnv = {
    ...process.env,
    NODE_ENV: 'development',
    LOG_LEVEL: 'warn',
    DATABASE_URL: postgres.databaseUrl,
    JWT_SECRET: randomBytes(32).toString('hex'),
    APP_URL: `http://127.0.0.1:${PORTS.api}`,
    // The API never sends mail itself; pointing it at the hanging server proves it.
    SMTP_URL: `smtp://127.0.0.1:${PORTS.hang}`,
    SERVE_CLIENT: '0',
  };
  await runTsScript('scripts/migrate.ts', [], env);
  await runTsScript('scripts/seed.ts', ['--reset'], env);
  // A mail server that accepts connections and never says a word (for the API and the worker).
  const hanging = await startHangingSmtp(PORTS.hang);
  const stopRest = cleanup;
  cleanup = async () => {
    hanging.close();
    await stopRest();
  };
  const mail = await startMailCatcher({ smtpPort: PORTS.smtp, httpPort: PORTS.catcher, services });
  await startApi({ env, port: PORTS.api, services });

  const session = new ApiSession(env.APP_URL!);
  const { orgId } = await session.signIn(MANAGER, DEMO_PASSWORD);

  console.log('\n(a) PostgreSQL restart (pg_ctl restart -m fast) during 30 s of reading posts');
  const a = await postgresRestartUnderLoad({
    session,
    orgId,
    databaseUrl: postgres.databaseUrl,
    binDir,
    pgData,
    logFile,
  });
  line('reading posts', a.posts);
  line('acknowledged (201 added)', a.acknowledged);
  line('stored afterwards', a.stored);
  line('acknowledged but not stored (lost)', a.lost);
  line('stored though the answer was an error', a.storedUnacknowledged);
  line('answers by status', JSON.stringify(a.statuses));
  line('5xx answers (of which 500)', `${a.fiveHundreds} (${a.serverErrors500})`);
  line('pg_ctl restart took', `${a.restartSeconds.toFixed(1)} s`);
  line('recovery: restart until posts succeed again', `${a.recoverySeconds.toFixed(1)} s`);

  // The mail scenario runs the worker's code in this process: its modules read the environment.
  Object.assign(process.env, {
    DATABASE_URL: postgres.databaseUrl,
    JWT_SECRET: env.JWT_SECRET,
    APP_URL: env.APP_URL,
    NODE_ENV: 'development',
    LOG_LEVEL: 'silent',
  });
  const { mailOutage } = await import('./reliability/mail-outage');
  console.log('\n(b) mail server down, then hanging (accepts TCP, never answers), then back');
  const b = await mailOutage({
    session,
    anonymous: new ApiSession(env.APP_URL!),
    orgId,
    catcherUrl: mail.catcherUrl,
    catcherSmtpUrl: mail.smtpUrl,
    deadSmtpUrl: `smtp://127.0.0.1:${PORTS.dead}`,
    hangingSmtpUrl: `smtp://127.0.0.1:${PORTS.hang}`,
    resetEmails: [MANAGER, 'dev@larkspur.example', 'lena@larkspur.example', 'sam@larkspur.example'],
  });
  line('messages queued (20 + password resets)', b.queued);
  line('delivered after recovery', b.delivered);
  line('lost', b.lost);
  line('duplicated', b.duplicated);
  line('given up (failed after every attempt)', b.failedForGood);
  line('worker runs against the dead port', b.downAttempts);
  line('worker runs against the hanging server', b.hangAttempts);
  line('connections the hanging server took', hanging.accepted);
  line('longest run against the hanging server', `${b.hangAttemptSeconds.toFixed(1)} s`);
  line('12 password resets during the hang', JSON.stringify(b.resetStatuses));
  line(`due list p95, normal (${b.dueSamples[0]} requests)`, `${b.dueP95NormalMs.toFixed(1)} ms`);
  line(
    `due list p95, during the hang (${b.dueSamples[1]} requests)`,
    `${b.dueP95HangMs.toFixed(1)} ms (${(b.dueP95HangMs / b.dueP95NormalMs).toFixed(2)}×)`,
  );
  line(
    'worker died between send and record',
    b.crashResentSameMessageId ? 'sent again with the same Message-ID' : 'NOT resent as expected',
  );

  console.log('\n(c) two workers and two APIs through pgbouncer (transaction pooling)');
  const c = await scaleOutDrill(postgres.databaseUrl, env, mail);
  const perWorker = c.digestRuns
    .map(
      (w, i) =>
        `worker ${i + 1}: ${w.runs} runs (${w.skippedOnLock} skipped on the lock), ${w.queued} queued`,
    )
    .join('; ');
  line('due-digest runs, both every 10 s', perWorker);
  line('people with a digest queued', c.people);
  line('digests in the mail catcher', c.caught);
  line('people with more than one / with none', `${c.duplicated} / ${c.missing}`);
  line('queued to sent, longest (NOTIFY via LISTEN)', `${c.deliveredWithinSeconds.toFixed(1)} s`);
  line(
    `${c.accountAttempts} failed sign-ins, one account, both APIs`,
    `${c.accountPasswordChecked} × 401 (limit ${c.accountLimit}), by API: ${JSON.stringify(c.accountStatusesByApi)}`,
  );
  line(
    `${c.addressAttempts} failed sign-ins, one address, both APIs`,
    `${c.addressPasswordChecked} × 401 (limit ${c.addressLimit}), ${c.addressThrottled} × 429`,
  );

  line(
    'CSV import through pgbouncer (COPY)',
    `${c.importSent} rows sent, ${c.importStored} stored`,
  );

  const misses = [
    a.serverErrors500 > 0 && 'a 500 during the restart',
    a.lost > 0 && 'acknowledged readings lost',
    a.recoverySeconds > 15 && 'recovery slower than 15 s',
    b.lost > 0 && 'mail lost',
    b.duplicated > 0 && 'mail duplicated',
    b.dueP95HangMs > 2 * b.dueP95NormalMs && 'due list p95 during the hang above 2× normal',
    !b.crashResentSameMessageId && 'a crash between send and record did not resend',
    c.people === 0 && 'no digest queued in the two-worker drill',
    (c.duplicated > 0 || c.caught > c.people) && 'a person got the digest twice',
    c.missing > 0 && 'a queued digest did not arrive',
    c.digestRuns.some((w) => w.runs < 2) && 'a worker did not run the digest',
    (c.accountPasswordChecked > c.accountLimit || c.accountPasswordChecked === 0) &&
      'the account delay did not hold across two APIs',
    c.accountStatusesByApi.some((s) => !s[429]) && 'an API did not throttle the account',
    (c.addressPasswordChecked !== c.addressLimit || c.addressThrottled !== 10) &&
      'the per-address limit did not hold across two APIs',
    c.importStored !== c.importSent && 'the CSV import through pgbouncer did not store every row',
  ].filter(Boolean);
  console.log(
    misses.length
      ? `\nreliability: MISSED — ${misses.join('; ')}`
      : '\nreliability: every figure within its bar',
  );
  return misses.length ? 1 : 0;
}

/** (c): pgbouncer in front of the copy, two APIs and (in the drill) two workers through it. */
async function scaleOutDrill(
  directUrl: string,
  env: NodeJS.ProcessEnv,
  mail: { catcherUrl: string; smtpUrl: string },
) {
  const bouncer = await startPgbouncer({
    name: 'test-59',
    port: PORTS.pgbouncer,
    databaseUrl: directUrl,
  });
  const stopRest = cleanup;
  cleanup = async () => {
    await stopAll(services);
    await bouncer.stop();
    await stopRest();
  };
  const pooled = { ...env, DATABASE_URL: bouncer.databaseUrl, DATABASE_DIRECT_URL: directUrl };
  for (const port of PORTS.pooledApis) await startApi({ env: pooled, port, services });
  const { scaleOut } = await import('./reliability/scale-out');
  return scaleOut({
    workerEnv: { ...pooled, SMTP_URL: mail.smtpUrl },
    apiOrigins: [
      `http://127.0.0.1:${PORTS.pooledApis[0]}`,
      `http://127.0.0.1:${PORTS.pooledApis[1]}`,
    ],
    catcherUrl: mail.catcherUrl,
    accountEmail: 'sam@larkspur.example',
    manager: { email: MANAGER, password: DEMO_PASSWORD },
    services,
  });
}

const watchdog = setTimeout(() => {
  console.error(`reliability: stopped after ${TIMEOUT_MS / 1000} s (RELIABILITY_TIMEOUT_MS)`);
  void cleanup().finally(() => process.exit(1));
}, TIMEOUT_MS);
watchdog.unref();

main()
  .then(async (code) => {
    await cleanup();
    process.exit(code);
  })
  .catch(async (error) => {
    console.error(`reliability failed: ${error.stack ?? error.message}`);
    await cleanup();
    process.exit(1);
  });
