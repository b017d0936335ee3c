import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { randomUUID } from 'node:crypto';
import { QueryTypes, Sequelize } from 'sequelize';
import { env } from '../../server/env';
import { down, up } from '../../server/migrations/0016-money-minor-units';

// Migration 0016 against rows written the old way (decimal amounts), in a schema of its own with
// the columns the migration reads, so the test database's own tables are untouched.

const schema = `money_migration_${process.pid}`;
const db = new Sequelize(env.DATABASE_URL, {
  dialect: 'postgres',
  logging: false,
  pool: { max: 1 },
});
const qi = db.getQueryInterface();
const run = (fn: typeof up) => fn({ name: '0016-money-minor-units', context: qi });

const usd = randomUUID();
const jpy = randomUUID();
const kwd = randomUUID();
const ids = { tractor: randomUUID(), combine: randomUUID(), usdRecord: randomUUID() };
const ids2 = { jpyRecord: randomUUID(), kwdRecord: randomUUID() };

const rows = (sql: string) => db.query<Record<string, unknown>>(sql, { type: QueryTypes.SELECT });
type Lines = Record<string, unknown>[];
const recordOf = async (id: string) =>
  (
    await db.query<{ parts: Lines; fluids: Lines; other_costs: Lines }>(
      `SELECT parts, fluids, other_costs FROM service_records WHERE id = '${id}'`,
      { type: QueryTypes.SELECT },
    )
  )[0];

beforeAll(async () => {
  await db.query(`CREATE SCHEMA ${schema}`);
  await db.query(`SET search_path TO ${schema}`);
  await db.query(`
    CREATE TABLE organizations (id uuid PRIMARY KEY, currency text NOT NULL);
    CREATE TABLE machines (id uuid PRIMARY KEY, organization_id uuid NOT NULL,
      purchase_price numeric(12,2), list_price numeric(12,2));
    CREATE TABLE service_records (id uuid PRIMARY KEY, organization_id uuid NOT NULL,
      parts jsonb NOT NULL, fluids jsonb NOT NULL, other_costs jsonb NOT NULL);
    INSERT INTO organizations VALUES ('${usd}', 'USD'), ('${jpy}', 'JPY'), ('${kwd}', 'KWD');
    INSERT INTO machines VALUES ('${ids.tractor}', '${usd}', 182500.50, 214000),
      ('${ids.combine}', '${jpy}', 35000000, NULL);
    INSERT INTO service_records VALUES
      ('${ids.usdRecord}', '${usd}',
       '[{"partNumber":"OF-100","description":"Oil filter","quantity":1,"unitCost":18.4},
         {"partNumber":"SH-1","description":"","quantity":2,"unitCost":null}]',
       '[{"kind":"Engine oil","volume":18,"unit":"L","unitCost":6.1}]',
       '[{"description":"Rags","amount":0.1},{"description":"Tape","amount":0.2}]'),
      ('${ids2.jpyRecord}', '${jpy}', '[{"partNumber":"B-1","description":"","quantity":1,"unitCost":1500}]', '[]', '[]'),
      ('${ids2.kwdRecord}', '${kwd}', '[{"partNumber":"K-1","description":"","quantity":1,"unitCost":1.234}]', '[]', '[]');
  `);
});

afterAll(async () => {
  await db.query(`DROP SCHEMA IF EXISTS ${schema} CASCADE`);
  await db.close();
});

describe('migration 0016 — money to integer minor units', () => {
  it('up — machine prices become bigint minor units of each farm’s currency, the decimal columns go', async () => {
    await run(up);
    const machines = await rows(
      `SELECT id, purchase_price_minor, list_price_minor FROM machines ORDER BY purchase_price_minor`,
    );
    expect(machines.map((m) => [m.id, m.purchase_price_minor, m.list_price_minor])).toEqual([
      [ids.tractor, '18250050', '21400000'],
      [ids.combine, '35000000', null],
    ]);
    const columns = await rows(
      `SELECT column_name FROM information_schema.columns
       WHERE table_schema = '${schema}' AND table_name = 'machines' ORDER BY column_name`,
    );
    expect(columns.map((c) => c.column_name)).toEqual([
      'id',
      'list_price_minor',
      'organization_id',
      'purchase_price_minor',
    ]);
  });

  it('up — record lines keep every field and order; unit costs and amounts become …Minor, null stays null', async () => {
    expect(await recordOf(ids.usdRecord)).toEqual({
      parts: [
        { partNumber: 'OF-100', description: 'Oil filter', quantity: 1, unitCostMinor: 1840 },
        { partNumber: 'SH-1', description: '', quantity: 2, unitCostMinor: null },
      ],
      fluids: [{ kind: 'Engine oil', volume: 18, unit: 'L', unitCostMinor: 610 }],
      other_costs: [
        { description: 'Rags', amountMinor: 10 },
        { description: 'Tape', amountMinor: 20 },
      ],
    });
    expect((await recordOf(ids2.jpyRecord)).parts).toEqual([
      { partNumber: 'B-1', description: '', quantity: 1, unitCostMinor: 1500 },
    ]);
    expect((await recordOf(ids2.kwdRecord)).parts).toEqual([
      { partNumber: 'K-1', description: '', quantity: 1, unitCostMinor: 1234 },
    ]);
  });

  it('down — gives back the decimal amounts exactly as they were', async () => {
    await run(down);
    const machines = await rows(
      `SELECT purchase_price::text AS p, list_price::text AS l FROM machines ORDER BY purchase_price`,
    );
    expect(machines).toEqual([
      { p: '182500.50', l: '214000.00' },
      { p: '35000000.00', l: null },
    ]);
    const record = await recordOf(ids.usdRecord);
    expect(record.parts).toEqual([
      { partNumber: 'OF-100', description: 'Oil filter', quantity: 1, unitCost: 18.4 },
      { partNumber: 'SH-1', description: '', quantity: 2, unitCost: null },
    ]);
    expect(record.fluids).toEqual([{ kind: 'Engine oil', volume: 18, unit: 'L', unitCost: 6.1 }]);
    expect(record.other_costs).toEqual([
      { description: 'Rags', amount: 0.1 },
      { description: 'Tape', amount: 0.2 },
    ]);
    expect((await recordOf(ids2.kwdRecord)).parts[0]).toMatchObject({ unitCost: 1.234 });
  });
});
