// `npm run bench -- scale`. The due list, the dealer's board and the due digest at scale (issue 12),
// on the data sets of datasets.ts (COPY): a farm of 500 and one of 5,000 machines, a dealer group
// of 200 farms × 25 machines; 10 tasks each, two years of daily readings.
//  - farm due list (the dashboard's first page: 30 days, 25 rows), p95 through the API running as
//    its own process on loopback, against the bare SQL the answer needs (its statements one after
//    another on one plain pg connection);
//  - the dealer's board across the 200 farms (first page of 25, 30 days), the same way;
//  - the due digest of every farm, run in its own process: wall time and peak resident memory.
//   --runs=N (default 200)   --dealer-farms=N (200)   --big-farm=N (5000)   --mid-farm=N (500)
import { spawn } from 'node:child_process';
import { performance } from 'node:perf_hooks';
import pg from 'pg';
import { report } from './report';
import { apiProcessEnv, serveApi } from './api-process';
import { buildScaleData, SCALE_PASSWORD, type BenchFarm } from './datasets';
import { memoryMb, pairedP95, signIn, timedBare, timedGet } from './scale-timing';
import { dueBareStatements, boardBareStatements } from './scale-statements';
import { sequelize } from '../../server/db';

const arg = (name: string, fallback: number) =>
  Number(process.argv.find((a) => a.startsWith(`--${name}=`))?.split('=')[1] ?? fallback);
const RUNS = arg('runs', 200);
const SLOT = Number(process.env.HOURSTONE_TEST_SLOT ?? 0);
const APP_PORT = 4318 + SLOT * 10;
const databaseUrl = process.env.DATABASE_URL!;

const data = await buildScaleData(databaseUrl, {
  dealerFarms: arg('dealer-farms', 200),
  bigFarm: arg('big-farm', 5000),
  midFarm: arg('mid-farm', 500),
});
console.log(
  `data: ${data.machines.toLocaleString('en-US')} machines × 10 tasks, ${data.readings.toLocaleString('en-US')} readings ` +
    `(${data.dealer.farms.length} dealer farms, ${data.midFarm.machines} and ${data.bigFarm.machines}); ` +
    `COPY ${data.copySeconds.toFixed(1)} s, summaries ${data.summarySeconds.toFixed(1)} s`,
);

const api = await serveApi(APP_PORT);
const bare = new pg.Client({ connectionString: databaseUrl });
await bare.connect();
try {
  // 1. The farm's due list, as the dashboard opens it.
  for (const farm of [data.midFarm, data.bigFarm]) await timeDueList(farm);

  // 2. The dealer's board across every customer.
  const cookie = await signIn(api.origin, data.dealer.advisorEmail, SCALE_PASSWORD);
  const path = `/api/v1/organizations/${data.dealer.id}/board?horizon=30&page=1&pageSize=25`;
  const statements = boardBareStatements(data.dealer.id, data.dealer.farms, path);
  const board = await pairedP95(
    RUNS,
    () => timedGet(api.origin, path, cookie),
    () => timedBare(bare, statements()),
  );
  report({
    name: `dealer board, ${data.dealer.farms.length} farms, p95`,
    value: board.api.p95,
    unit: 'ms',
    baseline: { what: 'the bare SQL it needs', value: board.bare.p95 },
    target: '≤ 2×',
    met: board.api.p95 <= 2 * board.bare.p95,
  });
  console.log(`  (p50 ${board.api.p50.toFixed(1)} ms against ${board.bare.p50.toFixed(1)} ms)`);
} finally {
  await api.stop();
  await bare.end();
}

// 3. The due digest of every farm, in its own process; the farms are past their digest hour at
// 14:00 UTC today (08:00 in Chicago … 07:00 in Los Angeles).
const at = new Date(`${new Date().toISOString().slice(0, 10)}T14:00:00Z`);
const digest = await runDigestProcess(at);
const farms = data.dealer.farms.length + 2;
report({
  name: `due digest run, ${farms} farms, wall time`,
  value: digest.ms / 1000,
  unit: 's',
  baseline: null,
  target: '≤ 20 s',
  met: digest.ms <= 20_000,
});
report({
  name: `due digest run, ${farms} farms, peak RSS`,
  value: digest.hwm,
  unit: 'MB',
  baseline: { what: 'the worker process before the run', value: digest.before },
  target: '≤ 300 MB',
  met: digest.hwm <= 300,
});
console.log(`  (${digest.queued} digests queued)`);
await sequelize.close();

async function timeDueList(farm: BenchFarm) {
  const cookie = await signIn(api.origin, farm.managerEmail, SCALE_PASSWORD);
  const path = `/api/v1/organizations/${farm.id}/due?horizon=30&page=1&pageSize=25`;
  const statements = dueBareStatements(farm);
  const due = await pairedP95(
    RUNS,
    () => timedGet(api.origin, path, cookie),
    () => timedBare(bare, statements()),
  );
  report({
    name: `due list, ${farm.machines.toLocaleString('en-US')} machines, p95`,
    value: due.api.p95,
    unit: 'ms',
    baseline: { what: 'the bare SQL it needs', value: due.bare.p95 },
    target: '≤ 1.5×',
    met: due.api.p95 <= 1.5 * due.bare.p95,
  });
  console.log(`  (p50 ${due.api.p50.toFixed(1)} ms against ${due.bare.p50.toFixed(1)} ms)`);
}

async function runDigestProcess(now: Date) {
  const child = spawn(
    process.execPath,
    ['--import', 'tsx', 'scripts/bench/scale-digest.ts', now.toISOString()],
    { env: apiProcessEnv(APP_PORT), stdio: ['pipe', 'pipe', 'inherit'] },
  );
  const t = performance.now();
  let out = '';
  const line = await new Promise<string>((resolve, reject) => {
    child.stdout.on('data', (chunk: Buffer) => {
      out += chunk.toString();
      if (out.includes('\n')) resolve(out.split('\n')[0]);
    });
    child.once('exit', (code) => reject(new Error(`digest process exited (${code}): ${out}`)));
  });
  const { hwm } = memoryMb(child.pid!);
  child.stdin.end();
  const result = JSON.parse(line) as {
    ms: number;
    result: { queued: number };
    before: { rss: number };
  };
  console.log(`  digest process: ${((performance.now() - t) / 1000).toFixed(1)} s with start-up`);
  return { ms: result.ms, hwm, before: result.before.rss, queued: result.result.queued };
}
