// Small helpers shared by the scripts. Node built-ins only (see setup.mjs).
import { createHash } from 'node:crypto';
import path from 'node:path';
import { fileURLToPath } from 'node:url';

export const projectRoot = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '..', '..');

export const isRoot = typeof process.getuid === 'function' && process.getuid() === 0;

/** Where the project's local state lives (git-ignored). */
export const dataDir = path.join(projectRoot, '.data');

/** Path of an executable installed by npm in this project. */
export function bin(name) {
  return path.join(projectRoot, 'node_modules', '.bin', name);
}

export function log(message) {
  process.stdout.write(`${message}\n`);
}

export function warn(message) {
  process.stderr.write(`${message}\n`);
}

/** Short stable hash, e.g. to name a folder after the project path. */
export function shortHash(text) {
  return createHash('sha256').update(text).digest('hex').slice(0, 12);
}

export function sleep(ms) {
  return new Promise((resolve) => setTimeout(resolve, ms));
}
