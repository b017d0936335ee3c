// `npm run db:reset`: wipes the development database and loads the demo scenario afresh.
// Uses DATABASE_URL when set; otherwise the project's dev cluster (stopped again afterwards if this
// script started it).
import { ensureDependencies } from './lib/setup.mjs';
import { log, warn } from './lib/common.mjs';
import { startPostgres } from './lib/postgres.mjs';
import { jwtSecret, runTsScript } from './lib/app.mjs';

const extraSeedArgs = process.argv.slice(2).filter((arg) => arg === '--allow-production');

async function main() {
  ensureDependencies();
  const postgres = await startPostgres({
    name: 'dev',
    port: process.env.PG_PORT,
    externalUrl: process.env.DATABASE_URL,
  });
  // The server's settings are validated as a whole, so the scripts need the secret too.
  const env = {
    ...process.env,
    NODE_ENV: process.env.NODE_ENV ?? 'development',
    DATABASE_URL: postgres.databaseUrl,
    JWT_SECRET: jwtSecret(),
  };
  try {
    await runTsScript('scripts/migrate.ts', [], env);
    await runTsScript('scripts/seed.ts', ['--reset', ...extraSeedArgs], env);
    log('db:reset: the demo scenario is loaded');
  } finally {
    await postgres.stop();
  }
}

main().catch((error) => {
  warn(`db:reset failed: ${error.message}`);
  process.exit(1);
});
