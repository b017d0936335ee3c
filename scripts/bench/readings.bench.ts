// `npm run bench -- readings`. The reading write path (issue 12): one reading posted through the API
// against a bare Express + pg handler doing the same writes (readings-bare.ts), the same post on a
// machine with 17,500 hourly readings against one with 730 daily readings, and posts under load
// (autocannon, 10 connections) against the bare handler under the same load. The API and the bare
// handler each run as their own process on loopback; the data set is written with COPY
// (readings-data.ts). Also printed: the queries and API CPU time one post costs.
//   --machines=N (default 200)   --runs=N (default 200)   --seconds=N (default 20)
//   --cpu-prof: profile the in-process posts (.data/bench…/reading-post.cpuprofile) and the API
//               process (CPU.….cpuprofile), each summarised by package and function
//   --profile-only: stop after that (no servers, no load)
import { readdirSync } from 'node:fs';
import path from 'node:path';
import { performance } from 'node:perf_hooks';
import request from 'supertest';
import { sequelize } from '../../server/db';
import { createApp } from '../../server/app';
import { printProfileFile, profiled } from './cpu-profile';
import { percentiles, report } from './report';
import { BENCH_EMAIL, BENCH_PASSWORD, buildReadingsFarm, postRotation } from './readings-data';
import {
  cpuMs,
  databaseCpu,
  databaseCpuSince,
  loadPosts,
  serve,
  postmasterOn,
  timedPost,
  type PostTarget,
} from './readings-load';
import { signIn } from './scale-timing';

const arg = (name: string, fallback: number) =>
  Number(process.argv.find((a) => a.startsWith(`--${name}=`))?.split('=')[1] ?? fallback);
const MACHINES = arg('machines', 200);
const RUNS = arg('runs', 200);
const SECONDS = arg('seconds', 20);
const CONNECTIONS = 10;
const SLOT = Number(process.env.HOURSTONE_TEST_SLOT ?? 0);
const APP_PORT = 4316 + SLOT * 10;
const BARE_PORT = 4317 + SLOT * 10;
const databaseUrl = process.env.DATABASE_URL!;

const t0 = performance.now();
const farm = await buildReadingsFarm(databaseUrl, MACHINES - 1);
console.log(
  `farm: ${farm.machines.length} machines × 10 tasks, ${farm.readings.toLocaleString('en-US')} readings ` +
    `(one machine of 17,500 hourly, the rest 730 daily), built with COPY in ${((performance.now() - t0) / 1000).toFixed(1)} s`,
);
const { rotation, valueOf } = await postRotation(farm);

// 1. What one post costs in-process: queries issued and CPU time (API + Sequelize + pg client).
async function profilePosts(n: number) {
  const agent = request.agent(createApp());
  await agent.post('/api/v1/auth/sign-in').send({ email: BENCH_EMAIL, password: BENCH_PASSWORD });
  const post = (m: { id: string; value: number }) =>
    agent
      .post(`/api/v1/organizations/${farm.orgId}/machines/${m.id}/readings`)
      .send({ value: m.value })
      .expect(201);
  for (let i = 0; i < 10; i++) await post(rotation[i % rotation.length]);
  let queries = 0;
  // Sequelize reads its logging option on every query: counting there counts every statement.
  const options = (sequelize as unknown as { options: { logging: unknown } }).options;
  options.logging = () => void queries++;
  const cpu = process.cpuUsage();
  for (let i = 0; i < n; i++) await post(rotation[i % rotation.length]);
  const used = process.cpuUsage(cpu);
  options.logging = false;
  return { queries: queries / n, cpuMs: (used.user + used.system) / 1000 / n };
}
const profileFile = path.join(
  path.dirname(process.env.BENCH_JSON ?? '.'),
  'reading-post.cpuprofile',
);
const CPU_PROF = process.argv.includes('--cpu-prof');
const profile = CPU_PROF
  ? await profiled(profileFile, () => profilePosts(50))
  : await profilePosts(50);
console.log(
  `one post in-process: ${profile.queries.toFixed(1)} queries (BEGIN/COMMIT included), ${profile.cpuMs.toFixed(2)} ms CPU`,
);
report({
  name: 'reading post queries',
  value: profile.queries,
  unit: 'queries',
  baseline: { what: 'bare handler: BEGIN, 3 writes, COMMIT', value: 5 },
});

if (process.argv.includes('--profile-only')) {
  await sequelize.close();
  process.exit(0);
}

