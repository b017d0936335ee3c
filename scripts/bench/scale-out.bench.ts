// `npm run bench -- scale-out`. Several processes, one database (issue 12): two API processes and
// two workers, started with the project's own start helpers (scripts/lib/app.mjs, processes.mjs),
// reach the bench cluster through pgbouncer in transaction-pooling mode (scripts/lib/pgbouncer.mjs,
// port BENCH_PGBOUNCER_PORT, default 54313 + 10·slot); the workers' outbox LISTEN goes straight to
// PostgreSQL (DATABASE_DIRECT_URL). Reading posts, 10 connections × 20 s dealt round-robin over the
// two API processes, against the bare Express + pg handler (readings-bare.ts) through the same
// pgbouncer under the same load. Also printed: requests that failed (any answer but 201, or no
// answer) on either side, the same load on one API process (what the second one adds on this
// machine), and the most server connections pgbouncer held for all those clients.
//   --machines=N (default 200)   --seconds=N (default 20)
import { performance } from 'node:perf_hooks';
import pg from 'pg';
import { sequelize } from '../../server/db';
import { startPgbouncer } from '../lib/pgbouncer.mjs';
import { startApi, tsx } from '../lib/app.mjs';
import { startService, stopAll, type Service } from '../lib/processes.mjs';
import { report } from './report';
import { BENCH_EMAIL, BENCH_PASSWORD, buildReadingsFarm, postRotation } from './readings-data';
import {
  cpuMs,
  databaseCpu,
  databaseCpuSince,
  groupCpuMs,
  loadPostsOver,
  postmasterOn,
  serve,
  timedPost,
  type PostTarget,
} from './readings-load';
import { signIn } from './scale-timing';

const arg = (name: string, fallback: number) =>
  Number(process.argv.find((a) => a.startsWith(`--${name}=`))?.split('=')[1] ?? fallback);
const MACHINES = arg('machines', 200);
const SECONDS = arg('seconds', 20);
const CONNECTIONS = 10;
const SLOT = Number(process.env.HOURSTONE_TEST_SLOT ?? 0);
// 4312–4314 + 10·slot: the ports of the slot's range the other parts leave free
const API_PORTS = [4312 + SLOT * 10, 4313 + SLOT * 10];
const BARE_PORT = 4314 + SLOT * 10;
const PGBOUNCER_PORT = Number(process.env.BENCH_PGBOUNCER_PORT ?? 54313 + SLOT * 10);
const directUrl = process.env.DATABASE_URL!;

const t0 = performance.now();
const farm = await buildReadingsFarm(directUrl, MACHINES - 1);
console.log(
  `farm: ${farm.machines.length} machines × 10 tasks, ${farm.readings.toLocaleString('en-US')} readings, ` +
    `built with COPY in ${((performance.now() - t0) / 1000).toFixed(1)} s`,
);
const { rotation } = await postRotation(farm);
await sequelize.close();

const bouncer = await startPgbouncer({
  name: `bench${SLOT ? `-${SLOT}` : ''}`,
  port: PGBOUNCER_PORT,
  databaseUrl: directUrl,
});
const services: Service[] = [];
const childEnv: NodeJS.ProcessEnv = {
  ...process.env,
  NODE_ENV: 'production',
  LOG_LEVEL: 'warn',
  SERVE_CLIENT: '0',
  VALIDATE_RESPONSES: '0',
  DATABASE_URL: bouncer.databaseUrl,
  DATABASE_DIRECT_URL: directUrl,
  // the workers' mail goes nowhere (port 9, discard): no one's mail catcher gets bench mail
  SMTP_URL: 'smtp://127.0.0.1:9',
  APP_URL: `http://127.0.0.1:${API_PORTS[0]}`,
};

/**
 * The most client and server connections pgbouncer held for the bench database while `during`
 * ran (SHOW CLIENTS / SHOW SERVERS on its admin console, every 250 ms).
 */
async function peakConnections<T>(during: Promise<T>) {
  const admin = new pg.Client({ connectionString: bouncer.adminUrl });
  await admin.connect();
  const count = async (what: string) => {
    const { rows } = await admin.query({ text: `SHOW ${what}`, queryMode: 'simple' } as never);
    return (rows as { database: string }[]).filter((r) => r.database === 'hourstone_bench').length;
  };
  const peak = { clients: 0, servers: 0 };
  let done = false;
  const sampling = (async () => {
    while (!done) {
      peak.clients = Math.max(peak.clients, await count('CLIENTS'));
      peak.servers = Math.max(peak.servers, await count('SERVERS'));
      await new Promise((r) => setTimeout(r, 250));
    }
  })();
  try {
    return { result: await during, peak };
  } finally {
    done = true;
    await sampling;
    await admin.end();
  }
}

