/**
 * Where attachment bytes live, behind one small interface with two drivers: the local folder
 * (UPLOAD_DIR, the default; several instances may share it over a network mount) and an
 * S3-compatible object store (STORAGE_URL=s3://bucket[/prefix], through @aws-sdk/client-s3), so
 * every app instance serves every file. Every read is checked against the SHA-256 recorded at
 * upload: a changed or truncated object is never served.
 */
import { createHash } from 'node:crypto';
import { mkdir, readFile, unlink, writeFile, access } from 'node:fs/promises';
import { constants } from 'node:fs';
import { join } from 'node:path';
import {
  DeleteObjectCommand,
  GetObjectCommand,
  HeadBucketCommand,
  PutObjectCommand,
  S3Client,
} from '@aws-sdk/client-s3';
import type { Config } from '../env';

export interface Storage {
  /** 'local:/path' or 's3://bucket/prefix', for logs and the health report (no secrets). */
  readonly description: string;
  /** Stores new bytes under a fresh key (never overwrites). */
  put(key: string, bytes: Buffer, contentType: string): Promise<void>;
  /** The bytes under the key, verified against the SHA-256 given; throws ChecksumError when they differ. */
  get(key: string, sha256: string): Promise<Buffer>;
  /** Removes the bytes under the key; a key that is already gone is no error. */
  delete(key: string): Promise<void>;
  /** Resolves when the store is reachable (and writable for the local folder). */
  check(): Promise<void>;
}

export class ChecksumError extends Error {
  constructor(key: string) {
    super(`stored file ${key} does not match the checksum recorded at upload`);
  }
}

export class MissingObjectError extends Error {}

function verified(key: string, bytes: Buffer, sha256: string): Buffer {
  if (createHash('sha256').update(bytes).digest('hex') !== sha256) throw new ChecksumError(key);
  return bytes;
}

const SAFE_KEY = /^[A-Za-z0-9._-]{1,128}$/;

function assertKey(key: string): void {
  if (!SAFE_KEY.test(key) || key.startsWith('.'))
    throw new Error(`invalid storage key ${JSON.stringify(key)}`);
}

export function localStorage(dir: string): Storage {
  return {
    description: `local:${dir}`,
    async put(key, bytes) {
      assertKey(key);
      await mkdir(dir, { recursive: true });
      await writeFile(join(dir, key), bytes, { flag: 'wx', mode: 0o600 });
    },
    async get(key, sha256) {
      assertKey(key);
      const bytes = await readFile(join(dir, key)).catch((err: NodeJS.ErrnoException) => {
        throw err.code === 'ENOENT' ? new MissingObjectError(key) : err;
      });
      return verified(key, bytes, sha256);
    },
    async delete(key) {
      assertKey(key);
      // Already gone counts as deleted; any other failure (permissions, a lost mount) is the caller's.
      await unlink(join(dir, key)).catch((err: NodeJS.ErrnoException) => {
        if (err.code !== 'ENOENT') throw err;
      });
    },
    async check() {
      await mkdir(dir, { recursive: true });
      await access(dir, constants.W_OK | constants.R_OK);
    },
  };
}

export interface S3Settings {
  bucket: string;
  prefix: string;
  endpoint?: string;
  region: string;
  forcePathStyle: boolean;
}

export function parseStorageUrl(url: string): { bucket: string; prefix: string } {
  const m = /^s3:\/\/([^/]+)\/?(.*)$/.exec(url);
  if (!m) throw new Error('STORAGE_URL must be s3://bucket or s3://bucket/prefix');
  const prefix = m[2].replace(/\/+$/, '');
  return { bucket: m[1], prefix: prefix ? `${prefix}/` : '' };
}

export function s3Storage(settings: S3Settings, client?: S3Client): Storage {
  const s3 =
    client ??
    new S3Client({
      region: settings.region,
      endpoint: settings.endpoint,
      forcePathStyle: settings.forcePathStyle,
      // Credentials: the SDK's default chain (AWS_ACCESS_KEY_ID / AWS_SECRET_ACCESS_KEY, a profile, a role).
      // Our own SHA-256 check covers the bytes end to end; the SDK's extra CRC only when the store requires it.
      requestChecksumCalculation: 'WHEN_REQUIRED',
      responseChecksumValidation: 'WHEN_REQUIRED',
      maxAttempts: 3,
    });
  const Bucket = settings.bucket;
  const Key = (key: string) => `${settings.prefix}${key}`;
  return {
    description: `s3://${settings.bucket}/${settings.prefix}`,
    async put(key, bytes, contentType) {
      assertKey(key);
      await s3.send(
        new PutObjectCommand({
          Bucket,
          Key: Key(key),
          Body: bytes,
          ContentType: contentType,
          ContentLength: bytes.length,
          // Refused by the store when the key exists (stores that do not support it ignore it; keys are random).
          IfNoneMatch: '*',
        }),
      );
    },
    async get(key, sha256) {
      assertKey(key);
      try {
        const out = await s3.send(new GetObjectCommand({ Bucket, Key: Key(key) }));
        const bytes = Buffer.from(await out.Body!.transformToByteArray());
        return verified(key, bytes, sha256);
      } catch (err) {
        if ((err as { name?: string }).name === 'NoSuchKey') throw new MissingObjectError(key);
        throw err;
      }
    },
    async delete(key) {
      assertKey(key);
      await s3.send(new DeleteObjectCommand({ Bucket, Key: Key(key) }));
    },
    async check() {
      await s3.send(new HeadBucketCommand({ Bucket }));
    },
  };
}

/** The storage the configuration names: S3 when STORAGE_URL is set, else the local UPLOAD_DIR. */
export function createStorage(config: Pick<Config, 'storageUrl' | 's3' | 'uploadDir'>): Storage {
  if (config.storageUrl) {
    const { bucket, prefix } = parseStorageUrl(config.storageUrl);
    return s3Storage({
      bucket,
      prefix,
      endpoint: config.s3?.endpoint,
      region: config.s3?.region ?? 'us-east-1',
      forcePathStyle: config.s3?.forcePathStyle ?? Boolean(config.s3?.endpoint),
    });
  }
  return localStorage(config.uploadDir);
}
