import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { randomUUID } from 'node:crypto';
import { QueryTypes, Sequelize } from 'sequelize';
import { env } from '../../server/env';
import { down, up } from '../../server/migrations/0026-machine-meters';

// Migration 0026 (several meters per machine) against rows written the old way — readings,
// a replacement, summaries and tasks bound to machines only — in a schema of its own with the
// columns and indexes the migration reads, so the test database's own tables are untouched.
// The expected values are the rows written below, counted by hand.

const schema = `meters_migration_${process.pid}`;
const db = new Sequelize(env.DATABASE_URL, {
  dialect: 'postgres',
  logging: false,
  pool: { max: 1 },
});
const qi = db.getQueryInterface();
const run = (fn: typeof up) => fn({ name: '0026-machine-meters', context: qi });

const org = randomUUID();
const tractor = randomUUID();
const truck = randomUUID();
const baler = randomUUID();

const rows = <T extends object = Record<string, unknown>>(sql: string) =>
  db.query<T>(sql, { type: QueryTypes.SELECT });

beforeAll(async () => {
  await db.query(`CREATE SCHEMA ${schema}`);
  await db.query(`SET search_path TO ${schema}`);
  await db.query(`
    CREATE TABLE organizations (id uuid PRIMARY KEY);
    CREATE TABLE machines (id uuid PRIMARY KEY, organization_id uuid NOT NULL REFERENCES organizations(id),
      meter_unit text NOT NULL DEFAULT 'h', created_at timestamptz NOT NULL DEFAULT now());
    CREATE TABLE meter_readings (id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
      organization_id uuid NOT NULL, machine_id uuid NOT NULL REFERENCES machines(id) ON DELETE CASCADE,
      value numeric(14,2) NOT NULL, lifetime_value numeric(14,2) NOT NULL, taken_at timestamptz NOT NULL);
    CREATE UNIQUE INDEX meter_readings_identity_key ON meter_readings (organization_id, machine_id, taken_at, value);
    CREATE TABLE meter_replacements (id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
      organization_id uuid NOT NULL, machine_id uuid NOT NULL REFERENCES machines(id) ON DELETE CASCADE,
      replaced_at timestamptz NOT NULL, old_final_value numeric(14,2) NOT NULL, new_start_value numeric(14,2) NOT NULL);
    CREATE INDEX meter_replacements_machine_idx ON meter_replacements (organization_id, machine_id, replaced_at);
    CREATE TABLE service_tasks (id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
      organization_id uuid NOT NULL, machine_id uuid NOT NULL REFERENCES machines(id) ON DELETE CASCADE,
      name text NOT NULL);
    CREATE TABLE machine_forecasts (machine_id uuid PRIMARY KEY REFERENCES machines(id) ON DELETE CASCADE,
      organization_id uuid NOT NULL, last_value numeric(14,2));
    INSERT INTO organizations VALUES ('${org}');
    INSERT INTO machines (id, organization_id, meter_unit) VALUES
      ('${tractor}', '${org}', 'h'), ('${truck}', '${org}', 'mi'), ('${baler}', '${org}', 'bales');
    INSERT INTO meter_readings (organization_id, machine_id, value, lifetime_value, taken_at)
    SELECT '${org}', '${tractor}', 100 + d * 5.25, 100 + d * 5.25, '2026-01-01'::timestamptz + d * interval '1 day'
    FROM generate_series(0, 99) AS d;
    INSERT INTO meter_readings (organization_id, machine_id, value, lifetime_value, taken_at) VALUES
      ('${org}', '${truck}', 41250.5, 41250.5, '2026-03-01T08:00Z'),
      ('${org}', '${baler}', 9800, 9800, '2026-06-01T08:00Z'),
      ('${org}', '${baler}', 20, 9820, '2026-06-02T08:00Z');
    INSERT INTO meter_replacements (organization_id, machine_id, replaced_at, old_final_value, new_start_value)
    VALUES ('${org}', '${baler}', '2026-06-01T12:00Z', 9800, 0);
    INSERT INTO service_tasks (organization_id, machine_id, name) VALUES
      ('${org}', '${tractor}', 'Engine oil'), ('${org}', '${tractor}', 'Air filter'),
      ('${org}', '${baler}', 'Knotters');
    INSERT INTO machine_forecasts VALUES ('${tractor}', '${org}', 619.75), ('${baler}', '${org}', 9820);
  `);
});

afterAll(async () => {
  await db.query(`DROP SCHEMA IF EXISTS ${schema} CASCADE`);
  await db.close();
});

