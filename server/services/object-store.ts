import fs from 'node:fs';
import path from 'node:path';
import type { Readable } from 'node:stream';

import {
  DeleteObjectCommand,
  GetObjectCommand,
  HeadObjectCommand,
  ListObjectsV2Command,
  PutObjectCommand,
  S3Client,
  type S3ClientConfig,
} from '@aws-sdk/client-s3';
import S3rver from 's3rver';

import { config } from '@/server/config';
import { logger } from '@/server/logger';

// The SDK's own notice that releases after January 2027 need Node 22: the version is pinned (see DEVELOPERS.md).
process.env.AWS_SDK_JS_NODE_VERSION_SUPPORT_WARNING_DISABLED ??= 'true';

/** The bucket of the local fake. */
const LOCAL_BUCKET = 'fizzwright-uploads';
/** The local fake accepts these and only listens on loopback. */
const LOCAL_CREDENTIALS = { accessKeyId: 'S3RVER', secretAccessKey: 'S3RVER' };

/** Where attached files are kept, as `/api/health` reports it. */
export interface StorageInfo {
  /** `s3`: the bucket S3_BUCKET names; `local`: the S3-compatible fake on loopback, files under UPLOADS_DIR. */
  kind: 's3' | 'local';
  bucket: string;
}

interface Store extends StorageInfo {
  client: S3Client;
  fake: S3rver | null;
}

/** Names of stored files: 32 hex characters and the type's extension (made by attachments.ts). */
export const STORED_NAME = /^[0-9a-f]{32}\.(pdf|png|jpg)$/;

/** An S3 client for a bucket given in the environment (S3_BUCKET, S3_ENDPOINT, S3_REGION, the SDK's credentials). */
export function s3ClientFor(options: { endpoint: string | null; region: string; forcePathStyle: boolean }): S3Client {
  const clientConfig: S3ClientConfig = { region: options.region, forcePathStyle: options.forcePathStyle };
  if (options.endpoint) clientConfig.endpoint = options.endpoint;
  return new S3Client(clientConfig);
}

/** Starts the local fake on a free loopback port, its files under `directory`, and a client for it. */
export async function startLocalStore(directory: string): Promise<{ client: S3Client; fake: S3rver; bucket: string }> {
  fs.mkdirSync(directory, { recursive: true });
  const fake = new S3rver({
    address: '127.0.0.1',
    port: 0,
    silent: true,
    directory,
    configureBuckets: [{ name: LOCAL_BUCKET }],
  });
  const { port } = await fake.run();
  const client = new S3Client({
    region: 'us-east-1',
    endpoint: `http://127.0.0.1:${port}`,
    forcePathStyle: true,
    credentials: LOCAL_CREDENTIALS,
  });
  return { client, fake, bucket: LOCAL_BUCKET };
}

let opened: Promise<Store> | null = null;

/**
 * The object store, opened on first use: the configured bucket, or the local fake started on loopback. Either way
 * every file goes through the same SDK calls.
 */
function store(): Promise<Store> {
  opened ??= (async (): Promise<Store> => {
    if (config.s3.bucket) return { kind: 's3', bucket: config.s3.bucket, client: s3ClientFor(config.s3), fake: null };
    const local = await startLocalStore(config.uploadsDir);
    await moveLegacyUploads(local.client, local.bucket, config.uploadsDir);
    return { kind: 'local', ...local };
  })().catch((error: unknown) => {
    opened = null;
    throw error;
  });
  return opened;
}

export async function storageInfo(): Promise<StorageInfo> {
  const { kind, bucket } = await store();
  return { kind, bucket };
}

export async function putObject(key: string, body: Buffer, contentType: string): Promise<void> {
  const { client, bucket } = await store();
  await client.send(new PutObjectCommand({ Bucket: bucket, Key: key, Body: body, ContentType: contentType }));
}

/** The file's bytes as a stream, or null when the store has no such object. */
export async function getObject(key: string): Promise<Readable | null> {
  const { client, bucket } = await store();
  try {
    const found = await client.send(new GetObjectCommand({ Bucket: bucket, Key: key }));
    return found.Body as Readable;
  } catch (error) {
    if ((error as { name?: string }).name === 'NoSuchKey') return null;
    throw error;
  }
}

export async function deleteObject(key: string): Promise<void> {
  const { client, bucket } = await store();
  await client.send(new DeleteObjectCommand({ Bucket: bucket, Key: key }));
}

/** Every object in a bucket, page by page. */
export async function* listBucket(
  client: S3Client,
  bucket: string,
): AsyncGenerator<{ key: string; lastModified: Date | null; size: number }> {
  let token: string | undefined;
  do {
    const page = await client.send(new ListObjectsV2Command({ Bucket: bucket, ContinuationToken: token }));
    for (const item of page.Contents ?? [])
      if (item.Key) yield { key: item.Key, lastModified: item.LastModified ?? null, size: item.Size ?? 0 };
    token = page.IsTruncated ? page.NextContinuationToken : undefined;
  } while (token);
}

export async function* listObjects(): AsyncGenerator<{ key: string; lastModified: Date | null; size: number }> {
  const { client, bucket } = await store();
  yield* listBucket(client, bucket);
}

/** True when a bucket holds an object under this key. */
export async function bucketHas(client: S3Client, bucket: string, key: string): Promise<boolean> {
  try {
    await client.send(new HeadObjectCommand({ Bucket: bucket, Key: key }));
    return true;
  } catch (error) {
    const status = (error as { $metadata?: { httpStatusCode?: number } }).$metadata?.httpStatusCode;
    if ((error as { name?: string }).name === 'NotFound' || status === 404) return false;
    throw error;
  }
}

const MIME_OF_EXT: Record<string, string> = { pdf: 'application/pdf', png: 'image/png', jpg: 'image/jpeg' };

/**
 * Files kept as plain files in UPLOADS_DIR before the object store (one file per attachment, named as its key) are
 * put into the bucket and removed from the folder. Run when the store opens; a file already in the bucket is only
 * removed. Answers how many it moved.
 */
export async function moveLegacyUploads(client: S3Client, bucket: string, directory: string): Promise<number> {
  let names: string[];
  try {
    names = (await fs.promises.readdir(directory)).filter((name) => STORED_NAME.test(name));
  } catch {
    return 0;
  }
  for (const name of names) {
    const file = path.join(directory, name);
    if (!(await bucketHas(client, bucket, name))) {
      const body = await fs.promises.readFile(file);
      const contentType = MIME_OF_EXT[name.split('.').pop()!];
      await client.send(new PutObjectCommand({ Bucket: bucket, Key: name, Body: body, ContentType: contentType }));
    }
    await fs.promises.rm(file, { force: true });
  }
  if (names.length > 0) logger.info({ moved: names.length }, 'uploads moved into the object store');
  return names.length;
}

/** Stops the local fake, if this process started one (tests, shutdown). */
export async function closeObjectStore(): Promise<void> {
  const current = opened;
  opened = null;
  if (!current) return;
  const { client, fake } = await current.catch(() => ({ client: null, fake: null }));
  client?.destroy();
  await fake?.close();
}
