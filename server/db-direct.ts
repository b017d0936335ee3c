// One statement sent straight to the pg connection of a Sequelize transaction. Sequelize's own
// query path costs about 0.3 ms of CPU per statement (measured by `npm run bench -- readings`:
// `SELECT 1` through it against pg alone), more than the reading post's statements themselves,
// so the post's hot statements go this way. Errors come back as Sequelize's, so the error
// middleware treats them as any other database error.
import { DatabaseError, QueryTypes, UniqueConstraintError, type Transaction } from 'sequelize';
import type { ClientBase } from 'pg';
import { sequelize } from './db';

/** Rows of `text` with `$1…` values, in `transaction` (or through Sequelize without one). */
export async function directQuery<T extends object>(
  transaction: Transaction | null | undefined,
  text: string,
  values: unknown[],
): Promise<T[]> {
  const connection = (transaction as unknown as { connection?: ClientBase } | undefined)
    ?.connection;
  if (!connection) {
    return sequelize.query<T & object>(text, {
      bind: values,
      type: QueryTypes.SELECT,
      transaction,
    });
  }
  // Sequelize's logging option sees these statements too (tests and the bench count statements)
  const log = (sequelize as unknown as { options: { logging?: unknown } }).options.logging;
  if (typeof log === 'function') log(`Executing (direct): ${text}`);
  try {
    return (await connection.query(text, values)).rows as T[];
  } catch (err) {
    const parent = Object.assign(err as Error, { sql: text });
    if ((err as { code?: string }).code === '23505') throw new UniqueConstraintError({ parent });
    throw new DatabaseError(parent as never);
  }
}