describe('migration 0026 — several meters per machine', () => {
  it('up — each machine gets one primary meter from its meter unit', async () => {
    await run(up);
    const meters = await rows(
      `SELECT machine_id, kind, unit, is_primary FROM machine_meters ORDER BY kind`,
    );
    expect(meters).toEqual([
      { machine_id: baler, kind: 'bales', unit: 'bales', is_primary: true },
      { machine_id: tractor, kind: 'engine_hours', unit: 'h', is_primary: true },
      { machine_id: truck, kind: 'miles', unit: 'mi', is_primary: true },
    ]);
  });

  it('up — every reading is kept with its values and bound to its machine’s primary meter', async () => {
    const counts = await rows(
      `SELECT r.machine_id, count(*)::int AS n, sum(r.value)::text AS total,
              bool_and(m.machine_id = r.machine_id AND m.is_primary) AS bound
       FROM meter_readings r JOIN machine_meters m ON m.id = r.meter_id
       GROUP BY r.machine_id ORDER BY n DESC`,
    );
    // tractor: 100 readings 100 + d × 5.25 for d = 0…99: 100 × 100 + 5.25 × 4,950 = 35,987.50
    expect(counts).toEqual([
      { machine_id: tractor, n: 100, total: '35987.50', bound: true },
      { machine_id: baler, n: 2, total: '9820.00', bound: true },
      { machine_id: truck, n: 1, total: '41250.50', bound: true },
    ]);
    const [{ missing }] = await rows<{ missing: number }>(
      `SELECT count(*)::int AS missing FROM meter_readings WHERE meter_id IS NULL`,
    );
    expect(missing).toBe(0);
  });

  it('up — replacements (kind replacement), tasks and summaries are bound to the primary meter; the summary is keyed by meter', async () => {
    const replacements = await rows(
      `SELECT r.kind, r.old_final_value::text AS old, m.machine_id FROM meter_replacements r
       JOIN machine_meters m ON m.id = r.meter_id`,
    );
    expect(replacements).toEqual([{ kind: 'replacement', old: '9800.00', machine_id: baler }]);
    const tasks = await rows<{ n: number }>(
      `SELECT count(*)::int AS n FROM service_tasks t JOIN machine_meters m
         ON m.id = t.meter_id AND m.machine_id = t.machine_id AND m.is_primary`,
    );
    expect(tasks[0].n).toBe(3);
    const forecasts = await rows(
      `SELECT f.machine_id, f.last_value::text AS last FROM machine_forecasts f
       JOIN machine_meters m ON m.id = f.meter_id ORDER BY f.last_value`,
    );
    expect(forecasts).toEqual([
      { machine_id: tractor, last: '619.75' },
      { machine_id: baler, last: '9820.00' },
    ]);
    const [pk] = await rows<{ def: string }>(
      `SELECT pg_get_constraintdef(oid) AS def FROM pg_constraint
       WHERE conname = 'machine_forecasts_pkey' AND connamespace = '${schema}'::regnamespace`,
    );
    expect(pk.def).toBe('PRIMARY KEY (meter_id)');
  });

  it('up — a new machine gets its primary meter; a row without a meter id goes on the primary; a second primary is refused', async () => {
    const sprayer = randomUUID();
    await db.query(
      `INSERT INTO machines (id, organization_id, meter_unit) VALUES ('${sprayer}', '${org}', 'ha')`,
    );
    await db.query(`INSERT INTO meter_readings (organization_id, machine_id, value, lifetime_value, taken_at)
      VALUES ('${org}', '${sprayer}', 12, 12, now())`);
    const [row] = await rows(
      `SELECT m.kind, m.is_primary FROM meter_readings r JOIN machine_meters m ON m.id = r.meter_id
       WHERE r.machine_id = '${sprayer}'`,
    );
    expect(row).toEqual({ kind: 'hectares', is_primary: true });
    await expect(
      db.query(`INSERT INTO machine_meters (organization_id, machine_id, kind, unit, is_primary)
        VALUES ('${org}', '${sprayer}', 'acres', 'acres', true)`),
    ).rejects.toMatchObject({ parent: { constraint: 'machine_meters_primary_key' } });
    // a unit that does not follow from its kind
    await expect(
      db.query(`INSERT INTO machine_meters (organization_id, machine_id, kind, unit)
        VALUES ('${org}', '${sprayer}', 'pto_hours', 'km')`),
    ).rejects.toMatchObject({ parent: { constraint: 'machine_meters_unit_check' } });
    // another machine's meter
    const [tractorMeter] = await rows<{ id: string }>(
      `SELECT id FROM machine_meters WHERE machine_id = '${tractor}'`,
    );
    await expect(
      db.query(`INSERT INTO meter_readings (organization_id, machine_id, meter_id, value, lifetime_value, taken_at)
        VALUES ('${org}', '${sprayer}', '${tractorMeter.id}', 13, 13, now())`),
    ).rejects.toMatchObject({ parent: { constraint: 'meter_readings_meter_fkey' } });
    await db.query(`DELETE FROM machines WHERE id = '${sprayer}'`);
    const [{ n }] = await rows<{ n: number }>(`SELECT count(*)::int AS n FROM machine_meters`);
    expect(n).toBe(3);
  });

  it('down — gives back machine-bound rows with every reading', async () => {
    await run(down);
    const [{ n }] = await rows<{ n: number }>(`SELECT count(*)::int AS n FROM meter_readings`);
    expect(n).toBe(103);
    const columns = await rows<{ column_name: string }>(
      `SELECT column_name FROM information_schema.columns
       WHERE table_schema = '${schema}' AND table_name = 'meter_readings' ORDER BY column_name`,
    );
    expect(columns.map((c) => c.column_name)).not.toContain('meter_id');
    const [pk] = await rows<{ def: string }>(
      `SELECT pg_get_constraintdef(oid) AS def FROM pg_constraint
       WHERE conname = 'machine_forecasts_pkey' AND connamespace = '${schema}'::regnamespace`,
    );
    expect(pk.def).toBe('PRIMARY KEY (machine_id)');
  });
});
