// The reading-import benchmark's data set: one farm (America/Chicago, imperial) of machines with
// 10 service tasks each and one old reading each, written with COPY FROM STDIN; and the CSV a
// telematics export would give for them — one reading every 4 hours per machine, the rows in time
// order across machines, times in the farm's local time ("2025-03-01 07:12") as a spreadsheet
// saves them. The same rows are also given as COPY text for the baseline.
import { randomUUID } from 'node:crypto';
import { pipeline } from 'node:stream/promises';
import { Readable } from 'node:stream';
import pg from 'pg';
import copyStreams from 'pg-copy-streams';
import bcrypt from 'bcryptjs';
import { sequelize } from '../../server/db';
import { Membership, Organization, User } from '../../server/models';
import { refreshMachineForecast } from '../../server/services/forecast';

export const IMPORT_EMAIL = 'import-bench@bench.example';
export const IMPORT_PASSWORD = 'import-bench-password';
const HOUR_MS = 3_600_000;
const DAY_MS = 24 * HOUR_MS;
const STEP_MS = 4 * HOUR_MS;
const TIME_ZONE = 'America/Chicago';

export interface ImportFarm {
  orgId: string;
  userId: string;
  machines: { id: string; fleetNumber: string }[];
}

/** One COPY … FROM STDIN of text-format rows (tab-separated, \N for null). */
export async function copyText(client: pg.Client, sql: string, chunks: Iterable<string>) {
  await pipeline(Readable.from(chunks), client.query(copyStreams.from(sql)));
}

const tsv = (rows: unknown[][]) =>
  rows.map((r) => `${r.map((v) => (v === null ? '\\N' : String(v))).join('\t')}\n`).join('');

/** Empties the database and writes the farm: `count` machines, 10 tasks and one reading each. */
export async function buildImportFarm(databaseUrl: string, count: number): Promise<ImportFarm> {
  await sequelize.query('TRUNCATE organizations, users RESTART IDENTITY CASCADE');
  const org = await Organization.create({
    name: 'Import Bench Farm',
    kind: 'farm',
    timeZone: TIME_ZONE,
    units: 'imperial',
  });
  const user = await User.create({
    email: IMPORT_EMAIL,
    name: 'Bench',
    passwordHash: bcrypt.hashSync(IMPORT_PASSWORD, 4),
  });
  await Membership.create({ organizationId: org.id, userId: user.id, role: 'manager' });
  const machines = Array.from({ length: count }, (_, i) => ({
    id: randomUUID(),
    fleetNumber: `IB-${String(i + 1).padStart(3, '0')}`,
  }));
  const oldReading = new Date(Date.now() - 900 * DAY_MS).toISOString();
  const lastDone = new Date(Date.now() - 120 * DAY_MS).toISOString().slice(0, 10);
  const client = new pg.Client({ connectionString: databaseUrl });
  await client.connect();
  try {
    await copyText(
      client,
      'COPY machines (id, organization_id, fleet_number, name, category) FROM STDIN',
      [
        tsv(
          machines.map((m, i) => [
            m.id,
            org.id,
            m.fleetNumber,
            `Import machine ${i + 1}`,
            'tractor',
          ]),
        ),
      ],
    );
    const tasks = machines.flatMap((m) =>
      Array.from({ length: 10 }, (_, t) => [
        org.id,
        m.id,
        `Task ${t + 1}`,
        (t + 1) * 250,
        (t + 1) % 3 === 0 ? 365 : null,
        (t + 1) * 25,
        0,
        lastDone,
        t + 1,
      ]),
    );
    await copyText(
      client,
      `COPY service_tasks (organization_id, machine_id, name, interval_meter, interval_days,
         warn_meter, last_done_meter, last_done_on, position) FROM STDIN`,
      [tsv(tasks)],
    );
    await copyText(
      client,
      'COPY meter_readings (organization_id, machine_id, value, lifetime_value, taken_at, source) FROM STDIN',
      [tsv(machines.map((m) => [org.id, m.id, 0, 0, oldReading, 'manual']))],
    );
  } finally {
    await client.end();
  }
  for (const m of machines) await refreshMachineForecast(m.id, org.id);
  await sequelize.query('VACUUM ANALYZE');
  return { orgId: org.id, userId: user.id, machines };
}

const localParts = new Intl.DateTimeFormat('en-CA', {
  timeZone: TIME_ZONE,
  year: 'numeric',
  month: '2-digit',
  day: '2-digit',
  hour: '2-digit',
  minute: '2-digit',
  hourCycle: 'h23',
});

/** "2025-03-01 07:12" in the farm's time zone. */
function localText(ms: number) {
  const p = Object.fromEntries(localParts.formatToParts(ms).map((x) => [x.type, x.value]));
  return `${p.year}-${p.month}-${p.day} ${p.hour}:${p.minute}`;
}

export interface ImportFile {
  csv: string;
  /** the same rows as COPY text for meter_readings (organization_id … import_key) */
  copyRows: string[];
  rows: number;
}

/**
 * `rows` readings spread over the machines, one every 4 hours per machine ending yesterday; a
 * machine's meter runs 1.5 h in each 4-hour step. Times are whole minutes, so the CSV's local text
 * gives back the same instant.
 */
export function importFile(farm: ImportFarm, rows: number, userId: string): ImportFile {
  const perMachine = Math.ceil(rows / farm.machines.length);
  const endMs = Math.floor(Date.now() / DAY_MS) * DAY_MS - DAY_MS;
  const startMs = endMs - perMachine * STEP_MS;
  const lines = ['fleet number,taken at,value'];
  const copyRows: string[] = [];
  let n = 0;
  for (let step = 0; step < perMachine && n < rows; step++) {
    for (const [i, m] of farm.machines.entries()) {
      if (n >= rows) break;
      n++;
      const at = startMs + step * STEP_MS + i * 60_000;
      const value = (100 + step * 1.5).toFixed(1);
      lines.push(`${m.fleetNumber},${localText(at)},${value}`);
      copyRows.push(
        `${farm.orgId}\t${m.id}\t${value}\t${value}\t${new Date(at).toISOString()}\timport\t${userId}\tbench:${n + 1}\n`,
      );
    }
  }
  return { csv: `${lines.join('\n')}\n`, copyRows, rows: n };
}
