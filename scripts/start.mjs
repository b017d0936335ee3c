// `npm start` (built client served by the API) and `npm run dev` (hot reload through vite).
// Brings up everything the app needs on this machine: dependencies, PostgreSQL, the demo data, a
// mail catcher, the API and the worker. Ctrl-C stops it all.
import { ensureDependencies } from './lib/setup.mjs';
import path from 'node:path';
import { bin, dataDir, log, warn } from './lib/common.mjs';
import { startPostgres } from './lib/postgres.mjs';
import { assertPortsFree, startService, stopAll, waitForHttp } from './lib/processes.mjs';
import {
  buildClientIfStale,
  jwtSecret,
  runTsScript,
  startApi,
  startMailCatcher,
  startFakeS3,
  tsx,
} from './lib/app.mjs';

const DEMO_SIGN_INS = [
  ['marta@larkspur.example', 'manager, Larkspur Flats Farm'],
  ['dev@larkspur.example', 'technician, Larkspur Flats Farm'],
  ['lena@larkspur.example', 'operator, Larkspur Flats Farm'],
  ['sam@larkspur.example', 'operator, Larkspur Flats Farm'],
  ['aoife@osiercreek.example', 'manager, Osier Creek Dairy'],
  ['ravi@quillon.example', 'service advisor, Quillon Equipment & Service'],
];
const DEMO_PASSWORD = 'hourstone-demo';

const args = process.argv.slice(2);
const devMode = args.includes('--dev');
const withDemoInProduction = args.includes('--with-demo');
const apiPort = Number(process.env.PORT ?? 4310);
const clientPort = Number(process.env.CLIENT_PORT ?? 5310);
const appUrl = `http://127.0.0.1:${devMode ? clientPort : apiPort}`;

const services = [];
let postgres;
let shuttingDown = false;

async function shutDown(exitCode, reason) {
  if (shuttingDown) return;
  shuttingDown = true;
  if (reason) warn(reason);
  log('stopping…');
  await stopAll(services);
  await postgres?.stop();
  process.exit(exitCode);
}

function onChildExit(name) {
  return (code, signal) => {
    void shutDown(
      1,
      `${name} stopped unexpectedly (${signal ?? `exit ${code}`}); stopping everything`,
    );
  };
}

process.on('SIGINT', () => void shutDown(0));
process.on('SIGTERM', () => void shutDown(0));

function printBanner(env) {
  const width = Math.max(...DEMO_SIGN_INS.map(([email]) => email.length));
  const lines = [
    '',
    `Hourstone is running${devMode ? ' (development, hot reload)' : ''}`,
    '',
    `  app:        ${appUrl}`,
    `  mail page:  ${appUrl}/dev/mail`,
    env.NODE_ENV !== 'production' && process.env.FAKE_TELEMATICS !== '0'
      ? '  telematics: a fake feed posts T-02 and S-01 (Larkspur) engine hours every few seconds'
      : undefined,
    '',
    `  demo sign-ins (password for all: ${DEMO_PASSWORD})`,
    ...DEMO_SIGN_INS.map(([email, role]) => `    ${email.padEnd(width)}  ${role}`),
    '',
    env.NODE_ENV === 'production' && !withDemoInProduction
      ? '  (NODE_ENV=production: the demo data is not loaded unless you pass --with-demo)'
      : undefined,
    '  Press Ctrl-C to stop.',
    '',
  ];
  log(lines.filter((line) => line !== undefined).join('\n'));
}

async function main() {
  ensureDependencies();
  const env = {
    ...process.env,
    NODE_ENV: process.env.NODE_ENV ?? 'development',
    JWT_SECRET: jwtSecret(),
    APP_URL: process.env.APP_URL ?? appUrl,
    PORT: String(apiPort),
  };
  delete env.FORCE_COLOR;

  // Fail early, before anything starts, when a port is taken.
  await assertPortsFree(devMode ? { API: apiPort, client: clientPort } : { API: apiPort });

  postgres = await startPostgres({
    name: 'dev',
    port: process.env.PG_PORT,
    externalUrl: process.env.DATABASE_URL,
  });
  env.DATABASE_URL = postgres.databaseUrl;

  await runTsScript('scripts/migrate.ts', [], env);
  if (env.NODE_ENV !== 'production') {
    await runTsScript('scripts/seed.ts', ['--if-empty'], env);
  } else if (withDemoInProduction) {
    await runTsScript('scripts/seed.ts', ['--if-empty', '--allow-production'], env);
  }

  if (!process.env.SMTP_URL) {
    const mail = await startMailCatcher({
      smtpPort: Number(process.env.MAIL_CATCHER_SMTP_PORT ?? 2525),
      httpPort: Number(process.env.MAIL_CATCHER_HTTP_PORT ?? 2526),
      services,
      onExit: onChildExit('mail'),
    });
    env.SMTP_URL = mail.smtpUrl;
    env.MAIL_CATCHER_URL = mail.catcherUrl;
  }

  if (!process.env.S3_ENDPOINT) {
    Object.assign(
      env,
      await startFakeS3({
        port: Number(process.env.FAKE_S3_PORT ?? 4568),
        directory: path.join(dataDir, 's3'),
        services,
        onExit: onChildExit('s3'),
      }),
    );
  }

  if (!devMode) {
    await buildClientIfStale(env);
    env.SERVE_CLIENT = '1';
  }

  services.push(
    startService('worker', tsx, devMode ? ['watch', 'jobs/index.ts'] : ['jobs/index.ts'], {
      env,
      onExit: onChildExit('worker'),
    }),
  );
  await startApi({ env, port: apiPort, watch: devMode, services, onExit: onChildExit('api') });
  // The demo farm's newer machines report their hours by themselves (scripts/fake-telematics.ts)
  // beside the mail catcher; FAKE_TELEMATICS=0 leaves it out. Its stopping stops nothing else.
  if (env.NODE_ENV !== 'production' && process.env.FAKE_TELEMATICS !== '0') {
    services.push(
      startService('telematics', tsx, ['scripts/fake-telematics.ts'], {
        env: { ...env, FAKE_TELEMATICS_URL: `http://127.0.0.1:${apiPort}/api/v1` },
        onExit: (code) => {
          if (code) warn(`the fake telematics feed stopped (exit ${code}); the app runs on`);
        },
      }),
    );
  }

  if (devMode) {
    const client = startService(
      'client',
      bin('vite'),
      ['--host', '127.0.0.1', '--port', String(clientPort), '--strictPort'],
      { env: { ...env, CLIENT_PORT: String(clientPort) }, onExit: onChildExit('client') },
    );
    services.push(client);
    await waitForHttp(`${appUrl}/`, { service: client, timeoutMs: 60000 });
  }
  printBanner(env);
}

main().catch((error) => shutDown(1, `start failed: ${error.message}`));
