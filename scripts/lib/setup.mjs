// Installs the npm dependencies when they are missing or stale. Node built-ins only: this runs on a
// fresh clone, before node_modules exists.
import { spawnSync } from 'node:child_process';
import { existsSync, statSync } from 'node:fs';
import path from 'node:path';
import { log, projectRoot } from './common.mjs';

/** Milliseconds since the epoch of a file's last change, or undefined when it does not exist. */
function mtimeOf(file) {
  return existsSync(file) ? statSync(file).mtimeMs : undefined;
}

/**
 * Why the installed dependencies need (re)installing, or undefined when they are current.
 * npm writes node_modules/.package-lock.json on every install, so its age tells whether
 * package-lock.json changed since.
 */
export function staleDependenciesReason(root = projectRoot) {
  const lock = mtimeOf(path.join(root, 'package-lock.json'));
  const installed = mtimeOf(path.join(root, 'node_modules', '.package-lock.json'));
  if (!existsSync(path.join(root, 'node_modules'))) return 'node_modules is missing';
  if (installed === undefined) return 'node_modules has no record of an install';
  if (lock !== undefined && lock > installed) return 'package-lock.json is newer than node_modules';
  return undefined;
}

/** Runs `npm ci` (or `npm install` without a lock file) when the dependencies are not current. */
export function ensureDependencies(root = projectRoot) {
  const reason = staleDependenciesReason(root);
  if (reason === undefined) return;
  const hasLock = existsSync(path.join(root, 'package-lock.json'));
  const args = [hasLock ? 'ci' : 'install', '--engine-strict=true', '--no-audit', '--no-fund'];
  log(`setup: ${reason}; running npm ${args.join(' ')}`);
  const result = spawnSync('npm', args, { cwd: root, stdio: ['ignore', 'inherit', 'inherit'] });
  if (result.error) throw new Error(`setup: could not run npm: ${result.error.message}`);
  if (result.status !== 0) throw new Error(`setup: npm ${args[0]} failed (exit ${result.status})`);
}
