// `npm run restore FOLDER`: brings a backup of `npm run backup` back into an EMPTY database
// (DATABASE_URL: no tables yet) and an EMPTY object store (the S3_* bucket), then checks every
// table's row count and the readings' checksum against the backup's manifest. A database or store
// that holds anything is refused before anything is written.
import { createReadStream } from 'node:fs';
import { readFile, stat } from 'node:fs/promises';
import path from 'node:path';
import { pathToFileURL } from 'node:url';
import {
  CreateBucketCommand,
  HeadBucketCommand,
  ListObjectsCommand,
  PutObjectCommand,
  type S3Client,
} from '@aws-sdk/client-s3';
import {
  DUMP_FILE,
  MANIFEST_FILE,
  describeDatabase,
  explainStoreError,
  fingerprint,
  libpqEnv,
  pgProgram,
  s3Client,
  storeFromEnv,
  withClient,
  type Fingerprint,
  type Manifest,
  type StoreSettings,
} from './backup-common';
import { objectFile, runPg } from './backup';

export class RestoreRefused extends Error {}

async function readManifest(dir: string): Promise<Manifest> {
  let text: string;
  try {
    text = await readFile(path.join(dir, MANIFEST_FILE), 'utf8');
  } catch {
    throw new RestoreRefused(
      `${dir} holds no ${MANIFEST_FILE}: is it a folder that npm run backup wrote?`,
    );
  }
  const manifest = JSON.parse(text) as Manifest;
  if (manifest.format !== 'hourstone-backup-1')
    throw new RestoreRefused(`${dir}/${MANIFEST_FILE} is not an Hourstone backup manifest`);
  return manifest;
}

/** Refuses a database that has any table, view or sequence in its public schema. */
async function assertDatabaseEmpty(databaseUrl: string) {
  const found = await withClient(databaseUrl, async (client) => {
    const { rows } = await client.query<{ relname: string }>(
      `SELECT c.relname FROM pg_class c JOIN pg_namespace n ON n.oid = c.relnamespace
        WHERE n.nspname = 'public' AND c.relkind IN ('r', 'p', 'v', 'm', 'S')
        ORDER BY c.relname`,
    );
    return rows.map((r) => r.relname);
  });
  if (found.length)
    throw new RestoreRefused(
      `the database ${describeDatabase(databaseUrl)} is not empty (${found.length} tables and ` +
        `sequences, e.g. ${found.slice(0, 3).join(', ')}). Restore only into a new, empty ` +
        'database: create one and point DATABASE_URL at it. Nothing was written.',
    );
}

/** Refuses a bucket that holds any object; creates the bucket when it does not exist yet. */
async function assertStoreEmpty(s3: S3Client, store: StoreSettings) {
  try {
    await s3.send(new HeadBucketCommand({ Bucket: store.bucket }));
  } catch (error) {
    if ((error as { $metadata?: { httpStatusCode?: number } }).$metadata?.httpStatusCode !== 404)
      throw error;
    await s3.send(new CreateBucketCommand({ Bucket: store.bucket }));
    return;
  }
  // ListObjects (v1): the local fake store cannot answer a truncated ListObjectsV2 on Node 20.
  const page = await s3.send(new ListObjectsCommand({ Bucket: store.bucket, MaxKeys: 1 }));
  if (page.Contents?.length)
    throw new RestoreRefused(
      `the object store's bucket ${store.bucket} at ${store.endpoint} is not empty (it holds ` +
        `${page.Contents?.[0]?.Key ?? 'objects'}…). Restore only into an empty bucket. Nothing was written.`,
    );
}

/** Names the tables whose row count, or the readings' checksum, differ from the manifest's. */
export function differences(expected: Fingerprint, actual: Fingerprint): string[] {
  const names = new Set([...Object.keys(expected.tables), ...Object.keys(actual.tables)]);
  const diffs = [...names]
    .filter((t) => expected.tables[t] !== actual.tables[t])
    .map(
      (t) =>
        `${t}: ${expected.tables[t] ?? 'absent'} in the backup, ${actual.tables[t] ?? 'absent'} restored`,
    );
  if (expected.readingsMd5 !== actual.readingsMd5) diffs.push('the readings checksum differs');
  return diffs;
}

/** Restores `dir` into the (empty) database and store; returns what the database now holds. */
export async function restoreBackup(options: {
  dir: string;
  databaseUrl: string;
  store: StoreSettings;
}): Promise<{ manifest: Manifest; restored: Fingerprint }> {
  const manifest = await readManifest(options.dir);
  const dump = path.join(options.dir, manifest.database.file ?? DUMP_FILE);
  await stat(dump).catch(() => {
    throw new RestoreRefused(`${dump} is missing`);
  });
  const files = manifest.objects.map((o) => ({
    ...o,
    path: path.join(options.dir, objectFile(o.key)),
  }));
  const s3 = s3Client(options.store);
  try {
    await assertDatabaseEmpty(options.databaseUrl);
    await assertStoreEmpty(s3, options.store).catch((error: unknown) => {
      throw error instanceof RestoreRefused ? error : explainStoreError(error, options.store);
    });
    await runPg(
      pgProgram('pg_restore'),
      [
        '--no-owner',
        '--no-privileges',
        '--exit-on-error',
        '--single-transaction',
        `--dbname=${new URL(options.databaseUrl).pathname.slice(1)}`,
        dump,
      ],
      libpqEnv(options.databaseUrl),
    );
    for (const file of files) {
      await s3.send(
        new PutObjectCommand({
          Bucket: options.store.bucket,
          Key: file.key,
          Body: createReadStream(file.path),
          ContentLength: (await stat(file.path)).size,
          ContentType: file.contentType,
        }),
      );
    }
  } finally {
    s3.destroy();
  }
  const restored = await fingerprint(options.databaseUrl);
  const diffs = differences(manifest.database, restored);
  if (diffs.length)
    throw new Error(`the restored database differs from the backup: ${diffs.join('; ')}`);
  return { manifest, restored };
}

async function main() {
  const folder = process.argv[2];
  if (!folder || folder.startsWith('-')) {
    console.error(
      'usage: npm run restore FOLDER   (a folder that npm run backup wrote, e.g. backups/2026-04-07T13-00-00Z)',
    );
    process.exit(2);
  }
  const databaseUrl = process.env.DATABASE_URL;
  if (!databaseUrl) {
    console.error('restore: set DATABASE_URL to the new, empty database to restore into');
    process.exit(2);
  }
  const store = storeFromEnv();
  console.log(
    `restore: ${folder} into ${describeDatabase(databaseUrl)} and bucket ${store.bucket} at ${store.endpoint}`,
  );
  const { manifest, restored } = await restoreBackup({
    dir: path.resolve(folder),
    databaseUrl,
    store,
  });
  const rows = Object.values(restored.tables).reduce((a, b) => a + b, 0);
  console.log(
    `restore: done — ${Object.keys(restored.tables).length} tables, ${rows} rows and ` +
      `${manifest.objects.length} files, row counts and readings checksum as in the backup`,
  );
}

if (process.argv[1] && import.meta.url === pathToFileURL(process.argv[1]).href) {
  main().catch((error) => {
    console.error(
      `restore ${error instanceof RestoreRefused ? 'refused' : 'failed'}: ${error.message}`,
    );
    process.exit(1);
  });
}
