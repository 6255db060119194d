import {
  CreateBucketCommand,
  DeleteObjectCommand,
  GetObjectCommand,
  ListObjectsV2Command,
  PutObjectCommand,
  S3Client,
  S3ServiceException,
} from '@aws-sdk/client-s3';
import { env } from './env';
import { AppError } from './errors';
import { log } from './log';
import { checkStorageFault, type StorageOp } from './storage-faults';

/**
 * Object storage through the S3 API: survey files and photos live there, the database keeps
 * only what and where (models/attachment.ts). Locally an S3-compatible fake on loopback.
 */
let client: S3Client | undefined;

function s3(): S3Client {
  const e = env();
  client ??= new S3Client({
    endpoint: e.RUNNEL_S3_ENDPOINT,
    region: e.RUNNEL_S3_REGION,
    // Path-style addressing: a bucket sub-domain of 127.0.0.1 cannot resolve.
    forcePathStyle: true,
    credentials: { accessKeyId: e.RUNNEL_S3_ACCESS_KEY_ID, secretAccessKey: e.RUNNEL_S3_SECRET_ACCESS_KEY },
  });
  return client;
}

const bucket = () => env().RUNNEL_S3_BUCKET;

/** Seconds a client is asked to wait when the store does not answer. */
const STORAGE_RETRY_AFTER_SECONDS = 5;

/**
 * A store that fails (down, refusing, timing out) becomes a 503 with Retry-After: the writes that
 * call it keep nothing (they store files first and remove them again if a later step fails).
 */
async function guarded<T>(op: StorageOp, key: string, run: () => Promise<T>): Promise<T> {
  try {
    checkStorageFault(op, key);
    return await run();
  } catch (error) {
    if (error instanceof S3ServiceException && (error.name === 'NoSuchKey' || error.name === 'NoSuchBucket'))
      throw error;
    const unavailable = new AppError(
      'service_unavailable',
      'File storage cannot be reached just now; nothing was changed. Try again in a few seconds.',
      undefined,
      {
        retryAfterSeconds: STORAGE_RETRY_AFTER_SECONDS,
      },
    );
    unavailable.cause = error;
    log().warn({ err: error, op }, 'file storage failed');
    throw unavailable;
  }
}

function isMissingBucket(error: unknown): boolean {
  return error instanceof S3ServiceException && error.name === 'NoSuchBucket';
}

export interface StoredObject {
  bytes: Uint8Array;
  contentType: string;
}

/** Stores bytes under `key`. Creates the bucket once if a fresh store has none yet. */
export async function putObject(key: string, bytes: Uint8Array, contentType: string): Promise<void> {
  const put = () =>
    guarded('put', key, () =>
      s3().send(
        new PutObjectCommand({
          Bucket: bucket(),
          Key: key,
          Body: bytes,
          ContentType: contentType,
          ContentLength: bytes.byteLength,
        }),
      ),
    );
  try {
    await put();
  } catch (error) {
    if (!isMissingBucket(error)) throw error;
    await guarded('put', key, async () => {
      try {
        await s3().send(new CreateBucketCommand({ Bucket: bucket() }));
      } catch (createError) {
        // Several first writes to a fresh store race to create the bucket: one wins, the rest find it made.
        if (!(
          createError instanceof S3ServiceException &&
          ['BucketAlreadyOwnedByYou', 'BucketAlreadyExists'].includes(createError.name)
        ))
          throw createError;
      }
    });
    await put();
  }
}

/** The bytes stored under `key`, or null when there is no such object. */
export async function getObject(key: string): Promise<StoredObject | null> {
  try {
    const res = await guarded('get', key, () => s3().send(new GetObjectCommand({ Bucket: bucket(), Key: key })));
    if (!res.Body) return null;
    return { bytes: await res.Body.transformToByteArray(), contentType: res.ContentType ?? 'application/octet-stream' };
  } catch (error) {
    if (error instanceof S3ServiceException && (error.name === 'NoSuchKey' || error.name === 'NoSuchBucket'))
      return null;
    throw error;
  }
}

/** Removes the object; removing one that is already gone is not an error. */
export async function deleteObject(key: string): Promise<void> {
  await guarded('delete', key, () => s3().send(new DeleteObjectCommand({ Bucket: bucket(), Key: key })));
}

/** Keys under a prefix (tests use it to prove a refused upload left nothing behind; backups list the whole store). */
export async function listKeys(prefix: string): Promise<string[]> {
  const keys: string[] = [];
  let token: string | undefined;
  do {
    let res;
    try {
      res = await guarded('list', prefix, () =>
        s3().send(new ListObjectsV2Command({ Bucket: bucket(), Prefix: prefix, ContinuationToken: token })),
      );
    } catch (error) {
      // A store that has never been written to has no bucket yet, and so no keys.
      if (isMissingBucket(error)) return keys;
      throw error;
    }
    for (const o of res.Contents ?? []) if (o.Key) keys.push(o.Key);
    token = res.IsTruncated ? res.NextContinuationToken : undefined;
  } while (token);
  return keys;
}
