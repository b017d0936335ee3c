// A second app for the browser tests that must start from nothing: the API with NODE_ENV=production
// serving the built client, and a worker delivering its mail, on a fresh, empty, migrated database
// of the test cluster that `npm test` started. Mail goes to the same mail catcher and files to the
// same fake S3 as the main test server's. The database needs the cluster's superuser to be
// recreated, so only the cluster npm test starts itself will do (not a TEST_DATABASE_URL).
import { randomBytes } from 'node:crypto';
import { runTsScript, startApi, tsx } from '../../../scripts/lib/app.mjs';
import { startPostgres } from '../../../scripts/lib/postgres.mjs';
import { startService, stopAll, type Service } from '../../../scripts/lib/processes.mjs';

const slot = Number(process.env.HOURSTONE_TEST_SLOT ?? 0);

/** True when the test cluster is npm test's own, so that a database can be recreated on it. */
export const canStartProductionServer = !process.env.TEST_DATABASE_URL;

/** Beside the slot's main test API (4311 + 10 × slot), in the slot's own range of ports. */
export const PRODUCTION_PORT = 4315 + slot * 10;

export interface ProductionServer {
  baseUrl: string;
  stop(): Promise<void>;
}

/**
 * Recreates `database` empty on the test cluster, migrates it and starts the production API and
 * a mail-delivering worker on it; resolves once the API answers its health check.
 */
export async function startProductionServer(database: string): Promise<ProductionServer> {
  const testDatabaseUrl = process.env.DATABASE_URL;
  if (!testDatabaseUrl || !process.env.SMTP_URL) {
    throw new Error('DATABASE_URL and SMTP_URL are not set: run the browser tests with `npm test`');
  }
  const cluster = await startPostgres({
    name: slot ? `test-${slot}` : 'test',
    port: new URL(testDatabaseUrl).port,
  });
  cluster.recreateDatabase(database);
  const databaseUrl = new URL(testDatabaseUrl);
  databaseUrl.pathname = `/${database}`;

  const baseUrl = `http://127.0.0.1:${PRODUCTION_PORT}`;
  const env: NodeJS.ProcessEnv = {
    ...process.env,
    NODE_ENV: 'production',
    DATABASE_URL: databaseUrl.toString(),
    APP_URL: baseUrl,
    // production refuses a secret under 32 bytes; a fresh one per run, as an operator would set
    JWT_SECRET: randomBytes(48).toString('base64url'),
    SERVE_CLIENT: '1',
    LOG_LEVEL: 'warn',
  };
  // What npm test sets for its own server only: response checks, the caught-mail page's source
  // and the cheap test bcrypt cost. Production runs without them.
  delete env.VALIDATE_RESPONSES;
  delete env.MAIL_CATCHER_URL;
  delete env.BCRYPT_ROUNDS;
  delete env.E2E_BASE_URL;

  const services: Service[] = [];
  try {
    await runTsScript('scripts/migrate.ts', [], env);
    await startApi({
      env,
      port: PRODUCTION_PORT,
      services,
      onExit: (code, signal) =>
        console.warn(`[api] the production server exited (${signal ?? code})`),
    });
    // Only mail delivery, as beside the main test server: no digest lands in the middle of a test.
    services.push(
      startService('worker', tsx, ['jobs/index.ts'], {
        env: { ...env, WORKER_JOBS: 'deliver-mail' },
        onExit: (code, signal) =>
          console.warn(`[worker] the production worker exited (${signal ?? code})`),
      }),
    );
  } catch (error) {
    await stopAll(services);
    throw error;
  }
  return { baseUrl, stop: () => stopAll(services) };
}
