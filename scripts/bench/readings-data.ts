// The reading-post benchmark's data set, written with COPY FROM STDIN (pg-copy-streams): one farm
// (America/Chicago) of machines with two years of daily readings, one of them the "daily" machine
// timed against, and one machine with 17,500 hourly telematics readings (two years of hours).
// Every machine has 10 service tasks; summaries and due points are then built once in full.
import { randomUUID } from 'node:crypto';
import { pipeline } from 'node:stream/promises';
import { Readable } from 'node:stream';
import pg from 'pg';
import copyStreams from 'pg-copy-streams';
import bcrypt from 'bcryptjs';
import { QueryTypes } from 'sequelize';
import { sequelize } from '../../server/db';
import { Membership, Organization, User } from '../../server/models';
import { refreshMachineForecast } from '../../server/services/forecast';

export const BENCH_EMAIL = 'readings-bench@bench.example';
export const BENCH_PASSWORD = 'readings-bench-password';
const HOUR_MS = 3_600_000;
const DAY_MS = 24 * HOUR_MS;
const TASKS = 10;

export interface ReadingsFarm {
  orgId: string;
  userId: string;
  /** machine with 730 daily readings (one a day at 18:00 UTC, the last yesterday) */
  daily: string;
  /** machine with 17,500 hourly readings (the last an hour ago) */
  hourly: string;
  /** every machine of the farm, the two above first */
  machines: string[];
  readings: number;
}

/** One COPY … FROM STDIN of text-format rows (tab-separated, \N for null). */
async function copyRows(
  client: pg.Client,
  table: string,
  columns: string[],
  rows: Iterable<unknown[]>,
) {
  const text = function* () {
    for (const row of rows)
      yield `${row.map((v) => (v === null ? '\\N' : String(v))).join('\t')}\n`;
  };
  const sql = `COPY ${table} (${columns.join(', ')}) FROM STDIN`;
  await pipeline(Readable.from(text()), client.query(copyStreams.from(sql)));
}

function* dailyReadings(org: string, machine: string, days: number, perDay: number, nowMs: number) {
  const lastDay = Math.floor(nowMs / DAY_MS) - 1;
  for (let d = 0; d < days; d++) {
    const value = (d * perDay).toFixed(2);
    const at = new Date((lastDay - days + 1 + d) * DAY_MS + 18 * HOUR_MS).toISOString();
    yield [org, machine, value, value, at, 'telematics'];
  }
}

function* hourlyReadings(org: string, machine: string, hours: number, nowMs: number) {
  const last = Math.floor(nowMs / HOUR_MS) - 1;
  for (let h = 0; h < hours; h++) {
    // an hour meter runs at most one hour per hour; this one works 40 % of the clock
    const value = (h * 0.4).toFixed(2);
    yield [
      org,
      machine,
      value,
      value,
      new Date((last - hours + 1 + h) * HOUR_MS).toISOString(),
      'telematics',
    ];
  }
}

function* tasksOf(org: string, machines: string[]) {
  const lastDone = new Date(Date.now() - 120 * DAY_MS).toISOString().slice(0, 10);
  for (const m of machines) {
    for (let t = 1; t <= TASKS; t++) {
      // every third task also has a day interval, as oil-and-filter services do
      yield [
        org,
        m,
        `Task ${t}`,
        t * 250,
        t % 3 === 0 ? 365 : null,
        t * 25,
        Math.max(0, 2000 - t * 200),
        lastDone,
        t,
      ];
    }
  }
}

/** Empties the database and writes the farm; `farmMachines` counts the daily machines besides the hourly one. */
export async function buildReadingsFarm(
  databaseUrl: string,
  farmMachines: number,
): Promise<ReadingsFarm> {
  await sequelize.query('TRUNCATE organizations, users RESTART IDENTITY CASCADE');
  const org = await Organization.create({
    name: 'Reading Bench Farm',
    kind: 'farm',
    timeZone: 'America/Chicago',
    units: 'metric',
  });
  const user = await User.create({
    email: BENCH_EMAIL,
    name: 'Bench',
    passwordHash: bcrypt.hashSync(BENCH_PASSWORD, 4),
  });
  await Membership.create({ organizationId: org.id, userId: user.id, role: 'manager' });

  const hourly = randomUUID();
  const dailyIds = Array.from({ length: farmMachines }, () => randomUUID());
  const machines = [dailyIds[0], hourly, ...dailyIds.slice(1)];
  const nowMs = Date.now();
  const client = new pg.Client({ connectionString: databaseUrl });
  await client.connect();
  try {
    await copyRows(
      client,
      'machines',
      ['id', 'organization_id', 'fleet_number', 'name', 'category'],
      machines.map((id, i) => [
        id,
        org.id,
        `RB-${String(i + 1).padStart(4, '0')}`,
        `Bench machine ${i + 1}`,
        'tractor',
      ]),
    );
    await copyRows(
      client,
      'service_tasks',
      [
        'organization_id',
        'machine_id',
        'name',
        'interval_meter',
        'interval_days',
        'warn_meter',
        'last_done_meter',
        'last_done_on',
        'position',
      ],
      tasksOf(org.id, machines),
    );
    const readingColumns = [
      'organization_id',
      'machine_id',
      'value',
      'lifetime_value',
      'taken_at',
      'source',
    ];
    await copyRows(
      client,
      'meter_readings',
      readingColumns,
      hourlyReadings(org.id, hourly, 17_500, nowMs),
    );
    for (const [i, id] of dailyIds.entries()) {
      await copyRows(
        client,
        'meter_readings',
        readingColumns,
        dailyReadings(org.id, id, 730, 2 + (i % 7), nowMs),
      );
    }
  } finally {
    await client.end();
  }
  for (const id of machines) await refreshMachineForecast(id, org.id);
  // A live database is analysed by autovacuum; do it now so plans reflect the bulk load.
  await sequelize.query('VACUUM ANALYZE');
  const [{ n }] = await sequelize.query<{ n: number }>(
    'SELECT count(*)::int AS n FROM meter_readings',
    {
      type: QueryTypes.SELECT,
    },
  );
  return { orgId: org.id, userId: user.id, daily: dailyIds[0], hourly, machines, readings: n };
}

/**
 * What the load posts go round: the farm's daily machines (the hourly one is timed on its own),
 * each with its current value (a repeat value taken now is a valid reading); `valueOf` has every
 * machine's.
 */
export async function postRotation(farm: ReadingsFarm) {
  const rows = await sequelize.query<{ machine_id: string; v: number }>(
    'SELECT machine_id, last_raw_value::float AS v FROM machine_forecasts',
    { type: QueryTypes.SELECT },
  );
  const valueOf = new Map(rows.map((r) => [r.machine_id, r.v]));
  const rotation = farm.machines
    .filter((id) => id !== farm.hourly)
    .map((id) => ({ id, value: valueOf.get(id)! }));
  return { rotation, valueOf };
}
