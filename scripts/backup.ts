// `npm run backup [-- --out DIR]`: a consistent copy of a farm server's data in a dated folder of
// backups/ (git-ignored): database.dump (pg_dump, custom format, one snapshot), objects/ (every
// file of the object store, by key) and manifest.json (row counts of every table, a checksum of
// the readings, the list of files). `npm run restore FOLDER` brings it back.
//
// DATABASE_URL and the S3_* settings name what to copy; without DATABASE_URL the project's own
// development cluster is used (started for the copy when it is not running).
import { spawn } from 'node:child_process';
import { createWriteStream } from 'node:fs';
import { mkdir, writeFile } from 'node:fs/promises';
import path from 'node:path';
import { pipeline } from 'node:stream/promises';
import type { Readable } from 'node:stream';
import { fileURLToPath, pathToFileURL } from 'node:url';
import { GetObjectCommand, ListObjectsCommand } from '@aws-sdk/client-s3';
import {
  DUMP_FILE,
  MANIFEST_FILE,
  OBJECTS_DIR,
  describeDatabase,
  explainStoreError,
  fingerprintWith,
  libpqEnv,
  pgProgram,
  s3Client,
  storeFromEnv,
  type Manifest,
  type StoreSettings,
  withClient,
} from './backup-common';
import { startPostgres } from './lib/postgres.mjs';

const projectRoot = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '..');

/** Runs a PostgreSQL client program; rejects with its own error output when it fails. */
export function runPg(program: string, args: string[], env: NodeJS.ProcessEnv): Promise<string> {
  return new Promise((resolve, reject) => {
    const child = spawn(program, args, { env, stdio: ['ignore', 'pipe', 'pipe'] });
    let output = '';
    child.stdout.on('data', (chunk) => (output += chunk));
    child.stderr.on('data', (chunk) => (output += chunk));
    child.on('error', (error) => reject(new Error(`could not run ${program}: ${error.message}`)));
    child.on('exit', (code) =>
      code === 0
        ? resolve(output)
        : reject(new Error(`${path.basename(program)} failed (exit ${code}): ${output.trim()}`)),
    );
  });
}

/** A key as a relative path that stays inside objects/ (our keys always do; others are refused). */
export function objectFile(key: string): string {
  const parts = key.split('/');
  if (!key || key.startsWith('/') || parts.some((p) => p === '' || p === '.' || p === '..'))
    throw new Error(`refusing to copy an object with an unsafe key: ${JSON.stringify(key)}`);
  return path.posix.join(OBJECTS_DIR, key);
}

/**
 * Copies every object of the store into `dir`/objects, returning the manifest's list. ListObjects
 * (v1, paged by the last key): the local fake store cannot page ListObjectsV2 on Node 20.
 */
async function copyObjects(store: StoreSettings, dir: string) {
  const s3 = s3Client(store);
  const objects: Manifest['objects'] = [];
  let marker: string | undefined;
  try {
    for (;;) {
      const page = await s3.send(new ListObjectsCommand({ Bucket: store.bucket, Marker: marker }));
      const keys = (page.Contents ?? []).flatMap((item) => (item.Key ? [item.Key] : []));
      for (const key of keys) {
        const file = objectFile(key);
        const target = path.join(dir, file);
        await mkdir(path.dirname(target), { recursive: true });
        const got = await s3.send(new GetObjectCommand({ Bucket: store.bucket, Key: key }));
        await pipeline(got.Body as Readable, createWriteStream(target));
        objects.push({
          key,
          file,
          bytes: got.ContentLength ?? 0,
          contentType: got.ContentType ?? 'application/octet-stream',
        });
      }
      if (!page.IsTruncated || !keys.length) return objects;
      marker = page.NextMarker ?? keys[keys.length - 1];
    }
  } finally {
    s3.destroy();
  }
}

/** The folder name of a backup made at `now`: 2026-04-07T13-00-00Z. */
export const backupFolderName = (now: Date) =>
  now
    .toISOString()
    .replace(/\.\d{3}Z$/, 'Z')
    .replace(/:/g, '-');

/**
 * Writes a backup into a new folder under `parent` and returns it with its manifest. The dump is
 * one snapshot; the files are copied after it, so every file a dumped row names is there (files
 * uploaded meanwhile are copied too and simply not yet referenced).
 */
export async function makeBackup(options: {
  databaseUrl: string;
  store: StoreSettings;
  parent: string;
  now?: Date;
}): Promise<{ dir: string; manifest: Manifest }> {
  const now = options.now ?? new Date();
  const dir = path.join(options.parent, backupFolderName(now));
  await mkdir(options.parent, { recursive: true });
  await mkdir(dir); // a second backup in the same second fails here rather than mixing two
  const env = libpqEnv(options.databaseUrl);
  const pgDump = pgProgram('pg_dump');
  const pgDumpVersion = (await runPg(pgDump, ['--version'], env)).trim();
  // The manifest's counts and the dump come from one snapshot: a transaction exports it, counts
  // in it, and pg_dump reads the same snapshot while the transaction stays open.
  const counted = await withClient(options.databaseUrl, async (client) => {
    await client.query('BEGIN ISOLATION LEVEL REPEATABLE READ READ ONLY');
    const snapshot = (await client.query('SELECT pg_export_snapshot() AS id')).rows[0].id;
    const result = await fingerprintWith(client);
    await runPg(
      pgDump,
      ['--format=custom', `--snapshot=${snapshot}`, `--file=${path.join(dir, DUMP_FILE)}`],
      env,
    );
    await client.query('COMMIT');
    return result;
  });
  const objects = await copyObjects(options.store, dir).catch((error: unknown) => {
    throw explainStoreError(error, options.store);
  });
  const manifest: Manifest = {
    format: 'hourstone-backup-1',
    createdAt: now.toISOString(),
    database: { ...counted, file: DUMP_FILE, pgDumpVersion },
    objects,
  };
  await writeFile(path.join(dir, MANIFEST_FILE), `${JSON.stringify(manifest, null, 2)}\n`);
  return { dir, manifest };
}

async function main() {
  const args = process.argv.slice(2);
  const outIndex = args.indexOf('--out');
  const parent =
    outIndex >= 0 ? path.resolve(args[outIndex + 1]) : path.join(projectRoot, 'backups');
  const postgres = await startPostgres({ name: 'dev', externalUrl: process.env.DATABASE_URL });
  try {
    const store = storeFromEnv();
    console.log(
      `backup: ${describeDatabase(postgres.databaseUrl)}; files of bucket ${store.bucket} at ${store.endpoint}`,
    );
    const { dir, manifest } = await makeBackup({
      databaseUrl: postgres.databaseUrl,
      store,
      parent,
    });
    const rows = Object.values(manifest.database.tables).reduce((a, b) => a + b, 0);
    console.log(
      `backup: written to ${path.relative(process.cwd(), dir) || dir}: ` +
        `${Object.keys(manifest.database.tables).length} tables, ${rows} rows ` +
        `(readings md5 ${manifest.database.readingsMd5 || 'none'}), ${manifest.objects.length} files`,
    );
  } finally {
    await postgres.stop();
  }
}

if (process.argv[1] && import.meta.url === pathToFileURL(process.argv[1]).href) {
  main().catch((error) => {
    console.error(`backup failed: ${error.message}`);
    process.exit(1);
  });
}
