import { createHash } from 'node:crypto';
import { existsSync, readdirSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import type { Response } from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createTestEnv, type TestEnv } from '../helpers/api';

const PNG = Buffer.from(
  'iVBORw0KGgoAAAANSUhEUgAAAAEAAAABCAYAAAAfFcSJAAAADUlEQVR42mNkYPhfDwAChwGA60e6kgAAAABJRU5ErkJggg==',
  'base64',
);
const PDF = Buffer.from(
  '%PDF-1.4\n1 0 obj << /Type /Catalog >> endobj\ntrailer << /Root 1 0 R >>\n%%EOF\n',
  'latin1',
);
const DXF = Buffer.from(
  '999\nmade by hand\n0\nSECTION\n2\nENTITIES\n0\nLINE\n8\n0\n10\n0.0\n20\n0.0\n11\n12.0\n21\n0.0\n0\nENDSEC\n0\nEOF\n',
);
const CSV = Buffer.from('mark,plate,thickness\nB1,24x16,1.5\nB2,24x16,1.5\n');
const EXE = Buffer.concat([Buffer.from('MZ'), Buffer.alloc(200, 0x90)]);
const HTML = Buffer.from('<!doctype html><html><body><script>alert(1)</script></body></html>');

const binaryParser = (res: Response, done: (err: Error | null, body: Buffer) => void) => {
  const chunks: Buffer[] = [];
  res.on('data', (c: Buffer) => chunks.push(c));
  res.on('end', () => done(null, Buffer.concat(chunks)));
};

describe('attachments', () => {
  let env: TestEnv;
  beforeAll(async () => {
    env = await createTestEnv();
  });
  afterAll(async () => env.close());

  const url = () => `/api/cantilevers/${env.cantileverId}/attachments`;

  it('stores a PDF and a PNG under random names with their checksums, typed from the content', async () => {
    const fabricator = await env.login('fabricator');
    const pdf = await fabricator.post(url()).attach('file', PDF, 'shop drawing.pdf').expect(201);
    expect(pdf.body).toMatchObject({
      cantileverId: env.cantileverId,
      originalName: 'shop drawing.pdf',
      mimeType: 'application/pdf',
      size: PDF.length,
      sha256: createHash('sha256').update(PDF).digest('hex'),
      uploaderId: env.ids.fabricator,
      uploaderName: 'Test Fabricator',
    });
    const png = await fabricator.post(url()).attach('file', PNG, 'site photo.PNG').expect(201);
    expect(png.body.mimeType).toBe('image/png');
    const stored = readdirSync(env.config.uploadDir);
    expect(stored).toHaveLength(2);
    for (const name of stored) expect(name).toMatch(/^[0-9a-f-]{36}$/);
    const list = await fabricator.get(url()).expect(200);
    expect(list.body.map((a: { originalName: string }) => a.originalName).sort()).toEqual([
      'shop drawing.pdf',
      'site photo.PNG',
    ]);
  });

  it('accepts a DXF drawing and a CSV table after a structural sniff', async () => {
    const architect = await env.login('architect');
    expect((await architect.post(url()).attach('file', DXF, 'plate.dxf').expect(201)).body.mimeType).toBe(
      'image/vnd.dxf',
    );
    expect((await architect.post(url()).attach('file', CSV, 'schedule.csv').expect(201)).body.mimeType).toBe(
      'text/csv',
    );
  });

  it('refuses disguised files with 400 naming the field `file`', async () => {
    const engineer = await env.login('engineer');
    const cases: [Buffer, string][] = [
      [EXE, 'drawing.png'],
      [HTML, 'photo.png'],
      [HTML, 'table.csv'],
      [CSV, 'drawing.dxf'],
      [Buffer.from('just some words'), 'notes.txt'],
    ];
    for (const [bytes, name] of cases) {
      const res = await engineer.post(url()).attach('file', bytes, name);
      expect(res.status, name).toBe(400);
      expect(res.body.error.issues[0].path, name).toBe('file');
    }
    const none = await engineer.post(url()).field('note', 'no file');
    expect(none.status).toBe(400);
    expect(none.body.error.issues[0].path).toBe('file');
  });

  it('answers 413 in the error shape for a file over the size limit and keeps nothing', async () => {
    const engineer = await env.login('engineer');
    const before = readdirSync(env.config.uploadDir).length;
    const big = Buffer.concat([PDF, Buffer.alloc(env.config.attachmentMaxBytes, 0x20)]);
    const res = await engineer.post(url()).attach('file', big, 'huge.pdf');
    expect(res.status).toBe(413);
    expect(res.body.error).toMatchObject({
      code: 'too_large',
      issues: [{ path: 'file', message: expect.any(String) }],
    });
    expect(readdirSync(env.config.uploadDir)).toHaveLength(before);
  });

  it('refuses an upload by an admin (403)', async () => {
    const admin = await env.login('admin');
    const res = await admin.post(url()).attach('file', PDF, 'a.pdf');
    expect(res.status).toBe(403);
  });

  it('downloads the identical bytes for a member, as an attachment with nosniff, or inline on request', async () => {
    const architect = await env.login('architect');
    const [row] = await env.db('attachments').where({ original_name: 'site photo.PNG' });
    const res = await architect
      .get(`/api/attachments/${row.id}`)
      .buffer(true)
      .parse(binaryParser)
      .expect(200);
    expect(Buffer.compare(res.body as Buffer, PNG)).toBe(0);
    expect(res.headers['content-type']).toBe('image/png');
    expect(res.headers['content-disposition']).toMatch(/^attachment; filename="site photo.PNG"/);
    expect(res.headers['x-content-type-options']).toBe('nosniff');
    const inline = await architect
      .get(`/api/attachments/${row.id}?inline=1`)
      .buffer(true)
      .parse(binaryParser)
      .expect(200);
    expect(inline.headers['content-disposition']).toMatch(/^inline/);
    const [csv] = await env.db('attachments').where({ original_name: 'schedule.csv' });
    const csvInline = await architect
      .get(`/api/attachments/${csv.id}?inline=1`)
      .buffer(true)
      .parse(binaryParser)
      .expect(200);
    expect(csvInline.headers['content-disposition']).toMatch(/^attachment/);
    expect(existsSync(join(env.config.uploadDir, row.stored_name))).toBe(true);
    expect(Buffer.compare(readFileSync(join(env.config.uploadDir, row.stored_name)), PNG)).toBe(0);
  });

  it('answers 404 to a non-member for list, download and upload', async () => {
    const outsider = await env.login('outsider');
    const [row] = await env.db('attachments').limit(1);
    await outsider.get(url()).expect(404);
    await outsider.get(`/api/attachments/${row.id}`).expect(404);
    await outsider.get('/api/attachments/99999').expect(404);
    const upload = await outsider.post(url()).attach('file', PDF, 'x.pdf');
    expect(upload.status).toBe(404);
  });
});
