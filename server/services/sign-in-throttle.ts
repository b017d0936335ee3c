// Failed sign-ins slow one account down instead of locking it: the first few failures cost
// nothing, then each further attempt must wait (1 s, doubling, at most 15 minutes). A right
// password after the wait signs in and forgets the failures. The state is one row per e-mail as
// typed, in PostgreSQL, so every API copy shares it and unknown e-mails behave like known ones.
import { sequelize } from '../db';
import { env } from '../env';

export const FREE_FAILURES = env.SIGN_IN_LIMIT_PER_ACCOUNT;
export const FIRST_DELAY_SECONDS = 1;
export const MAX_DELAY_SECONDS = 15 * 60;
// Failures older than this (with no attempt since) are forgotten.
export const FORGET_AFTER_HOURS = 24;

/** The e-mail of a sign-in body as the throttle keys it (before validation: any input). */
export const throttleKey = (email: unknown) =>
  typeof email === 'string' ? email.trim().toLowerCase().slice(0, 320) : '';

/** "45 seconds", "3 minutes": how long to wait, in words. */
export function waitInWords(seconds: number): string {
  if (seconds < 90) return seconds === 1 ? '1 second' : `${seconds} seconds`;
  return `${Math.ceil(seconds / 60)} minutes`;
}

/** Seconds an account waits before its next attempt once it has `failures` failures. */
export function delayAfter(failures: number): number {
  if (failures < FREE_FAILURES) return 0;
  return Math.min(FIRST_DELAY_SECONDS * 2 ** (failures - FREE_FAILURES), MAX_DELAY_SECONDS);
}

// The delay of the new failure count, in SQL (constants only, no input).
const delaySql = (failures: string) =>
  `make_interval(secs => CASE WHEN ${failures} < ${FREE_FAILURES} THEN 0
     ELSE LEAST(${FIRST_DELAY_SECONDS} * power(2, ${failures} - ${FREE_FAILURES}), ${MAX_DELAY_SECONDS}) END)`;

const NEW_FAILURES = `CASE WHEN sign_in_throttle.forget_at <= now() THEN 1 ELSE sign_in_throttle.failures + 1 END`;

/**
 * Takes an attempt for the account. It counts as a failure (and pushes the next allowed attempt
 * back) until `forgetFailures` says it succeeded, so parallel guesses cannot slip through the
 * wait. Returns the seconds to wait when the account may not try yet (nothing is counted then).
 */
export async function reserveAttempt(key: string): Promise<{ retryAfterSeconds: number } | null> {
  const [rows] = (await sequelize.query(
    `INSERT INTO sign_in_throttle AS sign_in_throttle (key, failures, next_attempt_at, forget_at)
     VALUES (:key, 1, now() + ${delaySql('1')}, now() + make_interval(hours => ${FORGET_AFTER_HOURS}))
     ON CONFLICT (key) DO UPDATE SET
       failures = ${NEW_FAILURES},
       next_attempt_at = now() + ${delaySql(NEW_FAILURES)},
       forget_at = now() + make_interval(hours => ${FORGET_AFTER_HOURS})
     WHERE sign_in_throttle.next_attempt_at <= now() OR sign_in_throttle.forget_at <= now()
     RETURNING failures`,
    { replacements: { key } },
  )) as [{ failures: number }[], unknown];
  // Forgotten rows of e-mails nobody tries again are dropped now and then, not on every attempt.
  if (Math.random() < 0.01) {
    await sequelize.query('DELETE FROM sign_in_throttle WHERE forget_at < now()');
  }
  if (rows.length) return null;
  const [waiting] = (await sequelize.query(
    `SELECT GREATEST(1, ceil(extract(epoch FROM next_attempt_at - now())))::int AS seconds
     FROM sign_in_throttle WHERE key = :key`,
    { replacements: { key } },
  )) as [{ seconds: number }[], unknown];
  return { retryAfterSeconds: waiting[0]?.seconds ?? 1 };
}

/** The attempt succeeded: the account starts again with no failures. */
export async function forgetFailures(key: string): Promise<void> {
  await sequelize.query('DELETE FROM sign_in_throttle WHERE key = :key', {
    replacements: { key },
  });
}
