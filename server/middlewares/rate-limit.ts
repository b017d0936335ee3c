import { rateLimit, type Store, type Options, type ClientRateLimitInfo } from 'express-rate-limit';
import { sequelize } from '../db';
import { env } from '../env';

// Counters live in PostgreSQL (an UNLOGGED table) so every API copy behind a load balancer
// shares them; the in-memory default would let each copy allow its own quota.
class PostgresStore implements Store {
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

const throttled = (what: string) => ({
  error: {
    code: 'throttled',
    message: `Too many sign-in attempts ${what}. Wait ${env.SIGN_IN_WINDOW_MINUTES} minutes and try again, or reset your password.`,
  },
});

const windowMs = env.SIGN_IN_WINDOW_MINUTES * 60_000;

/** Failed sign-ins per account (successful ones do not count). */
export const signInPerAccount = rateLimit({
  windowMs,
  limit: env.SIGN_IN_LIMIT_PER_ACCOUNT,
  skipSuccessfulRequests: true,
  standardHeaders: 'draft-8',
  legacyHeaders: false,
  keyGenerator: (req) =>
    String(req.body?.email ?? '')
      .trim()
      .toLowerCase() || 'none',
  store: new PostgresStore('signin:account:'),
  message: throttled('for this account'),
});

/** All sign-in attempts per client address. */
export const signInPerAddress = rateLimit({
  windowMs,
  limit: env.SIGN_IN_LIMIT_PER_ADDRESS,
  standardHeaders: 'draft-8',
  legacyHeaders: false,
  store: new PostgresStore('signin:address:'),
  message: throttled('from this address'),
});
