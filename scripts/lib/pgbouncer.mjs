// pgbouncer in transaction-pooling mode in front of one of the project's PostgreSQL clusters, on
// loopback, from Debian's package (installed with apt-get when missing, as postgres.mjs installs
// the server). It runs as the same unprivileged user as the clusters. Node built-ins only.
//
// Layout, in <project>/.data/pgbouncer/<name> (or beside the clusters when those had to leave the
// project folder, see chooseBaseDir):
//   pgbouncer.ini   the settings, rewritten on every start
//   userlist.txt    the application role and its password (mode 600; pgbouncer sends it on to
//                   PostgreSQL, which asks for scram-sha-256)
//   pgbouncer.log, pgbouncer.pid
import { existsSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import path from 'node:path';
import { spawnSync } from 'node:child_process';
import { dataDir, isRoot, log, sleep, warn } from './common.mjs';
import {
  commandExists,
  ensureOsUser,
  giveToPostgres,
  makePrivateDir,
  run,
} from './postgres-system.mjs';
import { chooseBaseDir, logTail } from './postgres-cluster.mjs';
import { isPortInUse } from './processes.mjs';

const BINARY = '/usr/sbin/pgbouncer';

export class PgbouncerError extends Error {}

function findBinary() {
  if (existsSync(BINARY)) return BINARY;
  if (commandExists('pgbouncer')) {
    return spawnSync('sh', ['-c', 'command -v pgbouncer'], { encoding: 'utf8' }).stdout.trim();
  }
  return undefined;
}

/** Debian's package, as postgres-system.mjs installs the server's; its own service is stopped. */
function installPackage() {
  if (!isRoot) {
    throw new PgbouncerError(
      "pgbouncer not found. Install Debian's pgbouncer package (sudo apt-get install pgbouncer).",
    );
  }
  log('pgbouncer: not found; installing Debian package pgbouncer (apt-get)');
  for (const args of [
    ['-q', 'update'],
    ['-q', 'install', '-y', '--no-install-recommends', 'pgbouncer'],
  ]) {
    const result = spawnSync('apt-get', args, {
      env: { ...process.env, DEBIAN_FRONTEND: 'noninteractive' },
      stdio: ['ignore', 'inherit', 'inherit'],
    });
    if (result.status !== 0) throw new PgbouncerError(`apt-get ${args[1]} failed`);
  }
  // The package may start its own pgbouncer (on 6432, with an empty configuration): not ours.
  if (commandExists('service')) run('service', ['pgbouncer', 'stop'], { allowFailure: true });
}

const processAlive = (pid) => {
  try {
    process.kill(pid, 0);
    return true;
  } catch {
    return false;
  }
};

const savedPid = (pidFile) => {
  if (!existsSync(pidFile)) return undefined;
  const pid = Number(readFileSync(pidFile, 'utf8').trim());
  return Number.isInteger(pid) && pid > 0 ? pid : undefined;
};

/** Ends the pgbouncer of this folder by the id in its pid file, and waits until it is gone. */
async function stopByPidFile(pidFile, name) {
  const pid = savedPid(pidFile);
  if (!pid || !processAlive(pid)) return false;
  // SIGINT: "safe shutdown" (waits for clients' transactions); SIGTERM after 5 s.
  process.kill(pid, 'SIGINT');
  for (let i = 0; i < 50 && processAlive(pid); i++) await sleep(100);
  if (processAlive(pid)) {
    warn(`pgbouncer: ${name} did not stop within 5 s; sending SIGTERM`);
    process.kill(pid, 'SIGTERM');
    for (let i = 0; i < 50 && processAlive(pid); i++) await sleep(100);
  }
  return true;
}

/**
 * Starts pgbouncer `name` on 127.0.0.1:`port` in front of the database of `databaseUrl` (any
 * database of that server may be asked for by name). Returns the URL the app should use instead,
 * and stop(). A pgbouncer left running by an earlier run of the same name is stopped first.
 *   poolSize: server connections per database and user (default_pool_size)
 */
export async function startPgbouncer({ name, port, databaseUrl, poolSize = 20, maxClients = 400 }) {
  let binary = findBinary();
  if (!binary) {
    installPackage();
    binary = findBinary();
    if (!binary) throw new PgbouncerError('pgbouncer was installed but its binary was not found');
  }
  const ids = ensureOsUser();
  const { outside, baseDir } = chooseBaseDir();
  const dir = outside
    ? path.join(baseDir, `pgbouncer-${name}`)
    : path.join(dataDir, 'pgbouncer', name);
  makePrivateDir(path.dirname(dir), undefined);
  makePrivateDir(dir, ids);
  if (!outside) spawnSync('chmod', ['755', path.dirname(dir)]);

  const files = {
    ini: path.join(dir, 'pgbouncer.ini'),
    users: path.join(dir, 'userlist.txt'),
    log: path.join(dir, 'pgbouncer.log'),
    pid: path.join(dir, 'pgbouncer.pid'),
  };
  if (await stopByPidFile(files.pid, name))
    log(`pgbouncer: stopped the ${name} pgbouncer left running`);
  const target = new URL(databaseUrl);
  const user = decodeURIComponent(target.username);
  const password = decodeURIComponent(target.password);
  const quoted = (s) => `"${s.replace(/"/g, '""')}"`;
  writeFileSync(files.users, `${quoted(user)} ${quoted(password)}\n`, { mode: 0o600 });
  giveToPostgres(files.users, ids);
  const settings = [
    '; written by scripts/lib/pgbouncer.mjs on every start',
    '[databases]',
    // every database of the server, by the name the client asks for
    `* = host=${target.hostname} port=${target.port || 5432}`,
    '',
    '[pgbouncer]',
    'listen_addr = 127.0.0.1',
    `listen_port = ${port}`,
    // TCP on loopback only (an empty unix_socket_dir turns the socket off)
    'unix_socket_dir =',
    'auth_type = scram-sha-256',
    `auth_file = ${files.users}`,
    // A server connection belongs to a client for one transaction only: no session state
    // (session advisory locks, named prepared statements, SET, LISTEN) survives between them.
    'pool_mode = transaction',
    `default_pool_size = ${poolSize}`,
    `max_client_conn = ${maxClients}`,
    // SHOW POOLS / SHOW STATS on the admin database "pgbouncer" for the app's role (read-only)
    `stats_users = ${user}`,
    `logfile = ${files.log}`,
    `pidfile = ${files.pid}`,
    'log_connections = 0',
    'log_disconnections = 0',
    // a server connection is checked before reuse only after it sat idle this long
    'server_check_delay = 10',
    '',
  ];
  writeFileSync(files.ini, settings.join('\n'), { mode: 0o600 });
  giveToPostgres(files.ini, ids);
  if (await isPortInUse(port)) {
    throw new PgbouncerError(`port ${port} (pgbouncer ${name}) is already in use on 127.0.0.1`);
  }
  rmSync(files.pid, { force: true });
  const started = run(binary, ['-d', '-q', files.ini], {
    asPostgres: true,
    cwd: dir,
    allowFailure: true,
  });
  if (started.status !== 0) {
    throw new PgbouncerError(
      `pgbouncer ${name} did not start (exit ${started.status}): ${started.stderr}\n${logTail(files.log)}`,
    );
  }
  for (let i = 0; i < 100 && !(await isPortInUse(port)); i++) await sleep(100);
  if (!(await isPortInUse(port))) {
    await stopByPidFile(files.pid, name);
    throw new PgbouncerError(`pgbouncer ${name} did not listen on ${port}:\n${logTail(files.log)}`);
  }
  log(
    `pgbouncer: ${name} on 127.0.0.1:${port} (transaction pooling, ${poolSize} server connections; log: ${files.log})`,
  );

  const pooled = new URL(databaseUrl);
  pooled.hostname = '127.0.0.1';
  pooled.port = String(port);
  const adminUrl = new URL(pooled);
  adminUrl.pathname = '/pgbouncer';
  let running = true;
  return {
    databaseUrl: pooled.toString(),
    /** pgbouncer's admin console (SHOW POOLS, SHOW STATS), for the app's role */
    adminUrl: adminUrl.toString(),
    port,
    logFile: files.log,
    /** process id of the running pgbouncer (from its pid file) */
    pid: () => savedPid(files.pid),
    async stop() {
      if (!running) return;
      running = false;
      if (await stopByPidFile(files.pid, name)) log(`pgbouncer: ${name} stopped`);
    },
  };
}