// 2. The API and the bare handler, each its own process on loopback.
const childEnv = {
  ...process.env,
  NODE_ENV: 'production',
  LOG_LEVEL: 'silent',
  SERVE_CLIENT: '0',
  HOST: '127.0.0.1',
  PORT: String(APP_PORT),
  APP_URL: `http://127.0.0.1:${APP_PORT}`,
  VALIDATE_RESPONSES: '0',
};
// --cpu-prof: the API process profiles itself too (written when it exits, summarised below)
const profileDir = path.dirname(profileFile);
const apiNodeArgs = CPU_PROF ? ['--cpu-prof', `--cpu-prof-dir=${profileDir}`] : [];
const api = await serve('server/index.ts', [], childEnv, APP_PORT, '/api/v1/health', apiNodeArgs);
const bare = await serve(
  'scripts/bench/readings-bare.ts',
  [String(BARE_PORT)],
  childEnv,
  BARE_PORT,
  '/health',
);
try {
  const cookie = await signIn(api.origin, BENCH_EMAIL, BENCH_PASSWORD);
  const apiTarget: PostTarget = {
    origin: api.origin,
    path: (id) => `/api/v1/organizations/${farm.orgId}/machines/${id}/readings`,
    headers: { cookie },
  };
  const bareTarget: PostTarget = {
    origin: bare.origin,
    path: (id) => `/machines/${id}/readings`,
    headers: {},
  };

  // Sequential posts, the two sides alternating so that both see the same load from elsewhere.
  const apiMs: number[] = [];
  const bareMs: number[] = [];
  for (let i = -20; i < RUNS; i++) {
    const m = rotation[(i + 20) % rotation.length];
    const a = await timedPost(apiTarget, m.id, m.value);
    const b = await timedPost(bareTarget, m.id, m.value);
    if (i < 0) continue;
    apiMs.push(a);
    bareMs.push(b);
  }
  const post = percentiles(apiMs).p50;
  const barePost = percentiles(bareMs).p50;
  report({
    name: 'reading post p50',
    value: post,
    unit: 'ms',
    baseline: { what: 'bare Express + pg handler, same writes', value: barePost },
    target: '≤ 2×',
    met: post <= 2 * barePost,
  });

  const hourlyMs: number[] = [];
  const dailyMs: number[] = [];
  const hourlyValue = valueOf.get(farm.hourly)!;
  const dailyValue = valueOf.get(farm.daily)!;
  for (let i = -10; i < RUNS; i++) {
    const h = await timedPost(apiTarget, farm.hourly, hourlyValue);
    const d = await timedPost(apiTarget, farm.daily, dailyValue);
    if (i < 0) continue;
    hourlyMs.push(h);
    dailyMs.push(d);
  }
  const hourly = percentiles(hourlyMs).p50;
  const daily = percentiles(dailyMs).p50;
  report({
    name: 'reading post p50, 17,500 hourly readings',
    value: hourly,
    unit: 'ms',
    baseline: { what: 'the same post on 730 daily readings', value: daily },
    target: '≤ 1.3×',
    met: hourly <= 1.3 * daily,
  });

  // 3. Load: the API, then the bare handler, each for SECONDS; CPU read from /proc around each.
  // the database's CPU is read only when its server runs here (not BENCH_DATABASE_URL elsewhere)
  const postmaster = postmasterOn(Number(new URL(databaseUrl).port));
  const dbCpu = () => (postmaster ? databaseCpu(postmaster) : new Map<number, number>());
  const dbCpuSince = (before: Map<number, number>) =>
    postmaster ? databaseCpuSince(postmaster, before) : Number.NaN;
  const apiCpu0 = cpuMs(api.child.pid!);
  const apiDb0 = dbCpu();
  const apiLoad = await loadPosts(apiTarget, rotation, CONNECTIONS, SECONDS);
  const apiCpu = cpuMs(api.child.pid!) - apiCpu0;
  const apiDb = dbCpuSince(apiDb0);
  const bareCpu0 = cpuMs(bare.child.pid!);
  const bareDb0 = dbCpu();
  const bareLoad = await loadPosts(bareTarget, rotation, CONNECTIONS, SECONDS);
  const bareCpu = cpuMs(bare.child.pid!) - bareCpu0;
  const bareDb = dbCpuSince(bareDb0);
  for (const [who, l] of [
    ['API', apiLoad],
    ['bare handler', bareLoad],
  ] as const) {
    console.log(
      `${who} under load: ${l.total} posts, ${l.non2xx} not 2xx, ${l.errors} errors, p50 ${l.p50} ms`,
    );
    if (l.non2xx || l.errors) throw new Error(`${who}: posts failed under load`);
  }
  report({
    name: `reading posts, ${CONNECTIONS} connections × ${SECONDS} s`,
    value: apiLoad.reqPerSec,
    unit: 'req/s',
    baseline: { what: 'bare handler under the same load', value: bareLoad.reqPerSec },
    target: '≥ 0.5×',
    met: apiLoad.reqPerSec >= 0.5 * bareLoad.reqPerSec,
  });
  report({
    name: 'API CPU per reading post under load',
    value: apiCpu / apiLoad.total,
    unit: 'ms',
    baseline: { what: 'bare handler process', value: bareCpu / bareLoad.total },
  });
  report({
    name: 'database CPU per reading post under load',
    value: apiDb / apiLoad.total,
    unit: 'ms',
    baseline: { what: 'the same for the bare handler', value: bareDb / bareLoad.total },
  });
} finally {
  await Promise.all([api.stop(), bare.stop()]);
  await sequelize.close();
}
if (CPU_PROF) {
  // node names it CPU.<date>.<time>.<pid>.<thread>.<n>.cpuprofile; thread 0 is the main one
  const mine = readdirSync(profileDir).filter((f) => f.includes(`.${api.child.pid}.0.`));
  for (const f of mine) {
    console.log(`API process (posts, then load): ${path.join(profileDir, f)}`);
    printProfileFile(path.join(profileDir, f), 25);
  }
}
