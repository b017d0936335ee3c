// The production client the `client` bench part measures: built by vite (NODE_ENV=production,
// whatever the bench's own NODE_ENV: React's development build is several times larger and
// slower) into the slot's folder (dist, or dist-test-N as `npm test` uses, which the API's
// CLIENT_DIST accepts), with the build manifest (.vite/manifest.json) the initial JavaScript is
// read from; and the static page the timings are compared with, written beside it.
import { spawnSync } from 'node:child_process';
import { existsSync, readFileSync, statSync, writeFileSync } from 'node:fs';
import path from 'node:path';
import { gzipSync } from 'node:zlib';
import { CLIENT_INPUTS, newestMtime } from '../lib/app.mjs';

const projectRoot = path.resolve(import.meta.dirname, '..', '..');
/** Written after a build made here, so a build of `npm test` (or one cut short) is made again. */
const MARK = '.bench-production-build';
/** The baseline: one small static page, no script, served by the same server from the same folder. */
export const STATIC_PAGE = 'bench-static.html';

/** The slot's client folder, relative to the project: dist, or dist-test-N. */
export const clientDistFor = (slot: number) => (slot === 0 ? 'dist' : `dist-test-${slot}`);

/** Why the folder needs a new build, or undefined when its production build is current. */
function staleReason(dist: string): string | undefined {
  const mark = path.join(dist, MARK);
  if (!existsSync(path.join(dist, '.vite', 'manifest.json')) || !existsSync(mark)) {
    return 'no production build with a manifest yet';
  }
  const built = statSync(mark).mtimeMs;
  const changed = CLIENT_INPUTS.find((input) => newestMtime(path.join(projectRoot, input)) > built);
  return changed ? `${changed} changed since` : undefined;
}

/** How long to wait for another build of this checkout to finish (one builds at a time here). */
const BUSY_WAIT_MS = 15_000;
const BUSY_TRIES = 20;

/** `vite build` with the manifest, production mode; waits its turn when another build runs. */
function viteBuild(distName: string) {
  const vite = path.join(projectRoot, 'node_modules', '.bin', 'vite');
  for (let attempt = 1; ; attempt++) {
    const built = spawnSync(vite, ['build', '--outDir', distName, '--emptyOutDir', '--manifest'], {
      cwd: projectRoot,
      env: { ...process.env, NODE_ENV: 'production' },
      stdio: ['ignore', 'ignore', 'pipe'],
      encoding: 'utf8',
    });
    if (built.status === 0) return;
    const busy = /another Vite build process/i.test(built.stderr);
    if (!busy || attempt === BUSY_TRIES) {
      process.stderr.write(built.stderr);
      throw new Error(`vite build failed (exit ${built.status})`);
    }
    console.log(`client: another vite build is running; trying again in ${BUSY_WAIT_MS / 1000} s`);
    Atomics.wait(new Int32Array(new SharedArrayBuffer(4)), 0, 0, BUSY_WAIT_MS);
  }
}

/** Builds the client into `distName` unless its production build is current; returns its path. */
export function buildClient(distName: string): string {
  const dist = path.join(projectRoot, distName);
  const reason = staleReason(dist);
  if (reason) {
    console.log(`client: building ${distName} (${reason})`);
    viteBuild(distName);
    writeFileSync(path.join(dist, MARK), `${new Date().toISOString()}\n`);
  } else {
    console.log(`client: ${distName} is a current production build`);
  }
  writeFileSync(path.join(dist, STATIC_PAGE), staticPage());
  return dist;
}

/**
 * The baseline page: the same kind of list the dashboard ends on (what the timing waits for), a
 * few hundred bytes of HTML and nothing else, so its time is the throttled network's floor.
 */
const staticPage = () => `<!doctype html>
<html lang="en">
  <head><meta charset="UTF-8" /><title>Hourstone bench: static page</title></head>
  <body>
    <h1>Due list</h1>
    <ul aria-label="Due services">
      <li>T-01 · 250 h service · due in 12 days</li>
      <li>C-01 · 50 h greasing · overdue</li>
    </ul>
  </body>
</html>
`;

interface ManifestChunk {
  file: string;
  src?: string;
  isEntry?: boolean;
  imports?: string[];
  dynamicImports?: string[];
}

export interface InitialJs {
  /** gzip size in kB (1,000 bytes) of every file below */
  gzipKb: number;
  files: string[];
}

/**
 * The JavaScript the browser must fetch before the dashboard route can render: the entry chunk of
 * index.html and the dashboard's route module, with every chunk they import statically (their
 * `imports` in the manifest, followed through), each once. Dynamic imports (other pages, the
 * charts, a dealer's board, the service worker's helper) are left out: they load later or never.
 * Sizes are those of the build's own .gz files (what the server sends), else gzipped here.
 */
export function dashboardInitialJs(dist: string): InitialJs {
  const manifest = JSON.parse(
    readFileSync(path.join(dist, '.vite', 'manifest.json'), 'utf8'),
  ) as Record<string, ManifestChunk>;
  const roots = ['index.html', 'src/app/routes/dashboard.tsx'];
  const missing = roots.filter((key) => !manifest[key]);
  if (missing.length) throw new Error(`the build manifest has no ${missing.join(', ')}`);
  const seen = new Set<string>();
  const visit = (key: string) => {
    if (seen.has(key)) return;
    seen.add(key);
    for (const next of manifest[key].imports ?? []) visit(next);
  };
  roots.forEach(visit);
  const files = [...seen].map((key) => manifest[key].file).filter((file) => file.endsWith('.js'));
  const bytes = files.reduce((sum, file) => sum + gzipBytes(path.join(dist, file)), 0);
  return { gzipKb: bytes / 1000, files };
}

function gzipBytes(file: string): number {
  const gz = `${file}.gz`;
  return existsSync(gz) ? statSync(gz).size : gzipSync(readFileSync(file), { level: 9 }).length;
}
