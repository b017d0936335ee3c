import { z } from 'zod';

// The environment, validated once at start. Every variable is documented in .env.example.

// A connection string that may be left empty (as .env.example lists it) to mean "not set".
const optionalUrl = z
  .string()
  .optional()
  .transform((v) => (v?.trim() ? v.trim() : undefined));

const fields = z.object({
  NODE_ENV: z.enum(['development', 'test', 'production']).default('development'),
  HOST: z.string().default('127.0.0.1'),
  PORT: z.coerce.number().int().positive().default(4310),
  APP_URL: z.string().url().default('http://127.0.0.1:4310'),
  DATABASE_URL: z.string().min(1, 'DATABASE_URL is required (npm start sets it up)'),
  DATABASE_POOL_MAX: z.coerce.number().int().positive().default(10),
  // Straight to PostgreSQL, for what a transaction pooler (pgbouncer, pool_mode = transaction)
  // cannot carry: the worker's LISTEN for new outbox mail. Unset or empty: DATABASE_URL.
  DATABASE_DIRECT_URL: optionalUrl,
  // A read replica for the read-only reports (the dealer board, the farm export), which may then
  // be a few seconds behind. Unset or empty: they read DATABASE_URL like everything else.
  DATABASE_READ_URL: optionalUrl,
  SMTP_URL: z.string().default('smtp://127.0.0.1:2525'),
  MAIL_FROM: z.string().default('Hourstone <no-reply@hourstone.example>'),
  MAIL_CATCHER_URL: z.string().default(''),
  // A hung mail server must fail a delivery attempt within seconds (nodemailer waits minutes).
  SMTP_CONNECTION_TIMEOUT_MS: z.coerce.number().int().min(100).max(600_000).default(5000),
  SMTP_GREETING_TIMEOUT_MS: z.coerce.number().int().min(100).max(600_000).default(5000),
  SMTP_SOCKET_TIMEOUT_MS: z.coerce.number().int().min(100).max(600_000).default(10_000),
  // How long a worker's claim on a message lasts; keep it well above the timeouts above.
  MAIL_CLAIM_LEASE_SECONDS: z.coerce.number().int().min(10).max(86_400).default(120),
  // Signs session tokens and feed/unsubscribe links: at least 32 bytes outside development and
  // test (checked below); `npm start` generates one into .data/secrets.json when unset.
  JWT_SECRET: z.string({ error: 'JWT_SECRET is required (npm start generates one when unset)' }),
  // bcrypt cost of stored passwords (and of the dummy compared for unknown e-mails); 4 in tests.
  BCRYPT_ROUNDS: z.coerce.number().int().min(4).max(15).optional(),
  SESSION_TTL_HOURS: z.coerce.number().positive().default(12),
  COOKIE_SECURE: z.enum(['auto', 'true', 'false']).default('auto'),
  CSP_UPGRADE_INSECURE: z.enum(['true', 'false']).default('false'),
  TRUST_PROXY: z.string().default('loopback'),
  SERVE_CLIENT: z.enum(['0', '1']).default('0'),
  // the built client, relative to the project (test slots build their own: dist-test-N)
  CLIENT_DIST: z
    .string()
    .regex(/^dist(-test-\d)?$/, { error: 'CLIENT_DIST must be dist or dist-test-<slot>' })
    .default('dist'),
  // open: anyone may sign up and create a farm or dealer; closed: only invitations and
  // `npm run org:create` bring people in.
  SIGNUP: z.enum(['open', 'closed']).default('open'),
  SIGN_IN_LIMIT_PER_ACCOUNT: z.coerce.number().int().positive().default(5),
  SIGN_IN_LIMIT_PER_ADDRESS: z.coerce.number().int().positive().default(30),
  SIGN_IN_WINDOW_MINUTES: z.coerce.number().positive().default(15),
  S3_ENDPOINT: z.string().default('http://127.0.0.1:4568'),
  S3_REGION: z.string().default('us-east-1'),
  S3_BUCKET: z.string().min(1).default('hourstone'),
  S3_ACCESS_KEY_ID: z.string().default('S3RVER'),
  S3_SECRET_ACCESS_KEY: z.string().default('S3RVER'),
  S3_FORCE_PATH_STYLE: z.enum(['true', 'false']).default('true'),
  LOG_LEVEL: z.enum(['fatal', 'error', 'warn', 'info', 'debug', 'trace', 'silent']).default('info'),
});

// A guessable secret lets anyone forge a session: 32 bytes at least wherever real people sign in.
const jwtSecretMinBytes = (nodeEnv: string) => (nodeEnv === 'production' ? 32 : 8);

const schema = fields.superRefine((value, ctx) => {
  const bytes = Buffer.byteLength(value.JWT_SECRET, 'utf8');
  const min = jwtSecretMinBytes(value.NODE_ENV);
  if (bytes < min) {
    ctx.addIssue({
      code: 'custom',
      path: ['JWT_SECRET'],
      message: `JWT_SECRET must be at least ${min} bytes${value.NODE_ENV === 'production' ? ' outside development and test' : ''} (it has ${bytes}); generate one with \`openssl rand -base64 48\`, or leave it unset for \`npm start\` to generate and keep one`,
    });
  }
});

export type Env = z.infer<typeof schema>;

function loadEnv(): Env {
  const parsed = schema.safeParse(process.env);
  if (!parsed.success) {
    const lines = parsed.error.issues.map((i) => `  ${i.path.join('.')}: ${i.message}`);
    throw new Error(`Invalid environment:\n${lines.join('\n')}`);
  }
  return parsed.data;
}

export const env = loadEnv();

/**
 * Where each kind of database connection goes: `main` for everything, `direct` for the outbox
 * LISTEN (which a transaction pooler cannot carry), `read` for the read-only reports (null: main).
 */
export function databaseTargets(e: {
  DATABASE_URL: string;
  DATABASE_DIRECT_URL?: string;
  DATABASE_READ_URL?: string;
}) {
  return {
    main: e.DATABASE_URL,
    direct: e.DATABASE_DIRECT_URL ?? e.DATABASE_URL,
    read: e.DATABASE_READ_URL ?? null,
  };
}
export const isProduction = env.NODE_ENV === 'production';
