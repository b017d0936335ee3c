// `npm run bench forecast` (also `npm run bench:forecast`). Benchmark of the forecast path at farm scale: 2,000 machines × 10 tasks, two years of daily
// readings. Each figure is printed as a ratio against a baseline measured in this same run.
//   --machines=N  (default 2000)   --runs=N (default 15)
import { performance } from 'node:perf_hooks';
import { report } from './report';
import request from 'supertest';
import bcrypt from 'bcryptjs';
import { QueryTypes } from 'sequelize';
import { sequelize } from '../../server/db';
import { createApp } from '../../server/app';
import { Machine, Membership, Organization, ServiceTask, User } from '../../server/models';
import { refreshMachineForecast } from '../../server/services/forecast';
import { primaryForecastOf } from '../../server/services/primary-forecast';
import { dueListSql, staleSql } from '../../server/services/due-list';
import { dueCountsSql } from '../../server/services/due-counts';
import {
  addDaysIso,
  computeDuePoint,
  estimateUsage,
  localDayNumber,
  todayIso,
} from '../../shared/domain';

const arg = (name: string, fallback: number) =>
  Number(process.argv.find((a) => a.startsWith(`--${name}=`))?.split('=')[1] ?? fallback);
const MACHINES = arg('machines', 2000);
const RUNS = arg('runs', 15);
const TASKS = 10;
const DAYS = 730;

const median = (xs: number[]) => {
  const s = [...xs].sort((a, b) => a - b);
  return s.length % 2 ? s[(s.length - 1) / 2] : (s[s.length / 2 - 1] + s[s.length / 2]) / 2;
};
async function time(runs: number, fn: (i: number) => Promise<unknown> | unknown) {
  const out: number[] = [];
  for (let i = 0; i < runs; i++) {
    const t = performance.now();
    await fn(i);
    out.push(performance.now() - t);
  }
  return median(out);
}

async function buildFarm() {
  const t0 = performance.now();
  await sequelize.query('TRUNCATE organizations, users RESTART IDENTITY CASCADE');
  const org = await Organization.create({
    name: 'Benchmark Farm',
    kind: 'farm',
    timeZone: 'America/Chicago',
    units: 'metric',
  });
  const user = await User.create({
    email: 'bench@bench.example',
    name: 'Bench',
    passwordHash: bcrypt.hashSync('bench-password', 4),
  });
  await Membership.create({ organizationId: org.id, userId: user.id, role: 'manager' });
  // Machines, tasks and two years of daily readings generated in SQL (fast, deterministic).
  await sequelize.query(
    `INSERT INTO machines (organization_id, fleet_number, name, category)
     SELECT :org, 'B-' || lpad(g::text, 5, '0'), 'Bench machine ' || g, 'tractor' FROM generate_series(1, :n) g`,
    { replacements: { org: org.id, n: MACHINES } },
  );
  await sequelize.query(
    `INSERT INTO service_tasks (organization_id, machine_id, name, interval_meter, interval_days, warn_meter, last_done_meter, last_done_on, position)
     SELECT m.organization_id, m.id, 'Task ' || t, (t * 250)::numeric, CASE WHEN t % 3 = 0 THEN 365 END, (t * 25)::numeric,
            greatest(0, 2000 - t * 200)::numeric, (now() - interval '120 days')::date, t
     FROM machines m CROSS JOIN generate_series(1, :tasks) t WHERE m.organization_id = :org`,
    { replacements: { org: org.id, tasks: TASKS } },
  );
  await sequelize.query(
    `INSERT INTO meter_readings (organization_id, machine_id, value, lifetime_value, taken_at, source)
     SELECT m.organization_id, m.id, v, v, ts, 'telematics'
     FROM machines m
     CROSS JOIN LATERAL (
       SELECT d, (d * (2 + (hashtext(m.id::text) & 7)))::numeric AS v,
              date_trunc('day', now()) - make_interval(days => :days - d) + interval '18 hours' - interval '1 day' AS ts
       FROM generate_series(0, :days - 1) d) r
     WHERE m.organization_id = :org`,
    { replacements: { org: org.id, days: DAYS } },
  );
  const built = performance.now() - t0;
  const machines = await Machine.findAll({
    where: { organizationId: org.id },
    attributes: ['id', 'organizationId'],
  });
  const t1 = performance.now();
  for (const m of machines) await refreshMachineForecast(m.id, org.id);
  const summarised = performance.now() - t1;
  // A live database is analysed by autovacuum; do it now so plans reflect the bulk load.
  await sequelize.query('VACUUM ANALYZE');
  return { org, user, machines, built, summarised };
}

const { org, machines, built, summarised } = await buildFarm();
const [{ n: readings }] = await sequelize.query<{ n: number }>(
  'SELECT count(*)::int AS n FROM meter_readings',
  { type: QueryTypes.SELECT },
);
console.log(
  `farm: ${MACHINES} machines, ${MACHINES * TASKS} tasks, ${readings.toLocaleString('en-US')} readings (built in ${(built / 1000).toFixed(1)} s; summaries in ${(summarised / 1000).toFixed(1)} s)`,
);

const app = createApp();
const agent = request.agent(app);
await agent
  .post('/api/v1/auth/sign-in')
  .send({ email: 'bench@bench.example', password: 'bench-password' });
