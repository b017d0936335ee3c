import type { RequestHandler } from 'express';
import { rateLimit, type Store, type Options, type ClientRateLimitInfo } from 'express-rate-limit';
import { sequelize } from '../db';
import { env } from '../env';
import { reserveAttempt, throttleKey, waitInWords } from '../services/sign-in-throttle';

// Counters live in PostgreSQL (an UNLOGGED table) so every API copy behind a load balancer
// shares them; the in-memory default would let each copy allow its own quota.
export class PostgresStore implements Store {
  windowMs = 60_000;
  constructor(public prefix: string) {}
  init(options: Options): void {
    this.windowMs = options.windowMs;
  }
  async increment(key: string): Promise<ClientRateLimitInfo> {
    const [rows] = (await sequelize.query(
      `INSERT INTO rate_limit_hits (key, hits, reset_at)
       VALUES (:key, 1, now() + make_interval(secs => :secs))
       ON CONFLICT (key) DO UPDATE SET
         hits = CASE WHEN rate_limit_hits.reset_at <= now() THEN 1 ELSE rate_limit_hits.hits + 1 END,
         reset_at = CASE WHEN rate_limit_hits.reset_at <= now() THEN EXCLUDED.reset_at ELSE rate_limit_hits.reset_at END
       RETURNING hits, reset_at`,
      { replacements: { key: this.prefix + key, secs: this.windowMs / 1000 } },
    )) as [{ hits: number; reset_at: Date }[], unknown];
    return { totalHits: rows[0].hits, resetTime: new Date(rows[0].reset_at) };
  }
  async decrement(key: string): Promise<void> {
    await sequelize.query(
      'UPDATE rate_limit_hits SET hits = GREATEST(hits - 1, 0) WHERE key = :key',
      {
        replacements: { key: this.prefix + key },
      },
    );
  }
  async resetKey(key: string): Promise<void> {
    await sequelize.query('DELETE FROM rate_limit_hits WHERE key = :key', {
      replacements: { key: this.prefix + key },
    });
  }
}

const windowMs = env.SIGN_IN_WINDOW_MINUTES * 60_000;

/**
 * Failed sign-ins per client address (a farm office shares one address: its people signing in
 * successfully never count). A refusal by the account delay below counts as a failure.
 */
export const signInPerAddress = rateLimit({
  windowMs,
  limit: env.SIGN_IN_LIMIT_PER_ADDRESS,
  skipSuccessfulRequests: true,
  standardHeaders: 'draft-8',
  legacyHeaders: false,
  store: new PostgresStore('signin:address:'),
  message: {
    error: {
      code: 'throttled',
      message: `Too many failed sign-ins from this address. Wait ${env.SIGN_IN_WINDOW_MINUTES} minutes and try again, or reset your password.`,
    },
  },
});

/**
 * The progressive delay of one account (services/sign-in-throttle.ts): 429 with Retry-After
 * while the account must wait, without looking at the password. The sign-in itself clears the
 * count when the password is right.
 */
export const signInAccountDelay: RequestHandler = async (req, res, next) => {
  const key = throttleKey(req.body?.email);
  // No e-mail at all: validation answers 400; there is no account to slow down.
  if (!key) return next();
  const wait = await reserveAttempt(key);
  if (!wait) return next();
  res
    .status(429)
    .set('Retry-After', String(wait.retryAfterSeconds))
    .json({
      error: {
        code: 'throttled',
        message: `Too many failed sign-ins for this account. Wait ${waitInWords(wait.retryAfterSeconds)} and try again, or reset your password.`,
      },
    });
};

const RESET_WINDOW_MINUTES = 60;
export const RESET_LIMIT_PER_ADDRESS = 10;
export const RESET_LIMIT_PER_EMAIL = 3;

const resetThrottled = (what: string) => ({
  error: {
    code: 'throttled',
    message: `Too many password reset requests ${what}. Wait an hour, or use the last link you were sent.`,
  },
});

/** Password-reset requests per client address (its own limit: never the sign-in one). */
export const resetPerAddress = rateLimit({
  windowMs: RESET_WINDOW_MINUTES * 60_000,
  limit: RESET_LIMIT_PER_ADDRESS,
  standardHeaders: 'draft-8',
  legacyHeaders: false,
  store: new PostgresStore('reset:address:'),
  message: resetThrottled('from this address'),
});

/** Password-reset requests per e-mail as typed (known or not: the answer is the same). */
export const resetPerEmail = rateLimit({
  windowMs: RESET_WINDOW_MINUTES * 60_000,
  limit: RESET_LIMIT_PER_EMAIL,
  standardHeaders: 'draft-8',
  legacyHeaders: false,
  keyGenerator: (req) => throttleKey(req.body?.email) || 'none',
  store: new PostgresStore('reset:email:'),
  message: resetThrottled('for this e-mail'),
});
