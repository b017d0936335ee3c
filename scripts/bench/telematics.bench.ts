// `npm run bench -- telematics` (issue 13): an ISO/TS 15143-3 snapshot of a 500-machine farm
// posted with an API key to the API (its own process on loopback), every machine matched by
// serial number and its hours written through the reading rules and the forecast refresh; against
// a bare multi-row INSERT of the same 500 rows into meter_readings over one pg connection (inside
// a transaction rolled back, before each post, so both write the same rows into the same table).
// Targets: ≥ 2,000 readings/s, within 5× of the bare INSERT.
//   --runs=N (default 7)   --machines=N (default 500)   --days=N of daily history (default 90)
//   --cpu-prof: first one snapshot in-process, profiled (statements counted, CPU by function)
import { performance } from 'node:perf_hooks';
import pg from 'pg';
import { QueryTypes } from 'sequelize';
import { sequelize } from '../../server/db';
import { Organization, User } from '../../server/models';
import { createApiKey } from '../../server/services/api-keys';
import { ingestSnapshot } from '../../server/services/telematics';
import { authenticateApiKey } from '../../server/services/api-keys';
import { buildScaleData } from './datasets';
import { profiled } from './cpu-profile';
import { serveApi } from './api-process';
import { percentiles, report } from './report';

const arg = (name: string, fallback: number) =>
  Number(process.argv.find((a) => a.startsWith(`--${name}=`))?.split('=')[1] ?? fallback);
const RUNS = arg('runs', 7);
const MACHINES = arg('machines', 500);
const DAYS = arg('days', 90);
const SLOT = Number(process.env.HOURSTONE_TEST_SLOT ?? 0);
const APP_PORT = 4318 + SLOT * 10;
const databaseUrl = process.env.DATABASE_URL!;

const t0 = performance.now();
const data = await buildScaleData(databaseUrl, {
  dealerFarms: 0,
  bigFarm: 0,
  midFarm: MACHINES,
  days: DAYS,
});
const farm = data.midFarm;
await sequelize.query(
  `UPDATE machines SET serial_number = 'SN-' || fleet_number WHERE organization_id = :org`,
  { replacements: { org: farm.id } },
);
const machines = await sequelize.query<{ id: string; serial: string; last: number; at: Date }>(
  `SELECT m.id, m.serial_number AS serial, f.last_raw_value::float8 AS last, f.last_taken_at AS at
   FROM machines m JOIN machine_forecasts f ON f.machine_id = m.id
   WHERE m.organization_id = :org ORDER BY m.fleet_number`,
  { replacements: { org: farm.id }, type: QueryTypes.SELECT },
);
console.log(
  `farm: ${machines.length} machines × 10 tasks, ${data.readings.toLocaleString('en-US')} daily readings, built in ${((performance.now() - t0) / 1000).toFixed(1)} s`,
);
const manager = await User.findOne({ where: { email: farm.managerEmail } });
const { secret } = await createApiKey(
  {
    organization: (await Organization.findByPk(farm.id))!,
    userId: manager!.id,
    role: 'manager',
    via: 'member',
  },
  { name: 'Bench feed', scopes: ['readings:write'] },
);

// Run r's readings: times spread between the last stored reading and now, values rising.
const lastMs = Math.max(...machines.map((m) => new Date(m.at).getTime()));
const stepMs = Math.floor((Date.now() - 60_000 - lastMs) / (RUNS + 2));
const rowsOf = (r: number) =>
  machines.map((m) => ({
    id: m.id,
    serial: m.serial,
    takenAt: new Date(lastMs + (r + 2) * stepMs),
    value: Math.round((m.last + (r + 2) * 0.75) * 100) / 100,
  }));
const snapshotOf = (rows: ReturnType<typeof rowsOf>) => ({
  Fleet: {
    version: '1',
    Equipment: rows.map((row) => ({
      EquipmentHeader: { OEMName: 'Brindle', Model: 'B-1', SerialNumber: row.serial },
      CumulativeOperatingHours: { datetime: row.takenAt.toISOString(), Hour: row.value },
    })),
  },
});

