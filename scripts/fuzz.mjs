// `npm run fuzz`: sets up a fuzz database on the test cluster of this slot (HOURSTONE_TEST_SLOT,
// as `npm test`; or FUZZ_DATABASE_URL), migrates it, and runs scripts/fuzz.ts: 1,000 generated
// bad bodies per write route, a per-route table, non-zero exit on any 5xx.
//   npm run fuzz -- --bodies=200 --route=machines --seed=42
import { ensureDependencies } from './lib/setup.mjs';
import { startPostgres } from './lib/postgres.mjs';
import { runTsScript, jwtSecret } from './lib/app.mjs';

const SLOT = Number(process.env.HOURSTONE_TEST_SLOT ?? 0);
if (!Number.isInteger(SLOT) || SLOT < 0 || SLOT > 9) {
  throw new Error(`HOURSTONE_TEST_SLOT must be a whole number from 0 to 9 (got ${SLOT})`);
}

ensureDependencies();
const postgres = await startPostgres({
  name: SLOT === 0 ? 'test' : `test-${SLOT}`,
  port: 54311 + SLOT * 10,
  database: 'hourstone_fuzz',
  externalUrl: process.env.FUZZ_DATABASE_URL,
});
if (!postgres.external) postgres.recreateDatabase('hourstone_fuzz');
const env = {
  ...process.env,
  DATABASE_URL: postgres.databaseUrl,
  JWT_SECRET: jwtSecret(),
  NODE_ENV: 'test',
  LOG_LEVEL: 'silent',
  // nothing listens here: a request that tried to send mail itself would fail, not hang
  SMTP_URL: 'smtp://127.0.0.1:9',
};
let code = 0;
try {
  await runTsScript('scripts/migrate.ts', [], env);
  await runTsScript('scripts/fuzz.ts', process.argv.slice(2), env);
} catch (error) {
  console.error(error.message);
  code = 1;
} finally {
  await postgres.stop();
}
process.exit(code);
