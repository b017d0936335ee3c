// The scale data sets of `npm run bench` (issue 12), written with COPY FROM STDIN (pg-copy-streams):
//  - a dealer group: one dealer whose advisor has active links to 200 farms of 25 machines each
//    (four US time zones; a manager, a technician and an operator of 5 machines per farm);
//  - one farm of 5,000 machines and one of 500 (America/Chicago; a manager and a technician);
// every machine with 10 service tasks and two years of daily readings (datasets-rows.ts).
// Forecast summaries and due points are then built as the app's full refresh builds them
// (refreshMachineForecast: every reading through summaryOf, then storeForecasts), but for 100
// machines per statement instead of one: nothing is computed here that the app would compute
// differently. The readings go in with meter_readings' foreign keys and secondary indexes set
// aside and put back after (the same definitions, checked and built once for the whole table).
import { randomUUID } from 'node:crypto';
import { performance } from 'node:perf_hooks';
import { Readable } from 'node:stream';
import { pipeline } from 'node:stream/promises';
import pg from 'pg';
import copyStreams from 'pg-copy-streams';
import bcrypt from 'bcryptjs';
import { sequelize } from '../../server/db';
import { QueryTypes } from 'sequelize';
import { storeForecasts } from '../../server/services/forecast';
import { summaryOf } from '../../server/services/daily-summary';
import {
  MACHINE_COLUMNS,
  READING_COLUMNS,
  TASK_COLUMNS,
  copyLine,
  machineLines,
  machinesOf,
  readingLines,
  taskLines,
  type BenchMachine,
} from './datasets-rows';

export const SCALE_PASSWORD = 'scale-bench-password';
const ZONES = ['America/Chicago', 'America/Denver', 'America/New_York', 'America/Los_Angeles'];

export interface BenchFarm {
  id: string;
  name: string;
  timeZone: string;
  managerEmail: string;
  machines: number;
}

export interface ScaleData {
  dealer: { id: string; advisorEmail: string; farms: BenchFarm[] };
  /** the farm of 5,000 machines and the one of 500 */
  bigFarm: BenchFarm;
  midFarm: BenchFarm;
  machines: number;
  readings: number;
  /** seconds spent writing rows (COPY) and building summaries */
  copySeconds: number;
  summarySeconds: number;
}

export interface ScaleOptions {
  dealerFarms?: number;
  machinesPerFarm?: number;
  bigFarm?: number;
  midFarm?: number;
  days?: number;
}

/** One COPY … FROM STDIN of ready COPY text lines. */
async function copyInto(
  client: pg.Client,
  table: string,
  columns: string[],
  lines: Iterable<string>,
) {
  const sql = `COPY ${table} (${columns.join(', ')}) FROM STDIN`;
  await pipeline(Readable.from(lines), client.query(copyStreams.from(sql)));
}

interface Person {
  id: string;
  email: string;
  name: string;
  organizationId: string;
  role: 'manager' | 'technician' | 'operator' | 'advisor';
}

function farmOf(n: number, machines: number, timeZone: string, label: string): BenchFarm {
  const id = randomUUID();
  return { id, name: label, timeZone, managerEmail: `manager-${n}@scale-bench.example`, machines };
}

/**
 * Runs `fn` with the foreign keys and secondary indexes of `table` set aside, then puts them back
 * from their own definitions (pg_constraint, pg_indexes): each foreign key is then checked once
 * for the whole table, not by a trigger per row (13× the cost of the row itself, measured), and
 * each index built in one sort. The primary key stays (other tables' foreign keys need it).
 */