if (process.argv.includes('--cpu-prof')) {
  // one snapshot in-process (its rows then stay: the timed runs start after its times)
  const key = (await authenticateApiKey(secret))!;
  let statements = 0;
  const options = (sequelize as unknown as { options: { logging: unknown } }).options;
  options.logging = () => void statements++;
  const file = `${process.env.BENCH_JSON ?? '.data/bench/x'}`.replace(
    /[^/]*$/,
    'telematics.cpuprofile',
  );
  const start = performance.now();
  const cpu = process.cpuUsage();
  await profiled(file, () => ingestSnapshot(key, snapshotOf(rowsOf(-1)) as never));
  const used = process.cpuUsage(cpu);
  options.logging = false;
  console.log(
    `one snapshot in-process: ${statements} statements, ${(performance.now() - start).toFixed(0)} ms wall, ${((used.user + used.system) / 1000).toFixed(0)} ms CPU`,
  );
}

const api = await serveApi(APP_PORT);
const bare = new pg.Client({ connectionString: databaseUrl });
await bare.connect();

/** The same rows in one multi-row INSERT (rolled back): what writing them costs at the least. */
async function bareInsert(rows: ReturnType<typeof rowsOf>): Promise<number> {
  const values: unknown[] = [];
  const tuples = rows.map((row, i) => {
    values.push(row.id, row.value, row.takenAt);
    const b = i * 3;
    return `($${b + 1}::uuid, $${b + 2}, $${b + 2}, $${b + 3}, 'telematics', '${farm.id}')`;
  });
  await bare.query('BEGIN');
  const start = performance.now();
  await bare.query(
    `INSERT INTO meter_readings (machine_id, value, lifetime_value, taken_at, source, organization_id)
     VALUES ${tuples.join(', ')}`,
    values,
  );
  const ms = performance.now() - start;
  await bare.query('ROLLBACK');
  return ms;
}

async function postSnapshot(rows: ReturnType<typeof rowsOf>): Promise<number> {
  const body = JSON.stringify(snapshotOf(rows));
  const start = performance.now();
  const res = await fetch(`${api.origin}/api/v1/telematics/iso15143-3`, {
    method: 'POST',
    headers: { 'content-type': 'application/json', authorization: `Bearer ${secret}` },
    body,
  });
  const answer = (await res.json()) as { data?: { counts: { recorded: number } } };
  const ms = performance.now() - start;
  if (res.status !== 200 || answer.data?.counts.recorded !== rows.length)
    throw new Error(
      `snapshot not recorded in full: ${res.status} ${JSON.stringify(answer).slice(0, 300)}`,
    );
  return ms;
}

const post: number[] = [];
const insert: number[] = [];
try {
  for (let r = 0; r < RUNS; r++) {
    const rows = rowsOf(r);
    insert.push(await bareInsert(rows));
    post.push(await postSnapshot(rows));
  }
} finally {
  await bare.end();
  await api.stop();
}
// the first post warms the API process (its statements prepared, its caches filled): left out
const p = percentiles(post.slice(1));
const b = percentiles(insert.slice(1));
console.log(
  `snapshot posts (ms): ${post.map((ms) => ms.toFixed(0)).join(', ')}; bare INSERTs (ms): ${insert.map((ms) => ms.toFixed(1)).join(', ')}`,
);
const rate = (machines.length / p.p50) * 1000;
report({
  name: `telematics snapshot ${machines.length} machines readings/s`,
  value: rate,
  unit: 'readings/s',
  baseline: null,
  target: '≥ 2,000 readings/s',
  met: rate >= 2000,
});
report({
  name: `telematics snapshot ${machines.length} machines p50`,
  value: p.p50,
  unit: 'ms',
  baseline: {
    what: `bare multi-row INSERT of the same ${machines.length} rows, p50`,
    value: b.p50,
  },
  target: '≤ 5×',
  met: p.p50 <= 5 * b.p50,
});
await sequelize.close();
