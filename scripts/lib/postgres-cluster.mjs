// The on-disk side of the project's PostgreSQL clusters: where they live, their saved passwords,
// settings file, first initdb, and whether one is running. Node built-ins only (see setup.mjs).
import { randomBytes } from 'node:crypto';
import {
  appendFileSync,
  chmodSync,
  existsSync,
  mkdirSync,
  readdirSync,
  readFileSync,
  writeFileSync,
} from 'node:fs';
import path from 'node:path';
import { dataDir, isRoot, log, projectRoot, shortHash } from './common.mjs';
import { PostgresError, giveToPostgres, run } from './postgres-system.mjs';

export const SUPERUSER = 'postgres';
export const SOCKET_PATH_LIMIT = 107;
export const CONF_FILE = 'hourstone.conf';

/** The folder holding the clusters, and whether it had to leave the project folder. */
export function chooseBaseDir() {
  const inProject = path.join(dataDir, 'pg');
  if (!isRoot) return { baseDir: inProject, outside: false };
  mkdirSync(dataDir, { recursive: true });
  chmodSync(dataDir, 0o755);
  const canEnter = (dir) =>
    run('test', ['-x', dir], { asPostgres: true, allowFailure: true }).status === 0;
  if (canEnter(projectRoot) && canEnter(dataDir)) return { baseDir: inProject, outside: false };
  return { baseDir: `/var/tmp/hourstone-${shortHash(projectRoot)}`, outside: true };
}

/** Reads a saved password, or generates and saves one (mode 600). */
export function savedPassword(file, ids) {
  if (existsSync(file)) return readFileSync(file, 'utf8').trim();
  const password = randomBytes(24).toString('hex');
  writeFileSync(file, `${password}\n`, { mode: 0o600 });
  giveToPostgres(file, ids);
  return password;
}

export function socketDirFor(baseDir, name, port) {
  const inside = path.join(baseDir, `${name}.s`);
  if (path.join(inside, `.s.PGSQL.${port}`).length < SOCKET_PATH_LIMIT) return inside;
  return `/tmp/hourstone-${shortHash(projectRoot)}-${name}`;
}

export function confValue(value) {
  return typeof value === 'number' ? String(value) : `'${String(value).replace(/'/g, "''")}'`;
}

/** Settings the project controls live in their own file, rewritten on every start. */
export function writeSettings(pgData, settings, ids) {
  const mainConf = path.join(pgData, 'postgresql.conf');
  const includeLine = `include_if_exists '${CONF_FILE}'`;
  if (!readFileSync(mainConf, 'utf8').includes(includeLine)) {
    appendFileSync(
      mainConf,
      `\n# Hourstone's settings (rewritten by scripts/lib/postgres.mjs)\n${includeLine}\n`,
    );
  }
  const lines = Object.entries(settings).map(([key, value]) => `${key} = ${confValue(value)}`);
  const file = path.join(pgData, CONF_FILE);
  writeFileSync(file, `${lines.join('\n')}\n`, { mode: 0o600 });
  giveToPostgres(file, ids);
}

export function serverMajorVersion(binDir) {
  const text = run(path.join(binDir, 'pg_ctl'), ['--version']).stdout;
  return text.match(/(\d+)(\.\d+)?/)?.[1];
}

export function initCluster({ binDir, pgData, superuserFile, baseDir }) {
  if (existsSync(path.join(pgData, 'PG_VERSION'))) {
    const clusterVersion = readFileSync(path.join(pgData, 'PG_VERSION'), 'utf8').trim();
    const serverVersion = serverMajorVersion(binDir);
    if (serverVersion && clusterVersion !== serverVersion) {
      throw new PostgresError(
        `the cluster in ${pgData} was made by PostgreSQL ${clusterVersion} but the server found is ` +
          `${serverVersion}; remove that folder to start afresh (its data will be lost)`,
      );
    }
    return false;
  }
  if (existsSync(pgData) && readdirSync(pgData).length > 0) {
    throw new PostgresError(`${pgData} exists but holds no cluster; remove it and try again`);
  }
  log(`postgres: creating a new cluster in ${pgData}`);
  run(
    path.join(binDir, 'initdb'),
    [
      `--pgdata=${pgData}`,
      `--username=${SUPERUSER}`,
      '--auth=scram-sha-256',
      `--pwfile=${superuserFile}`,
      '--encoding=UTF8',
      '--locale=C',
    ],
    { asPostgres: true, cwd: baseDir },
  );
  return true;
}

export function isServerRunning(binDir, pgData, baseDir) {
  const status = run(path.join(binDir, 'pg_ctl'), ['status', '-D', pgData], {
    asPostgres: true,
    cwd: baseDir,
    allowFailure: true,
  });
  return status.status === 0;
}

/** Port of the running server, from line 4 of postmaster.pid. */
export function runningPort(pgData) {
  const lines = readFileSync(path.join(pgData, 'postmaster.pid'), 'utf8').split('\n');
  return Number(lines[3]);
}

export function logTail(logFile, lineCount = 25) {
  if (!existsSync(logFile)) return '(no log written)';
  return readFileSync(logFile, 'utf8').trimEnd().split('\n').slice(-lineCount).join('\n');
}

export function identifier(name) {
  if (!/^[a-z_][a-z0-9_]*$/.test(name)) throw new PostgresError(`unsafe database name: ${name}`);
  return name;
}
