// A copy of every table's rows in memory, put back in a few statements: tests that need the same
// rich world many times (the fuzz, once per route) build it once and restore it, instead of
// building it again through the API each time.
import { QueryTypes } from 'sequelize';
import { sequelize } from '../../server/db';
import { resetDatabase } from './db';

interface TableCopy {
  table: string;
  /** columns that may be written (generated columns are left to PostgreSQL) */
  columns: string[];
  rows: string;
}

export type DatabaseSnapshot = TableCopy[];

/** Tables with the tables they reference first, so rows can go back without breaking a key. */
async function tablesInKeyOrder(): Promise<string[]> {
  const tables = (
    await sequelize.query<{ tablename: string }>(
      `SELECT tablename FROM pg_tables WHERE schemaname = 'public' AND tablename <> 'schema_migrations' ORDER BY tablename`,
      { type: QueryTypes.SELECT },
    )
  ).map((r) => r.tablename);
  const edges = await sequelize.query<{ child: string; parent: string }>(
    `SELECT conrelid::regclass::text AS child, confrelid::regclass::text AS parent
     FROM pg_constraint WHERE contype = 'f' AND connamespace = 'public'::regnamespace`,
    { type: QueryTypes.SELECT },
  );
  const parents = new Map(tables.map((t) => [t, new Set<string>()]));
  for (const e of edges) if (e.child !== e.parent) parents.get(e.child)?.add(e.parent);
  const ordered: string[] = [];
  const placed = new Set<string>();
  while (ordered.length < tables.length) {
    const ready = tables.filter(
      (t) => !placed.has(t) && [...parents.get(t)!].every((p) => placed.has(p)),
    );
    if (!ready.length) throw new Error('foreign keys form a cycle: cannot order the tables');
    for (const t of ready) {
      ordered.push(t);
      placed.add(t);
    }
  }
  return ordered;
}

/** Every row of every table (but the migration log). */
export async function snapshotDatabase(): Promise<DatabaseSnapshot> {
  const columns = await sequelize.query<{ table_name: string; column_name: string }>(
    `SELECT table_name, column_name FROM information_schema.columns
     WHERE table_schema = 'public' AND is_generated = 'NEVER' ORDER BY ordinal_position`,
    { type: QueryTypes.SELECT },
  );
  const copies: DatabaseSnapshot = [];
  for (const table of await tablesInKeyOrder()) {
    const [{ rows }] = await sequelize.query<{ rows: string }>(
      `SELECT coalesce(json_agg(t), '[]')::text AS rows FROM "${table}" t`,
      { type: QueryTypes.SELECT },
    );
    const cols = columns.filter((c) => c.table_name === table).map((c) => `"${c.column_name}"`);
    copies.push({ table, columns: cols, rows });
  }
  return copies;
}

/**
 * The first transaction id not yet given out. Every write takes one, so while it stays the same
 * nothing has been written anywhere in the cluster.
 */
export async function nextTransactionId(): Promise<string> {
  const [row] = await sequelize.query<{ x: string }>(
    'SELECT pg_snapshot_xmax(pg_current_snapshot())::text AS x',
    { type: QueryTypes.SELECT },
  );
  return row.x;
}

/** The snapshot last put back, and the next transaction id right after. */
let restored: { snapshot: DatabaseSnapshot; xid: string } | null = null;

/**
 * Empties the database and puts the snapshot's rows back, in one transaction; each sequence
 * then continues after the largest id put back (the reset restarts them at 1). Nothing is done
 * when this snapshot was the last put back and nothing has been written since.
 */
export async function restoreDatabase(snapshot: DatabaseSnapshot): Promise<void> {
  if (restored?.snapshot === snapshot && restored.xid === (await nextTransactionId())) return;
  await resetDatabase();
  await sequelize.transaction(async (transaction) => {
    for (const { table, columns, rows } of snapshot) {
      if (rows === '[]') continue;
      const list = columns.join(', ');
      // the rows go back as they were: the tables' own triggers (a new machine adds its primary
      // meter, migration 0026) would add rows the snapshot already holds
      await sequelize.query(`ALTER TABLE "${table}" DISABLE TRIGGER USER`, { transaction });
      await sequelize.query(
        `INSERT INTO "${table}" (${list}) SELECT ${list} FROM json_populate_recordset(NULL::"${table}", :rows)`,
        { replacements: { rows }, transaction },
      );
      await sequelize.query(`ALTER TABLE "${table}" ENABLE TRIGGER USER`, { transaction });
    }
    const owned = await sequelize.query<{ seq: string; tbl: string; col: string }>(
      `SELECT s.relname AS seq, t.relname AS tbl, a.attname AS col
       FROM pg_class s
       JOIN pg_depend d ON d.objid = s.oid AND d.deptype IN ('a', 'i')
       JOIN pg_class t ON t.oid = d.refobjid
       JOIN pg_attribute a ON a.attrelid = t.oid AND a.attnum = d.refobjsubid
       WHERE s.relkind = 'S' AND s.relnamespace = 'public'::regnamespace`,
      { type: QueryTypes.SELECT, transaction },
    );
    for (const { seq, tbl, col } of owned)
      await sequelize.query(
        `SELECT setval('"${seq}"', coalesce((SELECT max("${col}") FROM "${tbl}"), 0) + 1, false)`,
        { transaction },
      );
  });
  restored = { snapshot, xid: await nextTransactionId() };
}
