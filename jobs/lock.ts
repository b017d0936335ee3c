import { QueryTypes } from 'sequelize';
import { sequelize } from '../server/db';

/**
 * Runs fn while holding a PostgreSQL advisory lock named `name`; when another worker holds it, skips
 * (returns null). Safe with any number of worker copies.
 */
export async function withJobLock<T>(name: string, fn: () => Promise<T>): Promise<T | null> {
  return sequelize.transaction(async (transaction) => {
    const [row] = await sequelize.query<{ locked: boolean }>(
      'SELECT pg_try_advisory_xact_lock(hashtext(:name)) AS locked',
      { replacements: { name: `hourstone:${name}` }, type: QueryTypes.SELECT, transaction },
    );
    if (!row.locked) return null;
    return fn();
  });
}
