// Where batch photos live: a small interface with an S3-compatible object store behind it in
// every deployment, and the local disk for a single machine (and for photos from before the store).
import { access, constants, mkdir, readFile, rm, writeFile } from 'node:fs/promises';
import path from 'node:path';
import {
  DeleteObjectCommand,
  GetObjectCommand,
  HeadBucketCommand,
  NoSuchKey,
  PutObjectCommand,
  S3Client,
} from '@aws-sdk/client-s3';
import type { Config } from '../config';

export interface PhotoStorage {
  /** what the readiness route names */
  readonly kind: 's3' | 'disk';
  save(key: string, bytes: Buffer, contentType: string): Promise<void>;
  /** null when nothing is stored under the key */
  read(key: string): Promise<Buffer | null>;
  remove(key: string): Promise<void>;
  /** throws when the store does not answer (the readiness route) */
  check(): Promise<void>;
}

/** `<household>/<photo>/<size>.webp` for re-encoded photos; `<household>/<photo>.<ext>` for photos kept as uploaded before. */
const SAFE_KEY = /^[0-9a-f-]{36}\/[0-9a-f-]{36}(\/(small|large)\.webp|\.(jpg|png|webp))$/;

function checkedKey(key: string) {
  if (!SAFE_KEY.test(key)) throw new Error(`refusing a photo key outside the storage layout: ${key}`);
  return key;
}

/** The store the configuration names: the object store when S3_BUCKET is set, else the local folder. */
export function photoStorageFor(config: Config): PhotoStorage {
  return config.s3 ? objectStorage(config.s3) : localDiskStorage(config.uploadDir);
}

/** Photos on local disk, in a folder outside the web root; the app serves them only to members. */
export function localDiskStorage(root: string): PhotoStorage {
  const base = path.resolve(root);
  const fileFor = (key: string) => path.join(base, checkedKey(key));
  return {
    kind: 'disk',
    async save(key, bytes) {
      const file = fileFor(key);
      await mkdir(path.dirname(file), { recursive: true });
      await writeFile(file, bytes);
    },
    async read(key) {
      try {
        return await readFile(fileFor(key));
      } catch (error) {
        if ((error as NodeJS.ErrnoException).code === 'ENOENT') return null;
        throw error;
      }
    },
    async remove(key) {
      await rm(fileFor(key), { force: true });
    },
    async check() {
      await mkdir(base, { recursive: true });
      await access(base, constants.W_OK);
    },
  };
}

export type ObjectStoreSettings = NonNullable<Config['s3']>;

/**
 * Photos in an S3-compatible bucket. Objects are written without an ACL, so they stay as private
 * as the bucket; members get them only through the app's own authorised route.
 */
export function objectStorage(settings: ObjectStoreSettings): PhotoStorage {
  const client = new S3Client({
    endpoint: settings.endpoint,
    region: settings.region,
    forcePathStyle: settings.forcePathStyle,
    credentials: settings.credentials,
    // Checksums only where S3 requires them: several S3-compatible stores refuse the newer trailers.
    requestChecksumCalculation: 'WHEN_REQUIRED',
    responseChecksumValidation: 'WHEN_REQUIRED',
    maxAttempts: 3,
  });
  const Bucket = settings.bucket;
  return {
    kind: 's3',
    async save(key, bytes, contentType) {
      await client.send(new PutObjectCommand({ Bucket, Key: checkedKey(key), Body: bytes, ContentType: contentType }));
    },
    async read(key) {
      try {
        const object = await client.send(new GetObjectCommand({ Bucket, Key: checkedKey(key) }));
        return object.Body ? Buffer.from(await object.Body.transformToByteArray()) : null;
      } catch (error) {
        if (
          error instanceof NoSuchKey ||
          (error as { $metadata?: { httpStatusCode?: number } }).$metadata?.httpStatusCode === 404
        )
          return null;
        throw error;
      }
    },
    async remove(key) {
      await client.send(new DeleteObjectCommand({ Bucket, Key: checkedKey(key) }));
    },
    async check() {
      await client.send(new HeadBucketCommand({ Bucket }), { abortSignal: AbortSignal.timeout(3_000) });
    },
  };
}
