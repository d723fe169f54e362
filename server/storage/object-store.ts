import { randomBytes } from 'node:crypto';
import { mkdir, readFile, rename, rm, writeFile } from 'node:fs/promises';
import { dirname, join, resolve, sep } from 'node:path';
import { DeleteObjectsCommand, GetObjectCommand, NoSuchKey, PutObjectCommand, S3Client } from '@aws-sdk/client-s3';

/**
 * Where uploaded files (burn photos) are kept: one small interface, two places. Keys are made by
 * the server (never from a file's name), e.g. "photos/<owner>/<photo>.jpg".
 */
export interface ObjectStore {
  readonly kind: 'disk' | 's3';
  put(key: string, bytes: Uint8Array, contentType: string): Promise<void>;
  /** The bytes, or undefined when there is no such object. */
  get(key: string): Promise<Uint8Array | undefined>;
  /** Deletes the objects; a key that is already gone is not an error. */
  delete(keys: readonly string[]): Promise<void>;
}

export type StorageTarget = { kind: 'disk'; dir: string } | { kind: 's3'; bucket: string; prefix?: string; endpoint?: string; region?: string; credentials?: { accessKeyId: string; secretAccessKey: string } };

export function openObjectStore(target: StorageTarget): ObjectStore {
  return target.kind === 'disk' ? diskStore(target.dir) : s3Store(target);
}

const SAFE_KEY = /^[a-z0-9][a-z0-9/_.-]*$/i;

function checkKey(key: string): string {
  if (!SAFE_KEY.test(key) || key.split('/').some((segment) => segment === '' || segment === '.' || segment === '..')) throw new Error(`not a storage key: ${key}`);
  return key;
}

/** Files under a folder (DATA_DIR/files by default). A file is written beside its place, then renamed, so none is ever half there. */
function diskStore(dir: string): ObjectStore {
  const root = resolve(dir);
  const pathOf = (key: string) => {
    const path = join(root, checkKey(key));
    if (!path.startsWith(root + sep)) throw new Error(`not a storage key: ${key}`);
    return path;
  };
  return {
    kind: 'disk',
    async put(key, bytes) {
      const path = pathOf(key);
      await mkdir(dirname(path), { recursive: true });
      const temporary = `${path}.${randomBytes(6).toString('hex')}.part`;
      await writeFile(temporary, bytes);
      await rename(temporary, path);
    },
    async get(key) {
      try {
        return new Uint8Array(await readFile(pathOf(key)));
      } catch (error) {
        if ((error as NodeJS.ErrnoException).code === 'ENOENT') return undefined;
        throw error;
      }
    },
    async delete(keys) {
      await Promise.all(keys.map((key) => rm(pathOf(key), { force: true })));
    },
  };
}

/** S3 or any S3-compatible store (MinIO, Ceph, a cloud's object storage) through the AWS SDK. */
function s3Store(target: Extract<StorageTarget, { kind: 's3' }>): ObjectStore {
  const client = new S3Client({
    region: target.region ?? process.env.AWS_REGION ?? 'us-east-1',
    ...(target.endpoint ? { endpoint: target.endpoint, forcePathStyle: true } : {}),
    ...(target.credentials ? { credentials: target.credentials } : {}),
  });
  const prefix = target.prefix ? `${target.prefix.replace(/\/+$/, '')}/` : '';
  const name = (key: string) => prefix + checkKey(key);
  return {
    kind: 's3',
    async put(key, bytes, contentType) {
      await client.send(new PutObjectCommand({ Bucket: target.bucket, Key: name(key), Body: bytes, ContentType: contentType }));
    },
    async get(key) {
      try {
        const answer = await client.send(new GetObjectCommand({ Bucket: target.bucket, Key: name(key) }));
        return answer.Body ? await answer.Body.transformToByteArray() : undefined;
      } catch (error) {
        if (error instanceof NoSuchKey || (error as { name?: string }).name === 'NoSuchKey') return undefined;
        throw error;
      }
    },
    async delete(keys) {
      if (keys.length === 0) return;
      for (let i = 0; i < keys.length; i += 1000) {
        await client.send(new DeleteObjectsCommand({ Bucket: target.bucket, Delete: { Objects: keys.slice(i, i + 1000).map((key) => ({ Key: name(key) })), Quiet: true } }));
      }
    },
  };
}

/**
 * STORAGE_URL: s3://bucket/optional/prefix. The endpoint (for a store other than AWS) comes from
 * S3_ENDPOINT, credentials and region from the AWS SDK's usual variables (AWS_ACCESS_KEY_ID, ...).
 */
export function storageFromUrl(url: string, endpoint?: string): StorageTarget {
  const parsed = new URL(url);
  return { kind: 's3', bucket: parsed.hostname, prefix: parsed.pathname.replace(/^\/+/, '') || undefined, endpoint };
}
