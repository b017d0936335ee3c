import type { Readable } from 'node:stream';
import {
  DeleteObjectCommand,
  GetObjectCommand,
  ListObjectsCommand,
  PutObjectCommand,
  S3Client,
} from '@aws-sdk/client-s3';
import { env } from '../env';

// The one module that talks to the object store (S3 API). npm start and the tests run a local fake
// (s3rver); a hosted store is one set of S3_* settings away. Files are never public: the API
// streams them to people who may see the record.
let client: S3Client | null = null;
function s3(): S3Client {
  client ??= new S3Client({
    endpoint: env.S3_ENDPOINT || undefined,
    region: env.S3_REGION,
    forcePathStyle: env.S3_FORCE_PATH_STYLE === 'true',
    credentials: { accessKeyId: env.S3_ACCESS_KEY_ID, secretAccessKey: env.S3_SECRET_ACCESS_KEY },
  });
  return client;
}

export async function putObject(key: string, body: Buffer, contentType: string): Promise<void> {
  await s3().send(
    new PutObjectCommand({ Bucket: env.S3_BUCKET, Key: key, Body: body, ContentType: contentType }),
  );
}

export async function getObject(
  key: string,
): Promise<{ body: Readable; contentType: string; length?: number }> {
  const out = await s3().send(new GetObjectCommand({ Bucket: env.S3_BUCKET, Key: key }));
  return {
    body: out.Body as Readable,
    contentType: out.ContentType ?? 'application/octet-stream',
    length: out.ContentLength,
  };
}

export async function deleteObject(key: string): Promise<void> {
  await s3().send(new DeleteObjectCommand({ Bucket: env.S3_BUCKET, Key: key }));
}

/** True when the store answered that the object does not exist. */
export function isMissingObject(error: unknown): boolean {
  const e = error as { name?: string; $metadata?: { httpStatusCode?: number } };
  return e?.name === 'NoSuchKey' || e?.$metadata?.httpStatusCode === 404;
}

/**
 * Every key in the bucket under `prefix` (all of them by default), page by page. ListObjects
 * (v1, paged by the last key) because the local fake store cannot page ListObjectsV2 on Node 20
 * (its continuation token needs a cipher OpenSSL 3 no longer offers).
 */
export async function* listObjectKeys(prefix = ''): AsyncGenerator<string> {
  let marker: string | undefined;
  for (;;) {
    const page = await s3().send(
      new ListObjectsCommand({ Bucket: env.S3_BUCKET, Prefix: prefix, Marker: marker }),
    );
    const keys = (page.Contents ?? []).flatMap((item) => (item.Key ? [item.Key] : []));
    yield* keys;
    if (!page.IsTruncated || !keys.length) return;
    marker = page.NextMarker ?? keys[keys.length - 1];
  }
}
