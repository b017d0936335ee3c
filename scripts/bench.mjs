// `npm run bench [-- part …]`: starts a benchmark database on its own cluster (port BENCH_PG_PORT,
// default 54312; or BENCH_DATABASE_URL), migrates it, and runs each part scripts/bench/<part>.bench.ts
// in turn (all of them, or those named). Each part builds its own data set and prints one line per
// figure — `bench <name>: <value> <unit> | baseline <value> <unit> | ratio <r>` — against a
// baseline measured in the same run; the lines are also gathered in .data/bench/results.json.
// HOURSTONE_TEST_SLOT=N (1-9) gives a run its own cluster (bench-N, port 54312 + 10·N) and
// results folder (.data/bench-N), so runs sharing a checkout never drop each other's database.
// The client part (`npm run bench:client`) builds the production client into the slot's folder
// (dist, dist-test-N) and drives chromium (CHROMIUM_PATH, default /usr/bin/chromium).
import { existsSync, mkdirSync, readdirSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { ensureDependencies } from './lib/setup.mjs';
import { startPostgres } from './lib/postgres.mjs';
import { runTsScript, jwtSecret } from './lib/app.mjs';
import { dataDir, log, projectRoot } from './lib/common.mjs';

const BENCH_DIR = path.join(projectRoot, 'scripts', 'bench');
const parts = readdirSync(BENCH_DIR)
  .filter((f) => f.endsWith('.bench.ts'))
  .map((f) => f.replace(/\.bench\.ts$/, ''))
  .sort();
const asked = process.argv.slice(2).filter((a) => !a.startsWith('-'));
const options = process.argv.slice(2).filter((a) => a.startsWith('-'));
const unknown = asked.filter((a) => !parts.includes(a));
if (unknown.length) {
  console.error(`no such benchmark part: ${unknown.join(', ')} (parts: ${parts.join(', ')})`);
  process.exit(2);
}
const chosen = asked.length ? asked : parts;

const SLOT = Number(process.env.HOURSTONE_TEST_SLOT ?? 0);
if (!Number.isInteger(SLOT) || SLOT < 0 || SLOT > 9) {
  console.error(`HOURSTONE_TEST_SLOT must be a whole number from 0 to 9 (got ${SLOT})`);
  process.exit(2);
}
const slotSuffix = SLOT === 0 ? '' : `-${SLOT}`;

ensureDependencies();
const outDir = path.join(dataDir, `bench${slotSuffix}`);
mkdirSync(outDir, { recursive: true });
const linesFile = path.join(outDir, 'figures.jsonl');
rmSync(linesFile, { force: true });

const postgres = await startPostgres({
  name: `bench${slotSuffix}`,
  port: process.env.BENCH_PG_PORT ?? 54312 + SLOT * 10,
  database: 'hourstone_bench',
  externalUrl: process.env.BENCH_DATABASE_URL,
});
const env = {
  ...process.env,
  DATABASE_URL: postgres.databaseUrl,
  JWT_SECRET: jwtSecret(),
  NODE_ENV: 'test',
  LOG_LEVEL: 'silent',
  BENCH_JSON: linesFile,
};
let code = 0;
try {
  if (!postgres.external) postgres.recreateDatabase('hourstone_bench');
  await runTsScript('scripts/migrate.ts', [], env);
  for (const part of chosen) {
    log(`\n=== bench part: ${part} ===`);
    await runTsScript(`scripts/bench/${part}.bench.ts`, options, env);
  }
} catch (error) {
  console.error(error.message);
  code = 1;
} finally {
  await postgres.stop();
}
const figures = existsSync(linesFile)
  ? readFileSync(linesFile, 'utf8')
      .trim()
      .split('\n')
      .filter(Boolean)
      .map((l) => JSON.parse(l))
  : [];
const machine = `${os.cpus().length} × ${os.cpus()[0]?.model ?? 'cpu'}, ${Math.round(os.totalmem() / 2 ** 30)} GiB, Node ${process.version}`;
writeFileSync(
  path.join(outDir, 'results.json'),
  `${JSON.stringify({ ranAt: new Date().toISOString(), machine, parts: chosen, figures }, null, 2)}\n`,
);
log(
  `\nbench: ${figures.length} figures on ${machine}; written to .data/bench${slotSuffix}/results.json`,
);
process.exit(code);
