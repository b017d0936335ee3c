import { DatabaseError } from 'sequelize';

// PostgreSQL's answer to a value it cannot store: class 22 (data exception: a number past its
// column, NUL in text, a date out of range) and 54000 (a value too large for an index). The
// request schemas refuse such input first; this is the safety net that keeps a gap a 400.
const INPUT_ERROR_CODE = /^(22[0-9A-Z]{3}|54000)$/;

/** The PostgreSQL error code behind a Sequelize database error, if any. */
function postgresCode(err: unknown): string | undefined {
  if (!(err instanceof DatabaseError)) return undefined;
  const parent = (err as DatabaseError & { parent?: { code?: unknown } }).parent;
  return typeof parent?.code === 'string' ? parent.code : undefined;
}

/** True when the database refused a value the caller sent (out of range, malformed, too large). */
export function isInputRangeError(err: unknown): boolean {
  const code = postgresCode(err);
  return code !== undefined && INPUT_ERROR_CODE.test(code);
}

export const INPUT_RANGE_MESSAGE =
  'A value is outside what Hourstone can store (too large, too long or not a real date); nothing was saved.';
