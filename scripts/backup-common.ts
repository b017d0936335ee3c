// What `npm run backup` and `npm run restore` share: the database's fingerprint (row counts of
// every table, a checksum of the readings), the object store's client, the folder's manifest and
// the PostgreSQL client programs.
import { existsSync } from 'node:fs';
import path from 'node:path';
import pg from 'pg';
import { S3Client } from '@aws-sdk/client-s3';
import { findServerBinaries } from './lib/postgres.mjs';

export interface StoreSettings {
  endpoint: string;
  region: string;
  bucket: string;
  accessKeyId: string;
  secretAccessKey: string;
  forcePathStyle: boolean;
}

/** The object store the app uses, from the same S3_* variables (the local fake store by default). */
export function storeFromEnv(env: NodeJS.ProcessEnv = process.env): StoreSettings {
  return {
    endpoint: env.S3_ENDPOINT || 'http://127.0.0.1:4568',
    region: env.S3_REGION || 'us-east-1',
    bucket: env.S3_BUCKET || 'hourstone',
    accessKeyId: env.S3_ACCESS_KEY_ID || 'S3RVER',
    secretAccessKey: env.S3_SECRET_ACCESS_KEY || 'S3RVER',
    forcePathStyle: (env.S3_FORCE_PATH_STYLE ?? 'true') === 'true',
  };
}

export function s3Client(store: StoreSettings): S3Client {
  return new S3Client({
    endpoint: store.endpoint,
    region: store.region,
    forcePathStyle: store.forcePathStyle,
    credentials: { accessKeyId: store.accessKeyId, secretAccessKey: store.secretAccessKey },
    // Streamed uploads would otherwise go out aws-chunked with a trailing checksum, which
    // S3-compatible stores such as the local fake keep as part of the file.
    requestChecksumCalculation: 'WHEN_REQUIRED',
    responseChecksumValidation: 'WHEN_REQUIRED',
  });
}

/** A clearer message when the store does not answer at all (the local fake runs with npm start). */
export function explainStoreError(error: unknown, store: StoreSettings): Error {
  const code = (error as { code?: string; cause?: { code?: string } }).code;
  if (code === 'ECONNREFUSED' || (error as Error).message?.includes('ECONNREFUSED'))
    return new Error(
      `the object store at ${store.endpoint} does not answer: start it (npm start runs the ` +
        'local one) or set S3_ENDPOINT and the other S3_* settings',
    );
  return error as Error;
}

export interface Fingerprint {
  /** rows per table of the public schema */
  tables: Record<string, number>;
  /** md5 over every reading (id, machine, values, instant), in id order */
  readingsMd5: string;
}

export interface Manifest {
  format: 'hourstone-backup-1';
  createdAt: string;
  database: Fingerprint & { file: string; pgDumpVersion: string };
  objects: { key: string; file: string; bytes: number; contentType: string }[];
}

export const MANIFEST_FILE = 'manifest.json';
export const DUMP_FILE = 'database.dump';
export const OBJECTS_DIR = 'objects';

const READINGS_MD5 = `SELECT coalesce(md5(string_agg(
    id || ':' || machine_id || ':' || value || ':' || lifetime_value || ':' ||
    extract(epoch FROM taken_at), ',' ORDER BY id)), '') AS md5
  FROM meter_readings`;

/** Row counts of every table and the readings' checksum, in the client's current transaction. */
export async function fingerprintWith(client: pg.Client): Promise<Fingerprint> {
  const { rows } = await client.query<{ tablename: string }>(
    `SELECT tablename FROM pg_tables WHERE schemaname = 'public' ORDER BY tablename`,
  );
  const tables: Record<string, number> = {};
  for (const { tablename } of rows) {
    const count = await client.query<{ n: number }>(
      `SELECT count(*)::int AS n FROM ${pg.escapeIdentifier(tablename)}`,
    );
    tables[tablename] = count.rows[0].n;
  }
  const readingsMd5 =
    'meter_readings' in tables ? (await client.query(READINGS_MD5)).rows[0].md5 : '';
  return { tables, readingsMd5 };
}

/** Runs `work` with a client connected to the database, and closes it after. */
export async function withClient<T>(databaseUrl: string, work: (client: pg.Client) => Promise<T>) {
  const client = new pg.Client({ connectionString: databaseUrl });
  await client.connect().catch((error: Error) => {
    throw new Error(
      `could not connect to the database ${describeDatabase(databaseUrl)}: ${error.message}`,
    );
  });
  try {
    return await work(client);
  } finally {
    await client.end();
  }
}

/** Row counts of every table and the readings' checksum, read in one snapshot. */
export const fingerprint = (databaseUrl: string) =>
  withClient(databaseUrl, async (client) => {
    await client.query('BEGIN ISOLATION LEVEL REPEATABLE READ READ ONLY');
    const result = await fingerprintWith(client);
    await client.query('COMMIT');
    return result;
  });

/** pg_dump or pg_restore of Debian's PostgreSQL (the server's own version), or from PATH. */
export function pgProgram(name: 'pg_dump' | 'pg_restore'): string {
  const dir = findServerBinaries();
  const candidate = dir ? path.join(dir, name) : undefined;
  return candidate && existsSync(candidate) ? candidate : name;
}

/**
 * libpq settings for a postgres:// URL, so the password travels in the environment rather than
 * on the command line (where `ps` would show it).
 */
export function libpqEnv(databaseUrl: string): NodeJS.ProcessEnv {
  const url = new URL(databaseUrl);
  return {
    ...process.env,
    PGHOST: url.hostname,
    PGPORT: url.port || '5432',
    PGUSER: decodeURIComponent(url.username),
    PGPASSWORD: decodeURIComponent(url.password),
    PGDATABASE: decodeURIComponent(url.pathname.slice(1)),
    PGCONNECT_TIMEOUT: '10',
  };
}

/** The database part of a URL, without its password, for messages. */
export const describeDatabase = (databaseUrl: string) => {
  const url = new URL(databaseUrl);
  return `${url.pathname.slice(1)} on ${url.hostname}:${url.port || '5432'}`;
};
