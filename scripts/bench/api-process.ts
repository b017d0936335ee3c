// The API as the benchmark parts run it: its own process on loopback, as in production (no
// client files, no logging, no response checks), answering on `port` once /health does.
import { serve } from './readings-load';

/** The environment of the API process of a bench part. */
export const apiProcessEnv = (port: number): NodeJS.ProcessEnv => ({
  ...process.env,
  NODE_ENV: 'production',
  LOG_LEVEL: 'silent',
  SERVE_CLIENT: '0',
  HOST: '127.0.0.1',
  PORT: String(port),
  APP_URL: `http://127.0.0.1:${port}`,
  VALIDATE_RESPONSES: '0',
});

/** Starts server/index.ts on `port` and waits for /api/v1/health. */
export const serveApi = (port: number, nodeArgs: string[] = []) =>
  serve('server/index.ts', [], apiProcessEnv(port), port, '/api/v1/health', nodeArgs);
