import { sequelize } from '../../server/db';

if (!process.env.DATABASE_URL) {
  throw new Error(
    'DATABASE_URL is not set: run the tests with `npm test`, which sets up the test database.',
  );
}

/** Empties every table but the migration log, between tests. */
export async function resetDatabase(): Promise<void> {
  const [rows] = (await sequelize.query(
    `SELECT tablename FROM pg_tables WHERE schemaname = 'public' AND tablename <> 'schema_migrations'`,
  )) as [{ tablename: string }[], unknown];
  if (!rows.length) return;
  await sequelize.query(
    `TRUNCATE ${rows.map((r) => `"${r.tablename}"`).join(', ')} RESTART IDENTITY CASCADE`,
  );
}

export async function countRows(table: string): Promise<number> {
  const [rows] = (await sequelize.query(`SELECT count(*)::int AS n FROM "${table}"`)) as [
    { n: number }[],
    unknown,
  ];
  return rows[0].n;
}
