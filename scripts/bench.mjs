// `npm run bench [-- part …]`: starts a benchmark database on its own cluster (port BENCH_PG_PORT,
// default 54312; or BENCH_DATABASE_URL), migrates it, and runs each part scripts/bench/<part>.bench.ts
// in turn (all of them, or those named). Each part builds its own data set and prints one line per
// figure — `bench <name>: <value> <unit> | baseline <value> <unit> | ratio <r>` — against a
// baseline measured in the same run; the lines are also gathered in .data/bench/results.json.
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

ensureDependencies();
const outDir = path.join(dataDir, 'bench');
mkdirSync(outDir, { recursive: true });
const linesFile = path.join(outDir, 'figures.jsonl');
rmSync(linesFile, { force: true });

const postgres = await startPostgres({
  name: 'bench',
  port: process.env.BENCH_PG_PORT ?? 54312,
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
log(`\nbench: ${figures.length} figures on ${machine}; written to .data/bench/results.json`);
process.exit(code);