const asOf = todayIso(org.timeZone);

// 1. Due list through the API vs the bare SQL it needs (same filters: 30-day horizon, the dashboard's default).
const horizon = 30;
const PAGE = 100;
const sql = dueListSql({ horizon: true, page: true });
const replacements = {
  org: org.id,
  user: null,
  category: null,
  status: null,
  machineId: null,
  until: addDaysIso(asOf, horizon),
  limit: PAGE,
  offset: 0,
};
await agent.get(`/api/v1/organizations/${org.id}/due?horizon=${horizon}`); // warm-up (brings due points current)
// The bare SQL the endpoint needs: the page, the counters and the stale-meter list.
const countsSql = dueCountsSql({});
const stale = staleSql(false);
const staleArgs = {
  org: org.id,
  user: null,
  month: Number(asOf.slice(5, 7)),
  cutoff: new Date(Date.now() - 14 * 86_400_000),
};
const pageMs = await time(RUNS, () =>
  sequelize.query(sql, { replacements, type: QueryTypes.SELECT }),
);
const bareMs = await time(RUNS, async () => {
  await sequelize.query(sql, { replacements, type: QueryTypes.SELECT });
  await sequelize.query(countsSql, { replacements, type: QueryTypes.SELECT });
  await sequelize.query(stale, { replacements: staleArgs, type: QueryTypes.SELECT });
});
let rows = 0;
const apiMs = await time(RUNS, async () => {
  const res = await agent.get(`/api/v1/organizations/${org.id}/due?horizon=${horizon}`);
  rows = res.body.meta.total;
});

// 2. One reading posted and the machine's due points refreshed vs a bare INSERT of one reading row.
const postMs = await time(RUNS * 2, async (i) => {
  const m = machines[i];
  const f = (await primaryForecastOf(m))!;
  const res = await agent
    .post(`/api/v1/organizations/${org.id}/machines/${m.id}/readings`)
    .send({ value: (f.lastValue ?? 0) + 3, takenAt: new Date().toISOString() });
  if (res.status !== 201) throw new Error(`reading refused: ${JSON.stringify(res.body)}`);
});
const insertMs = await time(RUNS * 2, (i) =>
  sequelize.query(
    `INSERT INTO meter_readings (organization_id, machine_id, value, lifetime_value, taken_at, source)
     VALUES (:org, :machine, 1e6 + :i, 1e6 + :i, now() + make_interval(secs => :i), 'manual')`,
    { replacements: { org: org.id, machine: machines[MACHINES - 1].id, i } },
  ),
);

// 3. Forecast of one machine from its full history (two years of daily points, 10 tasks) vs one pass over the points.
const forecast = (await primaryForecastOf(machines[1]))!;
const tasks = await ServiceTask.findAll({
  where: { organizationId: org.id, machineId: machines[1].id },
});
const asOfDay = localDayNumber(new Date(), org.timeZone);
const REPS = 2000;
const forecastMs =
  (await time(5, () => {
    for (let r = 0; r < REPS; r++) {
      const usage = estimateUsage(forecast.daily, asOfDay);
      for (const t of tasks)
        computeDuePoint({ ...t.get(), lastDoneOn: t.lastDoneOn }, usage, asOf, forecast.lastValue);
    }
  })) / REPS;
let sink = 0;
const passMs =
  (await time(5, () => {
    for (let r = 0; r < REPS; r++) for (const p of forecast.daily) sink += p.value;
  })) / REPS;

const fmt = (ms: number) => (ms < 1 ? `${(ms * 1000).toFixed(0)} µs` : `${ms.toFixed(1)} ms`);
const table = [
  [
    `due list via API (30-day horizon, first ${PAGE} rows + counts)`,
    apiMs,
    'the bare SQL it needs (page, counters, stale meters)',
    bareMs,
    `median < 200 ms and < 2× bare`,
    apiMs < 200 && apiMs / bareMs < 2,
  ],
  [
    'one reading posted + due points refreshed',
    postMs,
    'bare INSERT of one reading',
    insertMs,
    'median < 30 ms',
    postMs < 30,
  ],
  [
    'forecast of one machine (730 days, 10 tasks)',
    forecastMs,
    'one pass over its 730 points',
    passMs,
    '< 1 ms',
    forecastMs < 1,
  ],
] as const;
console.log(`bare SQL of the page alone: ${pageMs.toFixed(1)} ms`);
console.log(
  `due list: ${rows} tasks inside the horizon, ${PAGE} per page; medians of ${RUNS} runs (${RUNS * 2} for posts); history points per machine: ${forecast.daily.length}`,
);
console.log('| measured | median | baseline | median | ratio | target | met |');
console.log('|---|---|---|---|---|---|---|');
for (const [name, ms, baseName, baseMs, target, met] of table) {
  console.log(
    `| ${name} | ${fmt(ms)} | ${baseName} | ${fmt(baseMs)} | ${(ms / baseMs).toFixed(1)}× | ${target} | ${met ? 'yes' : 'no'} |`,
  );
}
for (const [name, ms, baseName, baseMs, target, met] of table) {
  report({ name, value: ms, unit: 'ms', baseline: { what: baseName, value: baseMs }, target, met });
}
if (sink < 0) console.log(sink);
await sequelize.close();