let bare: Awaited<ReturnType<typeof serve>> | undefined;
try {
  for (const [i, port] of API_PORTS.entries())
    await startApi({ env: { ...childEnv, PORT: String(port) }, port, services }).then(() =>
      console.log(`API ${i + 1} on 127.0.0.1:${port} through pgbouncer`),
    );
  for (const i of [1, 2])
    services.push(startService(`worker-${i}`, tsx, ['jobs/index.ts'], { env: childEnv }));
  bare = await serve(
    'scripts/bench/readings-bare.ts',
    [String(BARE_PORT)],
    childEnv,
    BARE_PORT,
    '/health',
  );
  const origins = API_PORTS.map((p) => `http://127.0.0.1:${p}`);
  // one sign-in serves both: the session is a row in PostgreSQL
  const cookie = await signIn(origins[0], BENCH_EMAIL, BENCH_PASSWORD);
  const apiTargets: PostTarget[] = origins.map((origin) => ({
    origin,
    path: (id) => `/api/v1/organizations/${farm.orgId}/machines/${id}/readings`,
    headers: { cookie },
  }));
  const bareTarget: PostTarget = {
    origin: bare.origin,
    path: (id) => `/machines/${id}/readings`,
    headers: {},
  };
  // warm-up: each server's code paths compiled before the clock runs
  for (let i = 0; i < 30; i++) {
    const m = rotation[i % rotation.length];
    await timedPost(apiTargets[i % 2], m.id, m.value);
    await timedPost(bareTarget, m.id, m.value);
  }

  // CPU per post of the server processes, pgbouncer and PostgreSQL (read from /proc)
  const postmaster = postmasterOn(Number(new URL(directUrl).port));
  const apiCpu = () =>
    services.filter((s) => s.name === 'api').reduce((n, s) => n + groupCpuMs(s.child.pid!), 0);
  const bareCpu = () => cpuMs(bare!.child.pid!);
  const bouncerCpu = () => cpuMs(bouncer.pid()!);
  async function withCpu<T extends { total: number }>(server: () => number, run: Promise<T>) {
    const [s0, b0, d0] = [server(), bouncerCpu(), postmaster ? databaseCpu(postmaster) : null];
    const result = await run;
    const per = (ms: number) => ms / result.total;
    return {
      ...result,
      cpu: {
        server: per(server() - s0),
        bouncer: per(bouncerCpu() - b0),
        database: d0 ? per(databaseCpuSince(postmaster!, d0)) : Number.NaN,
      },
    };
  }
  const { result: apiLoad, peak } = await peakConnections(
    withCpu(apiCpu, loadPostsOver(apiTargets, rotation, CONNECTIONS, SECONDS)),
  );
  const bareLoad = await withCpu(
    bareCpu,
    loadPostsOver([bareTarget], rotation, CONNECTIONS, SECONDS),
  );
  const oneApiLoad = await loadPostsOver([apiTargets[0]], rotation, CONNECTIONS, SECONDS);
  const failed = (l: typeof oneApiLoad) => l.non2xx + l.errors + l.timeouts;
  console.log(
    `two APIs under load: ${apiLoad.total} posts (${apiLoad.perTarget.join(' + ')}), ${apiLoad.non2xx} not 2xx, ` +
      `${apiLoad.errors} errors, ${apiLoad.timeouts} timeouts, p50 ${apiLoad.p50} ms`,
  );
  console.log(
    `one API under load: ${oneApiLoad.total} posts, ${failed(oneApiLoad)} failed, p50 ${oneApiLoad.p50} ms`,
  );
  console.log(
    `bare handler under load: ${bareLoad.total} posts, ${bareLoad.non2xx} not 2xx, ` +
      `${bareLoad.errors} errors, ${bareLoad.timeouts} timeouts, p50 ${bareLoad.p50} ms`,
  );
  report({
    name: `reading posts, 2 APIs through pgbouncer, ${CONNECTIONS} connections × ${SECONDS} s`,
    value: apiLoad.reqPerSec,
    unit: 'req/s',
    baseline: { what: 'bare handler through the same pgbouncer', value: bareLoad.reqPerSec },
    target: '≥ 0.5×',
    met: apiLoad.reqPerSec >= 0.5 * bareLoad.reqPerSec,
  });
  report({
    name: 'failed requests under load, 2 APIs through pgbouncer',
    value: failed(apiLoad),
    unit: 'requests',
    baseline: { what: 'the bare handler', value: failed(bareLoad) },
    target: '0',
    met: failed(apiLoad) === 0,
  });
  report({
    name: `reading posts, 2 APIs against 1 through pgbouncer, ${CONNECTIONS} connections × ${SECONDS} s`,
    value: apiLoad.reqPerSec,
    unit: 'req/s',
    baseline: { what: 'one API process under the same load', value: oneApiLoad.reqPerSec },
  });
  for (const [what, key] of [
    ['API CPU per reading post, 2 APIs', 'server'],
    ['pgbouncer CPU per reading post, 2 APIs', 'bouncer'],
    ['database CPU per reading post, 2 APIs', 'database'],
  ] as const)
    report({
      name: `${what} through pgbouncer`,
      value: apiLoad.cpu[key],
      unit: 'ms',
      baseline: { what: 'the same for the bare handler', value: bareLoad.cpu[key] },
    });
  report({
    name: 'pgbouncer server connections at peak, 2 APIs + 2 workers + bare handler',
    value: peak.servers,
    unit: 'connections',
    baseline: { what: 'client connections pgbouncer served at peak', value: peak.clients },
  });
} finally {
  await bare?.stop();
  await stopAll(services);
  await bouncer.stop();
}
