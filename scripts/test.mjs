// `npm test`: every check of the project, runnable on a fresh clone with only Node.js and npm
// (CI=true, no terminal). Type check, lint and build; then the unit and API tests against a
// private PostgreSQL test cluster and the mail catcher; then the browser tests in chromium against
// the built app. Ends with one line, `N passed, N failed`.
//
//   npm test                       everything
//   npm test -- --unit-only        only the unit/API tests (no type check, lint, build or browser)
//   npm test -- tests/shared       vitest file filters; browser tests run only for a filter naming e2e
// Options for vitest must use the --name=value form (a bare value would be taken as a filter).
import { existsSync, mkdirSync, rmSync } from 'node:fs';
import path from 'node:path';
import { ensureDependencies } from './lib/setup.mjs';
import { bin, isRoot, log, projectRoot, warn } from './lib/common.mjs';
import { startPostgres } from './lib/postgres.mjs';
import { runCommand, startService, stopAll } from './lib/processes.mjs';
import { runTsScript, startApi, startFakeS3, startMailCatcher, tsx } from './lib/app.mjs';
import { addCounts, countVitestReport, exitCodeFor, summaryLine } from './lib/report.mjs';

// HOURSTONE_TEST_SLOT=N (1-9) lets several test runs share one checkout: each slot has its own
// ports, PostgreSQL cluster, object-store folder, client build (dist-test-N) and reports. Slot 0
// (unset) is what CI runs.
const SLOT = Number(process.env.HOURSTONE_TEST_SLOT ?? 0);
if (!Number.isInteger(SLOT) || SLOT < 0 || SLOT > 9) {
  throw new Error(`HOURSTONE_TEST_SLOT must be a whole number from 0 to 9 (got ${SLOT})`);
}
const slotSuffix = SLOT === 0 ? '' : `-${SLOT}`;
// A slot builds the client into its own folder, so runs sharing a checkout never serve each
// other's half-written build.
const CLIENT_DIST = SLOT === 0 ? 'dist' : `dist-test${slotSuffix}`;
const TEST_API_PORT = 4311 + SLOT * 10;
const TEST_SMTP_PORT = 2527 + SLOT * 10;
const TEST_CATCHER_PORT = 2528 + SLOT * 10;
const TEST_S3_PORT = 4570 + SLOT * 10;
const TEST_PG_PORT = 54311 + SLOT * 10;
const REPORTS_DIR = path.join(projectRoot, 'tests', `.reports${slotSuffix}`);
const UNIT_REPORT = path.join(REPORTS_DIR, 'unit.json');
const E2E_REPORT = path.join(REPORTS_DIR, 'e2e.json');
const CHROMIUM_CANDIDATES = ['/usr/bin/chromium', '/usr/bin/chromium-browser'];

const args = process.argv.slice(2);
const unitOnly = args.includes('--unit-only');
const vitestArgs = args.filter((arg) => arg !== '--unit-only');
const filters = vitestArgs.filter((arg) => !arg.startsWith('-'));
const options = vitestArgs.filter((arg) => arg.startsWith('-'));
const isE2eFilter = (filter) => filter.includes('e2e');
const unitFilters = filters.filter((filter) => !isE2eFilter(filter));
const e2eFilters = filters.filter(isE2eFilter);
const runUnit = filters.length === 0 || unitFilters.length > 0;
const runE2e = !unitOnly && (filters.length === 0 || e2eFilters.length > 0);

const baseEnv = { ...process.env, NO_COLOR: '1', CLIENT_DIST };
delete baseEnv.FORCE_COLOR;

const services = [];
let postgres;
const parts = [];

/** Records one part's count under a label for the closing summary. */
function record(label, count) {
  parts.push({ label, ...count });
  return count;
}

function section(title) {
  log(`\n=== ${title} ===`);
}

async function runCheck(script, extraArgs = []) {
  section(`npm run ${script}`);
  const started = Date.now();
  const args = extraArgs.length ? ['run', script, '--', ...extraArgs] : ['run', script];
  const code = await runCommand('npm', args, { env: baseEnv });
  const seconds = ((Date.now() - started) / 1000).toFixed(1);
  log(`${script}: ${code === 0 ? 'passed' : `FAILED (exit ${code})`} in ${seconds} s`);
  record(
    script,
    code === 0
      ? { passed: 1, failed: 0 }
      : { passed: 0, failed: 1, problems: [`${script} failed`] },
  );
}

async function runVitest(label, report, extraArgs, env) {
  rmSync(report, { force: true });
  const code = await runCommand(
    bin('vitest'),
    ['run', '--reporter=default', '--reporter=json', `--outputFile=${report}`, ...extraArgs],
    { env },
  );
  return record(label, countVitestReport(report, code));
}

/** The chromium binary to drive, installing Debian's package when we may. */
function findOrInstallChromium() {
  const given = process.env.CHROMIUM_PATH;
  if (given) {
    if (existsSync(given)) return given;
    throw new Error(`CHROMIUM_PATH=${given} does not exist`);
  }
  const found = CHROMIUM_CANDIDATES.find((candidate) => existsSync(candidate));
  if (found) return found;
  if (!isRoot) {
    throw new Error("chromium not found: install Debian's chromium package or set CHROMIUM_PATH");
  }
  return undefined;
}

