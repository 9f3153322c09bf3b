import { createHash } from 'node:crypto';
import { existsSync, readdirSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import type { Response } from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { insertCantilever } from '../../server/features/cantilevers/cantilevers.repository';
import { cantileverForMember } from '../../server/features/projects/project-access';
import { saveRevision } from '../../server/features/revisions/revisions.service';
import { findUserById, toUserDto } from '../../server/features/users/users.repository';
import { baseDesign, createTestEnv, type TestEnv } from '../helpers/api';
import { createRevisionSchema } from '../../shared/schemas/api';

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
      // The accepted types are listed once, in the message, not again in the field's reason.
      expect(res.body.error.message.match(/PDF, PNG, JPEG, DXF or CSV/g), name).toHaveLength(1);
      expect(res.body.error.issues[0].message, name).not.toMatch(/PDF, PNG/);
    }
    const none = await engineer.post(url()).field('note', 'no file');
    expect(none.status).toBe(400);
    expect(none.body.error.issues[0].path).toBe('file');
  });

  it('refuses a file whose content and extension disagree, naming both, and keeps nothing', async () => {
    const engineer = await env.login('engineer');
    const before = readdirSync(env.config.uploadDir).length;
    const rows = (await env.db('attachments').count({ n: '*' }))[0]!.n;
    const cases: [Buffer, string, RegExp][] = [
      [PNG, 'really-a-png.pdf', /content is a PNG image but its name has \.pdf; rename it to \.png/],
      [PDF, 'scan.png', /content is a PDF document but its name has \.png/],
      [PNG, 'photo.jpg', /content is a PNG image but its name has \.jpg/],
      [PNG, 'no-extension', /content is a PNG image but its name has no extension/],
      [PDF, 'plate.dxf', /content is a PDF document but its name has \.dxf/],
    ];
    for (const [bytes, name, reason] of cases) {
      const res = await engineer.post(url()).attach('file', bytes, name);
      expect(res.status, name).toBe(400);
      expect(res.body.error.issues, name).toEqual([{ path: 'file', message: expect.stringMatching(reason) }]);
      expect(res.body.error.message, name).toMatch(/^The file was refused: /);
    }
    expect(readdirSync(env.config.uploadDir)).toHaveLength(before);
    expect((await env.db('attachments').count({ n: '*' }))[0]!.n).toBe(rows);
    // The same bytes under a name that agrees are accepted (a JPEG may be .jpg or .jpeg).
    const ok = await engineer.post(url()).attach('file', PNG, 'really-a-png.png').expect(201);
    expect(ok.body.originalName).toBe('really-a-png.png');
  });

  it('keeps a clean name: no path, invisible or unsafe characters, runs of spaces or leading dots', async () => {
    const engineer = await env.login('engineer');
    const cases: [string, string][] = [
      ['C:\\Users\\pat\\Desktop\\pier  detail.pdf', 'pier detail.pdf'],
      // A right-to-left override would make the name read backwards in a list.
      ['site\u202Egnp.pdf', 'sitegnp.pdf'],
      ['  ..plate: B1 <rev 2>?.pdf ', 'plate_ B1 _rev 2__.pdf'],
      ['\u200Bbeam\uFEFF.pdf', 'beam.pdf'],
      ['.pdf', 'file.pdf'],
      [`${'x'.repeat(300)}.pdf`, `${'x'.repeat(251)}.pdf`],
    ];
    for (const [sent, kept] of cases) {
      const res = await engineer.post(url()).attach('file', PDF, sent);
      expect(res.status, sent).toBe(201);
      expect(res.body.originalName, sent).toBe(kept);
      const row = await env.db('attachments').where({ id: res.body.id }).first();
      expect(row.original_name).toBe(kept);
      expect(row.stored_name).toMatch(/^[0-9a-f-]{36}$/);
    }
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

describe('attachment details and deletion', () => {
  let env: TestEnv;
  let otherRevisionId: number;
  let secondRevisionId: number;
  beforeAll(async () => {
    env = await createTestEnv();
    // A second revision of the test cantilever, and a revision of another cantilever.
    const architect = await env.login('architect');
    const next = await architect
      .post(`/api/cantilevers/${env.cantileverId}/revisions`)
      .send({ baseRevision: 1, message: 'Second design', input: baseDesign() })
      .expect(201);
    secondRevisionId = next.body.id as number;
    const other = await insertCantilever(env.db, {
      projectId: env.projectId,
      name: 'Other beam',
      description: '',
    });
    const saved = await saveRevision(
      env.db,
      toUserDto((await findUserById(env.db, env.ids.architect))!),
      await cantileverForMember(env.db, other, env.ids.architect),
      createRevisionSchema.parse({ baseRevision: null, message: 'Other first', input: baseDesign() }),
    );
    otherRevisionId = saved.id;
  });
  afterAll(async () => env.close());

  const url = () => `/api/cantilevers/${env.cantileverId}/attachments`;
  const upload = async (person: 'architect' | 'fabricator' | 'engineer', name = 'detail.pdf') => {
    const agent = await env.login(person);
    return (await agent.post(url()).attach('file', PDF, name).expect(201)).body as { id: number };
  };

  it('takes an optional description and revision with the upload and lists them', async () => {
    const fabricator = await env.login('fabricator');
    const res = await fabricator
      .post(url())
      .field('description', '  Shop drawing of the base plate, sheet 2  ')
      .field('revisionId', String(secondRevisionId))
      .attach('file', PDF, 'plate sheet 2.pdf')
      .expect(201);
    expect(res.body).toMatchObject({
      description: 'Shop drawing of the base plate, sheet 2',
      revisionId: secondRevisionId,
      revisionNumber: 2,
    });
    const plain = await fabricator
      .post(url())
      .field('revisionId', '')
      .attach('file', PDF, 'plain.pdf')
      .expect(201);
    expect(plain.body).toMatchObject({ description: '', revisionId: null, revisionNumber: null });
    const list = await fabricator.get(url()).expect(200);
    expect(list.body.find((a: { id: number }) => a.id === res.body.id)).toMatchObject({
      description: 'Shop drawing of the base plate, sheet 2',
      revisionNumber: 2,
    });
  });

  it('refuses a revision of another cantilever, an unknown one and a description over 500 characters', async () => {
    const fabricator = await env.login('fabricator');
    const before = readdirSync(env.config.uploadDir).length;
    for (const revisionId of [otherRevisionId, 99999]) {
      const res = await fabricator
        .post(url())
        .field('revisionId', String(revisionId))
        .attach('file', PDF, 'x.pdf');
      expect(res.status).toBe(400);
      expect(res.body.error.issues).toEqual([
        { path: 'revisionId', message: 'is not a revision of this cantilever' },
      ]);
    }
    const notNumber = await fabricator.post(url()).field('revisionId', 'two').attach('file', PDF, 'x.pdf');
    expect(notNumber.status).toBe(400);
    expect(notNumber.body.error.issues[0].path).toBe('revisionId');
    const long = await fabricator
      .post(url())
      .field('description', 'é'.repeat(501))
      .attach('file', PDF, 'x.pdf');
    expect(long.status).toBe(400);
    expect(long.body.error.issues).toEqual([
      { path: 'description', message: 'must be at most 500 characters' },
    ]);
    const ok = await fabricator
      .post(url())
      .field('description', 'é'.repeat(500))
      .attach('file', PDF, 'x.pdf');
    expect(ok.status).toBe(201);
    expect(readdirSync(env.config.uploadDir)).toHaveLength(before + 1);
  });

  it('lets the uploader change the description and revision; nobody else', async () => {
    const { id } = await upload('architect');
    const architect = await env.login('architect');
    const changed = await architect
      .patch(`/api/attachments/${id}`)
      .send({ description: 'Pier elevation', revisionId: env.revisionId })
      .expect(200);
    expect(changed.body).toMatchObject({
      description: 'Pier elevation',
      revisionId: env.revisionId,
      revisionNumber: 1,
    });
    const cleared = await architect.patch(`/api/attachments/${id}`).send({ revisionId: null }).expect(200);
    expect(cleared.body).toMatchObject({ description: 'Pier elevation', revisionId: null });
    const foreign = await architect.patch(`/api/attachments/${id}`).send({ revisionId: otherRevisionId });
    expect(foreign.status).toBe(400);
    expect(foreign.body.error.issues[0].path).toBe('revisionId');
    const tooLong = await architect.patch(`/api/attachments/${id}`).send({ description: 'x'.repeat(501) });
    expect(tooLong.status).toBe(400);
    expect(tooLong.body.error.issues[0].path).toBe('description');
    for (const person of ['engineer', 'admin'] as const) {
      const other = await env.login(person);
      expect((await other.patch(`/api/attachments/${id}`).send({ description: 'mine now' })).status).toBe(
        403,
      );
    }
    const outsider = await env.login('outsider');
    expect((await outsider.patch(`/api/attachments/${id}`).send({ description: 'x' })).status).toBe(404);
    expect((await env.db('attachments').where({ id }).first()).description).toBe('Pier elevation');
  });

  it('deletes a file for its uploader or an admin (the row and the stored bytes, with an audit row); 403 to others', async () => {
    const mine = await upload('fabricator', 'mine.pdf');
    const theirs = await upload('engineer', 'theirs.pdf');
    const stored = async (id: number) =>
      (await env.db('attachments').where({ id }).first())?.stored_name as string;
    const mineKey = await stored(mine.id);
    const theirsKey = await stored(theirs.id);
    expect(existsSync(join(env.config.uploadDir, mineKey))).toBe(true);

    for (const person of ['architect', 'engineer'] as const) {
      const agent = await env.login(person);
      const res = await agent.delete(`/api/attachments/${mine.id}`);
      expect(res.status, person).toBe(403);
    }
    const outsider = await env.login('outsider');
    expect((await outsider.delete(`/api/attachments/${mine.id}`)).status).toBe(404);
    expect(existsSync(join(env.config.uploadDir, mineKey))).toBe(true);

    const fabricator = await env.login('fabricator');
    await fabricator.delete(`/api/attachments/${mine.id}`).expect(204);
    expect(await env.db('attachments').where({ id: mine.id }).first()).toBeUndefined();
    expect(existsSync(join(env.config.uploadDir, mineKey))).toBe(false);
    await fabricator.get(`/api/attachments/${mine.id}`).expect(404);
    await fabricator.delete(`/api/attachments/${mine.id}`).expect(404);

    const admin = await env.login('admin');
    await admin.delete(`/api/attachments/${theirs.id}`).expect(204);
    expect(existsSync(join(env.config.uploadDir, theirsKey))).toBe(false);
    const list = await fabricator.get(url()).expect(200);
    expect(list.body.map((a: { id: number }) => a.id)).not.toContain(theirs.id);

    const audit = await env.db('audit').where({ kind: 'attachment-deleted' }).orderBy('id');
    expect(audit.map((a) => [a.user_id, a.subject])).toEqual([
      [env.ids.fabricator, 'mine.pdf'],
      [env.ids.admin, 'theirs.pdf'],
    ]);
    expect(audit[1].detail).toMatch(
      new RegExp(`^attachment ${theirs.id} of cantilever ${env.cantileverId}, sha256 [0-9a-f]{64}$`),
    );
  });
});
