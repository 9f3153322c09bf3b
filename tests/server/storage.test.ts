/**
 * Attachment storage: the local folder and the S3 driver (against the local fake in
 * tests/helpers/fake-s3.ts) behave alike, never overwrite, and verify the SHA-256 on every read;
 * through the API, a file stored in the object store downloads intact and a corrupted one is
 * refused rather than served.
 */
import { createHash } from 'node:crypto';
import { readdirSync, writeFileSync } from 'node:fs';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import {
  ChecksumError,
  MissingObjectError,
  localStorage,
  s3Storage,
  type Storage,
} from '../../server/storage/storage';
import { createTestEnv, type TestEnv } from '../helpers/api';
import { startFakeS3, type FakeS3 } from '../helpers/fake-s3';

const sha = (b: Buffer) => createHash('sha256').update(b).digest('hex');
const CSV = Buffer.from('mark,plate,thickness\nB1,24x16,1.5\n');

let fake: FakeS3;
const saved = { id: process.env.AWS_ACCESS_KEY_ID, secret: process.env.AWS_SECRET_ACCESS_KEY };
beforeAll(async () => {
  fake = await startFakeS3(['reachline-files']);
  process.env.AWS_ACCESS_KEY_ID = 'test-key';
  process.env.AWS_SECRET_ACCESS_KEY = 'test-secret';
});
afterAll(async () => {
  await fake.close();
  for (const [name, value] of [
    ['AWS_ACCESS_KEY_ID', saved.id],
    ['AWS_SECRET_ACCESS_KEY', saved.secret],
  ] as const) {
    if (value === undefined) delete process.env[name];
    else process.env[name] = value;
  }
});

describe.each(['local', 's3'] as const)('the %s storage driver', (kind) => {
  let storage: Storage;
  let env: TestEnv;
  let corrupt: (key: string) => void;
  beforeAll(async () => {
    env = await createTestEnv();
    if (kind === 'local') {
      storage = localStorage(env.config.uploadDir);
      corrupt = (key) => writeFileSync(`${env.config.uploadDir}/${key}`, 'changed');
    } else {
      storage = s3Storage({
        bucket: 'reachline-files',
        prefix: 'unit/',
        endpoint: fake.url,
        region: 'us-east-1',
        forcePathStyle: true,
      });
      corrupt = (key) => {
        fake.objects.get(`reachline-files/unit/${key}`)!.body = Buffer.from('changed');
      };
    }
  });
  afterAll(async () => env.close());

  it('stores, reads back verified, refuses an overwrite, reports missing and corrupted objects', async () => {
    await storage.check();
    await storage.put('k1', CSV, 'text/csv');
    expect(await storage.get('k1', sha(CSV))).toEqual(CSV);
    await expect(storage.put('k1', Buffer.from('other'), 'text/csv')).rejects.toThrow();
    expect(await storage.get('k1', sha(CSV))).toEqual(CSV);
    await expect(storage.get('nothing', sha(CSV))).rejects.toBeInstanceOf(MissingObjectError);
    await expect(storage.get('k1', sha(Buffer.from('something else')))).rejects.toBeInstanceOf(ChecksumError);
    corrupt('k1');
    await expect(storage.get('k1', sha(CSV))).rejects.toBeInstanceOf(ChecksumError);
    await storage.delete('k1');
    await expect(storage.get('k1', sha(CSV))).rejects.toBeInstanceOf(MissingObjectError);
    await expect(storage.put('../escape', CSV, 'text/csv')).rejects.toThrow(/invalid storage key/);
  });
});

describe('attachments in an S3-compatible store (STORAGE_URL)', () => {
  let env: TestEnv;
  beforeAll(async () => {
    env = await createTestEnv({
      config: {
        storageUrl: 's3://reachline-files/attachments',
        s3: { endpoint: fake.url, region: 'us-east-1', forcePathStyle: true },
      },
    });
  });
  afterAll(async () => env.close());

  it('uploads to the bucket (nothing on local disk), downloads intact, refuses a corrupted object', async () => {
    const architect = await env.login('architect');
    const up = await architect
      .post(`/api/cantilevers/${env.cantileverId}/attachments`)
      .attach('file', CSV, 'schedule.csv')
      .expect(201);
    const row = await env.db('attachments').where({ id: up.body.id }).first();
    const key = `reachline-files/attachments/${row.stored_name}`;
    expect(fake.objects.get(key)?.body).toEqual(CSV);
    expect(() => readdirSync(env.config.uploadDir)).toThrow();
    const down = await architect
      .get(`/api/attachments/${up.body.id}`)
      .buffer(true)
      .parse((res, done) => {
        const chunks: Buffer[] = [];
        res.on('data', (c: Buffer) => chunks.push(c));
        res.on('end', () => done(null, Buffer.concat(chunks)));
      })
      .expect(200);
    expect(down.body).toEqual(CSV);
    fake.objects.get(key)!.body = Buffer.from('mark,plate,thickness\nB1,24x16,0.5\n');
    const bad = await architect.get(`/api/attachments/${up.body.id}`).expect(500);
    expect(bad.body.error.code).toBe('checksum_mismatch');
  });
});

describe('deleting an attachment through the API, with either driver', () => {
  it.each(['local', 's3'] as const)('removes the stored bytes and the row (%s)', async (kind) => {
    const env = await createTestEnv(
      kind === 's3'
        ? {
            config: {
              storageUrl: 's3://reachline-files/deleting',
              s3: { endpoint: fake.url, region: 'us-east-1', forcePathStyle: true },
            },
          }
        : {},
    );
    try {
      const architect = await env.login('architect');
      const up = await architect
        .post(`/api/cantilevers/${env.cantileverId}/attachments`)
        .attach('file', CSV, 'schedule.csv')
        .expect(201);
      const row = await env.db('attachments').where({ id: up.body.id }).first();
      const present = () =>
        kind === 's3'
          ? fake.objects.has(`reachline-files/deleting/${row.stored_name}`)
          : readdirSync(env.config.uploadDir).includes(row.stored_name as string);
      expect(present()).toBe(true);
      await architect.delete(`/api/attachments/${up.body.id}`).expect(204);
      expect(present()).toBe(false);
      expect(await env.db('attachments').where({ id: up.body.id }).first()).toBeUndefined();
    } finally {
      await env.close();
    }
  });
});
