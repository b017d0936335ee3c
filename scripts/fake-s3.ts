// A local S3-compatible object store (s3rver) for development and tests, on loopback only.
// npm start and npm test start it; with S3_ENDPOINT pointing elsewhere they use that store instead.
import { mkdirSync } from 'node:fs';
import S3rver from 's3rver';

const port = Number(process.env.FAKE_S3_PORT ?? 4568);
const directory = process.env.FAKE_S3_DIR ?? '.data/s3';
const bucket = process.env.S3_BUCKET ?? 'hourstone';
mkdirSync(directory, { recursive: true });

const server = new S3rver({
  address: '127.0.0.1',
  port,
  directory,
  silent: true,
  configureBuckets: [{ name: bucket, configs: [] }],
});
await server.run();
console.log(`fake s3: http://127.0.0.1:${port} (bucket ${bucket}, data in ${directory})`);

const stop = async () => {
  await server.close();
  process.exit(0);
};
process.on('SIGTERM', () => void stop());
process.on('SIGINT', () => void stop());
