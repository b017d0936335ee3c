// `npm run bench:forecast`: sets up a benchmark database on the test cluster (or BENCH_DATABASE_URL),
// migrates it, and runs scripts/bench/forecast.ts, which prints each figure as a ratio against a
// baseline measured in the same run.
import { ensureDependencies } from './lib/setup.mjs';
import { startPostgres } from './lib/postgres.mjs';
import { runTsScript, jwtSecret } from './lib/app.mjs';

ensureDependencies();
const postgres = await startPostgres({
  name: 'test',
  database: 'hourstone_bench',
  externalUrl: process.env.BENCH_DATABASE_URL,
});
const env = {
  ...process.env,
  DATABASE_URL: postgres.databaseUrl,
  JWT_SECRET: jwtSecret(),
  NODE_ENV: 'test',
  LOG_LEVEL: 'silent',
};
let code = 0;
try {
  await runTsScript('scripts/migrate.ts', [], env);
  await runTsScript('scripts/bench/forecast.ts', process.argv.slice(2), env);
} catch (error) {
  console.error(error.message);
  code = 1;
} finally {
  await postgres.stop();
}
process.exit(code);
