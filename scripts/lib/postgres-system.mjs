// The machine side of the project's PostgreSQL: running its commands (as the postgres system user
// when we are root, since PostgreSQL refuses to run as root), finding Debian's server binaries or
// installing the package, and the system user itself. Node built-ins only (see setup.mjs).
import { spawnSync } from 'node:child_process';
import { chownSync, chmodSync, existsSync, mkdirSync, readdirSync, writeFileSync } from 'node:fs';
import path from 'node:path';
import { isRoot, log } from './common.mjs';

export const OS_USER = 'postgres';

export class PostgresError extends Error {}

/** Runs a command to completion, capturing its output; as the postgres user when we are root. */
export function run(cmd, args, { asPostgres = false, env, cwd, allowFailure = false } = {}) {
  const [file, argv] =
    asPostgres && isRoot ? ['runuser', ['-u', OS_USER, '--', cmd, ...args]] : [cmd, args];
  const result = spawnSync(file, argv, {
    cwd: cwd ?? '/',
    env: { ...process.env, ...env },
    encoding: 'utf8',
    stdio: ['ignore', 'pipe', 'pipe'],
  });
  if (result.error && !allowFailure) {
    throw new PostgresError(`could not run ${cmd}: ${result.error.message}`);
  }
  if (result.status !== 0 && !allowFailure) {
    const output = `${result.stdout ?? ''}${result.stderr ?? ''}`.trim();
    throw new PostgresError(`${path.basename(cmd)} failed (exit ${result.status}): ${output}`);
  }
  return result;
}

export function commandExists(cmd) {
  return spawnSync('sh', ['-c', `command -v ${cmd}`], { stdio: 'ignore' }).status === 0;
}

function hasServerBinaries(dir) {
  return existsSync(path.join(dir, 'initdb')) && existsSync(path.join(dir, 'pg_ctl'));
}

/** The folder holding initdb and pg_ctl: Debian's newest version first, then pg_config, then PATH. */
export function findServerBinaries() {
  const debianRoot = '/usr/lib/postgresql';
  if (existsSync(debianRoot)) {
    const versions = readdirSync(debianRoot)
      .filter((name) => /^\d+(\.\d+)?$/.test(name))
      .sort((a, b) => Number(b) - Number(a));
    for (const version of versions) {
      const dir = path.join(debianRoot, version, 'bin');
      if (hasServerBinaries(dir)) return dir;
    }
  }
  if (commandExists('pg_config')) {
    const dir = run('pg_config', ['--bindir'], { allowFailure: true }).stdout?.trim();
    if (dir && hasServerBinaries(dir)) return dir;
  }
  if (commandExists('initdb') && commandExists('pg_ctl')) {
    const found = spawnSync('sh', ['-c', 'command -v initdb'], { encoding: 'utf8' }).stdout.trim();
    return path.dirname(found);
  }
  return undefined;
}

/** apt-get's own cluster (Debian starts one on 5432): stop it and keep it from starting again. */
export function quietPackageClusters() {
  if (!commandExists('pg_lsclusters')) return;
  const listing = run('pg_lsclusters', ['--no-header'], { allowFailure: true }).stdout ?? '';
  for (const line of listing.split('\n')) {
    const [version, cluster, , status] = line.trim().split(/\s+/);
    if (!version || !cluster) continue;
    if (status === 'online') {
      log(`postgres: stopping the package's own cluster ${version}/${cluster}`);
      run('pg_ctlcluster', [version, cluster, 'stop'], { allowFailure: true });
    }
    const startConf = `/etc/postgresql/${version}/${cluster}/start.conf`;
    if (existsSync(startConf)) writeFileSync(startConf, 'manual\n');
  }
}

export function installServer() {
  if (!isRoot) {
    throw new PostgresError(
      "PostgreSQL server binaries not found. Install Debian's postgresql package " +
        '(sudo apt-get install postgresql) or set DATABASE_URL to a database you run yourself.',
    );
  }
  log('postgres: server binaries not found; installing Debian package postgresql (apt-get)');
  const env = { DEBIAN_FRONTEND: 'noninteractive' };
  for (const args of [
    ['-q', 'update'],
    ['-q', 'install', '-y', '--no-install-recommends', 'postgresql'],
  ]) {
    const result = spawnSync('apt-get', args, {
      env: { ...process.env, ...env },
      stdio: ['ignore', 'inherit', 'inherit'],
    });
    if (result.status !== 0) throw new PostgresError(`apt-get ${args[1]} failed`);
  }
  quietPackageClusters();
}

export function osUserIds() {
  const uid = run('id', ['-u', OS_USER], { allowFailure: true });
  if (uid.status !== 0) return undefined;
  const gid = run('id', ['-g', OS_USER]);
  return { uid: Number(uid.stdout.trim()), gid: Number(gid.stdout.trim()) };
}

export function ensureOsUser() {
  if (!isRoot) return undefined;
  if (!osUserIds()) {
    log(`postgres: creating the system user ${OS_USER}`);
    run('useradd', [
      '--system',
      '--user-group',
      '--no-create-home',
      '--home-dir',
      '/var/lib/postgresql',
      '--shell',
      '/usr/sbin/nologin',
      OS_USER,
    ]);
  }
  return osUserIds();
}

/** Makes a folder (or file) belong to the postgres user when we are root. */
export function giveToPostgres(target, ids) {
  if (ids) chownSync(target, ids.uid, ids.gid);
}

export function makePrivateDir(dir, ids) {
  mkdirSync(dir, { recursive: true });
  chmodSync(dir, 0o700);
  giveToPostgres(dir, ids);
}