async function withoutChecks(client: pg.Client, table: string, fn: () => Promise<void>) {
  const { rows: keys } = await client.query<{ name: string; def: string }>(
    `SELECT conname AS name, pg_get_constraintdef(oid) AS def FROM pg_constraint
     WHERE conrelid = to_regclass($1) AND contype = 'f'`,
    [table],
  );
  const { rows: indexes } = await client.query<{ name: string; def: string }>(
    `SELECT i.indexname AS name, i.indexdef AS def FROM pg_indexes i
     WHERE i.schemaname = current_schema() AND i.tablename = $1
       AND NOT EXISTS (SELECT 1 FROM pg_constraint c WHERE c.conindid = to_regclass(i.indexname))`,
    [table],
  );
  for (const k of keys) await client.query(`ALTER TABLE ${table} DROP CONSTRAINT ${k.name}`);
  for (const i of indexes) await client.query(`DROP INDEX ${i.name}`);
  try {
    await fn();
  } finally {
    for (const i of indexes) await client.query(i.def);
    for (const k of keys)
      await client.query(`ALTER TABLE ${table} ADD CONSTRAINT ${k.name} ${k.def}`);
  }
}

/**
 * The app's full summary of each machine's meter (summaryOf over every reading; the summary is
 * per meter since migration 0026), stored 100 machines at a time.
 */
async function summarise(machines: BenchMachine[], timeZoneOf: Map<string, string>) {
  for (let i = 0; i < machines.length; i += 100) {
    const chunk = machines.slice(i, i + 100);
    const org = chunk[0].organizationId;
    const ids = chunk.filter((m) => m.organizationId === org).map((m) => m.id);
    const readings = await sequelize.query<{
      meter_id: string;
      value: number | null;
      lifetime_value: number | null;
      taken_at: Date | null;
    }>(
      `SELECT mm.id AS meter_id, r.value, r.lifetime_value, r.taken_at FROM machine_meters mm
       LEFT JOIN meter_readings r ON r.organization_id = mm.organization_id AND r.meter_id = mm.id
       WHERE mm.organization_id = :org AND mm.machine_id IN (:ids)
       ORDER BY mm.id, r.taken_at, r.lifetime_value`,
      { replacements: { org, ids }, type: QueryTypes.SELECT },
    );
    const byMachine = new Map<string, { value: number; lifetimeValue: number; takenAt: Date }[]>();
    for (const r of readings) {
      if (!byMachine.has(r.meter_id)) byMachine.set(r.meter_id, []);
      if (r.taken_at === null) continue;
      byMachine.get(r.meter_id)!.push({
        value: Number(r.value),
        lifetimeValue: Number(r.lifetime_value),
        takenAt: new Date(r.taken_at),
      });
    }
    const timeZone = timeZoneOf.get(org)!;
    const summaries = new Map([...byMachine].map(([id, rs]) => [id, summaryOf(rs, timeZone)]));
    await storeForecasts(org, summaries, { timeZone });
    // a chunk that crossed into the next farm finishes there
    if (ids.length < chunk.length) i -= chunk.length - ids.length;
  }
}