async function installChromium() {
  log('chromium not found; installing Debian package chromium (apt-get)');
  const env = { ...baseEnv, DEBIAN_FRONTEND: 'noninteractive' };
  for (const aptArgs of [
    ['-q', 'update'],
    ['-q', 'install', '-y', 'chromium'],
  ]) {
    const code = await runCommand('apt-get', aptArgs, { env });
    if (code !== 0) throw new Error(`apt-get ${aptArgs[1]} failed (exit ${code})`);
  }
  const found = CHROMIUM_CANDIDATES.find((candidate) => existsSync(candidate));
  if (!found) throw new Error('chromium was installed but no binary was found');
  return found;
}

async function unitTests(env) {
  section('unit and API tests (vitest)');
  await runVitest('unit and API tests', UNIT_REPORT, [...options, ...unitFilters], env);
}

async function browserTests(env) {
  section('browser tests (vitest + chromium)');
  try {
    const chromiumPath = findOrInstallChromium() ?? (await installChromium());
    log(`chromium: ${chromiumPath}`);
    await runTsScript('scripts/seed.ts', ['--reset'], env);
    const appUrl = `http://127.0.0.1:${TEST_API_PORT}`;
    await startApi({
      env: { ...env, SERVE_CLIENT: '1' },
      port: TEST_API_PORT,
      services,
      onExit: (code, signal) => warn(`[api] exited during the browser tests (${signal ?? code})`),
    });
    // Requests only queue their e-mail: the worker delivers it (on the outbox NOTIFY) to the
    // catcher. Only mail delivery runs, so no digest or nudge lands in the middle of a test.
    services.push(
      startService('worker', tsx, ['jobs/index.ts'], {
        env: { ...env, WORKER_JOBS: 'deliver-mail', LOG_LEVEL: 'warn' },
        onExit: (code, signal) =>
          warn(`[worker] exited during the browser tests (${signal ?? code})`),
      }),
    );
    await runVitest(
      'browser tests',
      E2E_REPORT,
      ['--config', 'vitest.e2e.config.ts', ...options, ...e2eFilters],
      { ...env, E2E_BASE_URL: appUrl, CHROMIUM_PATH: chromiumPath },
    );
  } catch (error) {
    warn(`browser tests could not run: ${error.message}`);
    record('browser tests', {
      passed: 0,
      failed: 1,
      problems: [`browser tests: ${error.message}`],
    });
  }
}

async function cleanUp() {
  await stopAll(services);
  await postgres?.stop();
  postgres = undefined;
}

function printSummary() {
  const total = addCounts(...parts);
  section('summary');
  for (const part of parts) log(`${part.label}: ${part.passed} passed, ${part.failed} failed`);
  for (const problem of total.problems) log(`  - ${problem}`);
  // Nothing may be printed after this line: CI reads it as the result.
  log(summaryLine(total));
  return exitCodeFor(total);
}

async function main() {
  ensureDependencies();
  if (!unitOnly) {
    await runCheck('typecheck');
    await runCheck('lint');
    await runCheck('build', SLOT === 0 ? [] : ['--outDir', CLIENT_DIST, '--emptyOutDir']);
  }
  mkdirSync(REPORTS_DIR, { recursive: true });
  rmSync(UNIT_REPORT, { force: true });
  rmSync(E2E_REPORT, { force: true });

  section('services for the tests');
  try {
    postgres = await startPostgres({
      name: `test${slotSuffix}`,
      port: process.env.PG_TEST_PORT ?? TEST_PG_PORT,
      externalUrl: process.env.TEST_DATABASE_URL,
    });
    if (!postgres.external) postgres.recreateDatabase('hourstone_test');
    const env = {
      ...baseEnv,
      NODE_ENV: 'test',
      // route() checks every JSON body against its response schema (server/routes/response-check.ts)
      VALIDATE_RESPONSES: '1',
      JWT_SECRET: 'test-secret',
      APP_URL: `http://127.0.0.1:${TEST_API_PORT}`,
      DATABASE_URL: postgres.databaseUrl,
    };
    await runTsScript('scripts/migrate.ts', [], env);
    const mail = await startMailCatcher({
      smtpPort: TEST_SMTP_PORT,
      httpPort: TEST_CATCHER_PORT,
      services,
      onExit: (code, signal) => warn(`[mail] exited during the tests (${signal ?? code})`),
    });
    env.SMTP_URL = mail.smtpUrl;
    env.MAIL_CATCHER_URL = mail.catcherUrl;
    const s3Dir = path.join(projectRoot, '.data', `s3-test${slotSuffix}`);
    rmSync(s3Dir, { recursive: true, force: true });
    Object.assign(
      env,
      await startFakeS3({
        port: TEST_S3_PORT,
        directory: s3Dir,
        services,
        onExit: (code, signal) => warn(`[s3] exited during the tests (${signal ?? code})`),
      }),
    );

    if (runUnit) await unitTests(env);
    if (runE2e) await browserTests(env);
  } catch (error) {
    warn(`the test services could not start: ${error.message}`);
    record('test services', { passed: 0, failed: 1, problems: [error.message] });
  } finally {
    section('stopping the test services');
    await cleanUp();
  }
  return printSummary();
}

let interrupted = false;
for (const signal of ['SIGINT', 'SIGTERM']) {
  process.on(signal, () => {
    if (interrupted) return;
    interrupted = true;
    warn(`\n${signal}: stopping the test services`);
    void cleanUp().finally(() => process.exit(130));
  });
}

main().then(
  (code) => process.exit(code),
  async (error) => {
    warn(`npm test failed: ${error.stack ?? error.message}`);
    await cleanUp();
    log(summaryLine(addCounts(...parts, { passed: 0, failed: 1 })));
    process.exit(1);
  },
);
