// Pieces of the app's start-up that start.mjs, db-reset.mjs and test.mjs share.
// Node built-ins only (see setup.mjs).
import { randomBytes } from 'node:crypto';
import { existsSync, mkdirSync, readdirSync, readFileSync, statSync, writeFileSync } from 'node:fs';
import path from 'node:path';
import { bin, dataDir, log, projectRoot } from './common.mjs';
import { assertPortsFree, runCommand, startService, waitForHttp } from './processes.mjs';

export const tsx = bin('tsx');

/** JWT_SECRET from the environment, else one generated once and kept in .data/secrets.json. */
export function jwtSecret() {
  if (process.env.JWT_SECRET) return process.env.JWT_SECRET;
  const file = path.join(dataDir, 'secrets.json');
  const saved = existsSync(file) ? JSON.parse(readFileSync(file, 'utf8')) : {};
  if (typeof saved.jwtSecret === 'string' && saved.jwtSecret.length >= 32) return saved.jwtSecret;
  saved.jwtSecret = randomBytes(48).toString('base64url');
  mkdirSync(dataDir, { recursive: true });
  writeFileSync(file, `${JSON.stringify(saved, null, 2)}\n`, { mode: 0o600 });
  log('setup: generated a JWT secret in .data/secrets.json');
  return saved.jwtSecret;
}

/** Runs a TypeScript script of the project with tsx; throws when it fails. */
export async function runTsScript(script, args, env) {
  const code = await runCommand(tsx, [script, ...args], { env });
  if (code !== 0) throw new Error(`${[script, ...args].join(' ')} failed (exit ${code})`);
}

/**
 * Starts scripts/mail-catcher.ts on the given ports and waits until it answers. The service joins
 * `services` at once, so that a failed start is still stopped. Returns the SMTP_URL and
 * MAIL_CATCHER_URL the app should use.
 */
export async function startMailCatcher({ smtpPort, httpPort, services, onExit }) {
  await assertPortsFree({ 'mail catcher SMTP': smtpPort, 'mail catcher HTTP': httpPort });
  const service = startService('mail', tsx, ['scripts/mail-catcher.ts'], {
    env: {
      ...process.env,
      MAIL_CATCHER_SMTP_PORT: String(smtpPort),
      MAIL_CATCHER_HTTP_PORT: String(httpPort),
    },
    onExit,
  });
  services.push(service);
  const catcherUrl = `http://127.0.0.1:${httpPort}`;
  await waitForHttp(`${catcherUrl}/messages`, { service, timeoutMs: 30000 });
  return { smtpUrl: `smtp://127.0.0.1:${smtpPort}`, catcherUrl };
}

/**
 * Starts the local S3-compatible store (scripts/fake-s3.ts, s3rver) on loopback and waits until it
 * answers. Returns the S3_* settings the app should use.
 */
export async function startFakeS3({ port, directory, services, onExit }) {
  await assertPortsFree({ 'fake S3': port });
  const service = startService('s3', tsx, ['scripts/fake-s3.ts'], {
    env: { ...process.env, FAKE_S3_PORT: String(port), FAKE_S3_DIR: directory },
    onExit,
  });
  services.push(service);
  const endpoint = `http://127.0.0.1:${port}`;
  await waitForHttp(`${endpoint}/`, { service, timeoutMs: 30000 });
  return {
    S3_ENDPOINT: endpoint,
    S3_BUCKET: 'hourstone',
    S3_REGION: 'us-east-1',
    S3_ACCESS_KEY_ID: 'S3RVER',
    S3_SECRET_ACCESS_KEY: 'S3RVER',
    S3_FORCE_PATH_STYLE: 'true',
  };
}

/** Newest modification time (ms) of a file, or of any file below a folder. */
export function newestMtime(target) {
  if (!existsSync(target)) return 0;
  const stats = statSync(target);
  if (!stats.isDirectory()) return stats.mtimeMs;
  let newest = stats.mtimeMs;
  for (const entry of readdirSync(target)) {
    newest = Math.max(newest, newestMtime(path.join(target, entry)));
  }
  return newest;
}

/** What a client build is made from, relative to the project. */
export const CLIENT_INPUTS = [
  'src',
  'shared',
  'public',
  'index.html',
  'vite.config.ts',
  'tailwind.config.ts',
  'package-lock.json',
];

/** Written beside a build made here, so a build from before (or one made in development mode) is redone. */
const BUILD_MARK = path.join(projectRoot, 'dist', '.production-build');

/** Why the client bundle in dist/ must be rebuilt, or undefined when it is current. */
export function staleClientReason() {
  const builtIndex = path.join(projectRoot, 'dist', 'index.html');
  if (!existsSync(builtIndex)) return 'dist/ has no build yet';
  if (!existsSync(BUILD_MARK)) return 'dist/ is not a production build';
  const built = statSync(builtIndex).mtimeMs;
  const changed = CLIENT_INPUTS.find((input) => newestMtime(path.join(projectRoot, input)) > built);
  return changed ? `${changed} changed since the last build` : undefined;
}

/** Builds the client with vite when dist/ is missing or older than its sources. */
export async function buildClientIfStale(env) {
  const reason = staleClientReason();
  if (!reason) {
    log('client: dist/ is up to date');
    return;
  }
  log(`client: building (${reason})`);
  // A production build whatever the app's NODE_ENV: React's development build is several times
  // larger and slower, and is for `npm run dev` (served by vite) only.
  const code = await runCommand(bin('vite'), ['build'], {
    env: { ...env, NODE_ENV: 'production' },
  });
  if (code !== 0) throw new Error(`vite build failed (exit ${code})`);
  writeFileSync(BUILD_MARK, `${new Date().toISOString()}\n`);
}

/** Starts the API (server/index.ts), adds it to `services` and waits for its health check. */
export async function startApi({ env, port, watch = false, services, onExit }) {
  await assertPortsFree({ API: port });
  const args = watch ? ['watch', 'server/index.ts'] : ['server/index.ts'];
  const service = startService('api', tsx, args, {
    env: { ...env, PORT: String(port), HOST: '127.0.0.1' },
    onExit,
  });
  services.push(service);
  await waitForHttp(`http://127.0.0.1:${port}/api/v1/health`, { service, timeoutMs: 90000 });
}