/** Empties the database and writes the dealer group and the two large farms. */
export async function buildScaleData(
  databaseUrl: string,
  options: ScaleOptions = {},
): Promise<ScaleData> {
  const dealerFarms = options.dealerFarms ?? 200;
  const perFarm = options.machinesPerFarm ?? 25;
  const days = options.days ?? 730;
  const nowMs = Date.now();
  await sequelize.query('TRUNCATE organizations, users RESTART IDENTITY CASCADE');

  const farms = Array.from({ length: dealerFarms }, (_, i) =>
    farmOf(i + 1, perFarm, ZONES[i % ZONES.length], `Scale Farm ${String(i + 1).padStart(3, '0')}`),
  );
  const bigFarm = farmOf(9001, options.bigFarm ?? 5000, 'America/Chicago', 'Scale Estate 5000');
  const midFarm = farmOf(9002, options.midFarm ?? 500, 'America/Chicago', 'Scale Estate 500');
  const dealerId = randomUUID();
  const advisorEmail = 'advisor@scale-bench.example';

  const people: Person[] = [
    {
      id: randomUUID(),
      email: advisorEmail,
      name: 'Scale Advisor',
      organizationId: dealerId,
      role: 'advisor',
    },
  ];
  const machinesByFarm = new Map<string, BenchMachine[]>();
  let offset = 0;
  for (const [i, farm] of [...farms, bigFarm, midFarm].entries()) {
    machinesByFarm.set(farm.id, machinesOf(farm.id, farm.machines, offset));
    offset += farm.machines;
    const roles =
      i < farms.length
        ? (['manager', 'technician', 'operator'] as const)
        : (['manager', 'technician'] as const);
    for (const role of roles) {
      const email = role === 'manager' ? farm.managerEmail : `${role}-${i + 1}@scale-bench.example`;
      people.push({
        id: randomUUID(),
        email,
        name: `${role} ${i + 1}`,
        organizationId: farm.id,
        role,
      });
    }
  }
  const allMachines = [...machinesByFarm.values()].flat();
  const hash = bcrypt.hashSync(SCALE_PASSWORD, 4);
  const t0 = performance.now();
  const client = new pg.Client({ connectionString: databaseUrl });
  await client.connect();
  try {
    await copyInto(
      client,
      'organizations',
      ['id', 'name', 'kind', 'time_zone', 'units'],
      [
        copyLine([dealerId, 'Scale Dealer Group', 'dealer', 'America/Chicago', 'imperial']),
        ...[...farms, bigFarm, midFarm].map((f) =>
          copyLine([f.id, f.name, 'farm', f.timeZone, 'imperial']),
        ),
      ],
    );
    await copyInto(
      client,
      'users',
      ['id', 'email', 'name', 'password_hash'],
      people.map((p) => copyLine([p.id, p.email, p.name, hash])),
    );
    await copyInto(
      client,
      'memberships',
      ['organization_id', 'user_id', 'role'],
      people.map((p) => copyLine([p.organizationId, p.id, p.role])),
    );
    const acceptedAt = new Date(nowMs - 90 * 86_400_000);
    await copyInto(
      client,
      'dealer_links',
      [
        'dealer_organization_id',
        'farm_organization_id',
        'access',
        'status',
        'initiated_by',
        'accepted_at',
      ],
      farms.map((f, i) =>
        copyLine([dealerId, f.id, i % 2 ? 'view' : 'service', 'active', 'farm', acceptedAt]),
      ),
    );
    await copyInto(client, 'machines', MACHINE_COLUMNS, machineLines(allMachines));
    // each dealer farm's operator drives its first five machines
    const operators = people.filter((p) => p.role === 'operator');
    await copyInto(
      client,
      'machine_operators',
      ['organization_id', 'machine_id', 'user_id'],
      operators.flatMap((p) =>
        machinesByFarm
          .get(p.organizationId)!
          .slice(0, 5)
          .map((m) => copyLine([p.organizationId, m.id, p.id])),
      ),
    );
    await copyInto(client, 'service_tasks', TASK_COLUMNS, taskLines(allMachines, days, nowMs));
    await withoutChecks(client, 'meter_readings', () =>
      copyInto(client, 'meter_readings', READING_COLUMNS, readingLines(allMachines, days, nowMs)),
    );
  } finally {
    await client.end();
  }
  const copySeconds = (performance.now() - t0) / 1000;
  const t1 = performance.now();
  const timeZoneOf = new Map([...farms, bigFarm, midFarm].map((f) => [f.id, f.timeZone]));
  // two farms' worth at a time: the database and this process each keep a core busy
  const halves = [
    allMachines.slice(0, allMachines.length / 2),
    allMachines.slice(allMachines.length / 2),
  ];
  await Promise.all(halves.map((part) => summarise(part, timeZoneOf)));
  const summarySeconds = (performance.now() - t1) / 1000;
  // A live database is analysed by autovacuum; do it now so plans reflect the bulk load.
  await sequelize.query('VACUUM ANALYZE');
  return {
    dealer: { id: dealerId, advisorEmail, farms },
    bigFarm,
    midFarm,
    machines: allMachines.length,
    readings: allMachines.length * days,
    copySeconds,
    summarySeconds,
  };
}
