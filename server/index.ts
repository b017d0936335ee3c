import { createApp } from './app';
import { env } from './env';
import { logger } from './logger';
import { closeDatabases } from './db';

const app = createApp();
const server = app.listen(env.PORT, env.HOST, () => {
  logger.info(`api listening on http://${env.HOST}:${env.PORT}`);
});

async function shutdown(signal: string) {
  logger.info(`${signal}: closing api`);
  server.close();
  await closeDatabases();
  process.exit(0);
}
process.on('SIGTERM', () => void shutdown('SIGTERM'));
process.on('SIGINT', () => void shutdown('SIGINT'));
