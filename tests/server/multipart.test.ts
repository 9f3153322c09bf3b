/**
 * Malformed multipart bodies: each answers 400 naming `file`, with no stack trace in
 * the answer and one warn line in the log; UTF-8 file names are kept; field and part limits hold
 * on every multipart route.
 */
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it, vi } from 'vitest';
import { createTestEnv, type TestEnv } from '../helpers/api';

const PDF = Buffer.from('%PDF-1.4\n1 0 obj << /Type /Catalog >> endobj\ntrailer << /Root 1 0 R >>\n%%EOF\n');

describe('multipart uploads', () => {
  let env: TestEnv;
  let cookie: string;
  beforeAll(async () => {
    env = await createTestEnv();
    const login = await request(env.app)
      .post('/api/auth/login')
      .send({ email: 'engineer@example.test', password: 'correct horse battery' })
      .expect(200);
    cookie = String(login.headers['set-cookie']).split(';')[0];
  });
  afterAll(async () => env.close());

  const routes = () => [`/api/cantilevers/${env.cantileverId}/attachments`, '/api/shapes/import'];

  function raw(path: string, contentType: string, body: string | Buffer) {
    return request(env.app).post(path).set('Cookie', cookie).set('Content-Type', contentType).send(body);
  }

  const B = 'XyZboundary';
  const cases: [string, string, string][] = [
    [
      'no boundary',
      'multipart/form-data',
      `--${B}\r\nContent-Disposition: form-data; name="file"; filename="a.csv"\r\n\r\nx\r\n--${B}--\r\n`,
    ],
    [
      'a truncated part',
      `multipart/form-data; boundary=${B}`,
      `--${B}\r\nContent-Disposition: form-data; name="file"; filename="a.csv"\r\n\r\nlabel,family\r\nRL1,W`,
    ],
    [
      'a NUL in the file name',
      `multipart/form-data; boundary=${B}`,
      `--${B}\r\nContent-Disposition: form-data; name="file"; filename="a\u0000.pdf"\r\n\r\n%PDF-1.4\r\n--${B}--\r\n`,
    ],
    [
      'a second file',
      `multipart/form-data; boundary=${B}`,
      `--${B}\r\nContent-Disposition: form-data; name="file"; filename="a.csv"\r\n\r\nx\r\n--${B}\r\nContent-Disposition: form-data; name="file"; filename="b.csv"\r\n\r\ny\r\n--${B}--\r\n`,
    ],
    [
      'too many fields',
      `multipart/form-data; boundary=${B}`,
      Array.from(
        { length: 12 },
        (_, i) => `--${B}\r\nContent-Disposition: form-data; name="f${i}"\r\n\r\nv\r\n`,
      ).join('') + `--${B}--\r\n`,
    ],
    [
      'a field larger than 1 KiB',
      `multipart/form-data; boundary=${B}`,
      `--${B}\r\nContent-Disposition: form-data; name="projectId"\r\n\r\n${'9'.repeat(1024 * 1024)}\r\n--${B}--\r\n`,
    ],
  ];

  for (const [what, type, body] of cases) {
    it(`answers 400 naming file to ${what}, on every multipart route, logged once at warn`, async () => {
      for (const path of routes()) {
        const warn = vi.spyOn(console, 'warn').mockImplementation(() => undefined);
        const res = await raw(path, type, body);
        expect(res.status, `${path}: ${JSON.stringify(res.body)}`).toBe(400);
        expect(res.body.error.issues[0].path).toBe('file');
        expect(JSON.stringify(res.body)).not.toMatch(/\bat .*\.(js|ts):\d+/);
        expect(warn).toHaveBeenCalledTimes(1);
        expect(String(warn.mock.calls[0][0])).not.toMatch(/\n\s+at /);
        warn.mockRestore();
      }
    });
  }

  it('keeps a UTF-8 file name as it was sent, and sends it back on download', async () => {
    const name = 'Détail façade — plan 東.pdf';
    const res = await request(env.app)
      .post(`/api/cantilevers/${env.cantileverId}/attachments`)
      .set('Cookie', cookie)
      .attach('file', PDF, name)
      .expect(201);
    expect(res.body.originalName).toBe(name);
    const list = await request(env.app)
      .get(`/api/cantilevers/${env.cantileverId}/attachments`)
      .set('Cookie', cookie)
      .expect(200);
    expect(list.body.map((a: { originalName: string }) => a.originalName)).toContain(name);
    const file = await request(env.app)
      .get(`/api/attachments/${res.body.id}`)
      .set('Cookie', cookie)
      .expect(200);
    expect(String(file.headers['content-disposition'])).toContain(
      `filename*=UTF-8''${encodeURIComponent(name).replace(/'/g, '%27')}`,
    );
  });
});
