import { createHash } from 'node:crypto';
import { existsSync, statSync } from 'node:fs';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { CAUTION, type DesignResult } from '../../shared/engine/types';
import { capitalised, checkWord } from '../../shared/words/check-words';
import { createTestEnv, type TestEnv } from '../helpers/api';
import { pageTexts, pdfText, renderFirstPage } from '../helpers/pdf-text';

const sha = (text: string) => createHash('sha256').update(text).digest('hex');
/** pdftotext may break a long line; compare with whitespace squeezed out. */
const flat = (text: string) => text.replace(/\s+/g, ' ');

function binary(res: { body: unknown }): Buffer {
  return res.body as Buffer;
}

function getPdf(agent: Awaited<ReturnType<TestEnv['login']>>, id: number) {
  return agent
    .get(`/api/revisions/${id}/package.pdf`)
    .buffer(true)
    .parse((res, cb) => {
      const chunks: Buffer[] = [];
      res.on('data', (c: Buffer) => chunks.push(c));
      res.on('end', () => cb(null, Buffer.concat(chunks)));
    });
}

describe('the calculation package of a stored revision', () => {
  let env: TestEnv;
  beforeAll(async () => {
    env = await createTestEnv();
  });
  afterAll(async () => env.close());

  it('holds every check title, clause and stored ratio, the revision number and both SHA-256 values; a draft is preliminary on every page', async () => {
    const engineer = await env.login('engineer');
    const res = await getPdf(engineer, env.revisionId).expect(200);
    expect(res.headers['content-type']).toBe('application/pdf');
    expect(res.headers['content-disposition']).toMatch(/package-test-beam-rev1\.pdf/);
    const pdf = binary(res);
    expect(pdf.subarray(0, 5).toString()).toBe('%PDF-');
    const row = await env.db('revisions').where({ id: env.revisionId }).first();
    const result = JSON.parse(row.result_json) as DesignResult;
    const text = flat(pdfText(pdf));
    expect(result.checks.length).toBeGreaterThan(5);
    for (const c of result.checks) {
      expect(text).toContain(c.title);
      expect(text).toContain(c.id);
      expect(text).toContain(flat(c.reference));
      // The check's own block (from its id to the next block) shows its stored ratio.
      const block = text.slice(text.indexOf(`(${c.id})`)).split(/\(\w+\.\w+(?:\.\w+)?\)/)[1] ?? '';
      if (c.ratio !== null) expect(block).toContain(`Ratio Verdict`);
      if (c.ratio !== null)
        // The verdict in the words of the desk (shared/words/check-words.ts).
        expect(block).toContain(` ${c.ratio.toFixed(2)} ${capitalised(checkWord(c))}`);
    }
    expect(text).toContain('Revision 1 of 1');
    expect(text).toContain(sha(row.input_json));
    expect(text).toContain(sha(row.result_json));
    expect(text).toContain('Test terrace');
    expect(text).toContain('Test site');
    const pages = pageTexts(pdf);
    expect(pages.length).toBeGreaterThan(4);
    pages.forEach((page, i) => {
      const p = flat(page);
      expect(p).toContain('PRELIMINARY, NOT FOR CONSTRUCTION');
      expect(p).toContain(`Page ${i + 1} of ${pages.length}`);
      expect(p).toContain(CAUTION);
      expect(p).toContain('Revision 1 of 1');
    });
    const png = join(process.cwd(), 'tests/output/screens/package-page1.png');
    renderFirstPage(pdf, png);
    expect(existsSync(png) && statSync(png).size > 5000).toBe(true);
  });

  it('gives the same bytes for the same revision, every time', async () => {
    const fabricator = await env.login('fabricator');
    const a = binary(await getPdf(fabricator, env.revisionId).expect(200));
    const b = binary(await getPdf(fabricator, env.revisionId).expect(200));
    expect(a.length).toBeGreaterThan(10_000);
    expect(sha(a.toString('latin1'))).toBe(sha(b.toString('latin1')));
    expect(a.equals(b)).toBe(true);
  });

  it('answers 404 to a non-member and for a revision that does not exist', async () => {
    const outsider = await env.login('outsider');
    await outsider.get(`/api/revisions/${env.revisionId}/package.pdf`).expect(404);
    const engineer = await env.login('engineer');
    await engineer.get('/api/revisions/999999/package.pdf').expect(404);
  });

  it('carries "Approved by NAME on DATE" on every page once approved', async () => {
    const architect = await env.login('architect');
    await architect.post(`/api/revisions/${env.revisionId}/submit`).expect(200);
    const engineer = await env.login('engineer');
    const approved = await engineer
      .post(`/api/revisions/${env.revisionId}/reviews`)
      .send({ decision: 'approve', comment: 'Fine.' })
      .expect(201);
    const date = String(approved.body.reviews.at(-1).createdAt).slice(0, 10);
    const pages = pageTexts(binary(await getPdf(engineer, env.revisionId).expect(200)));
    for (const page of pages) {
      expect(flat(page)).toContain(`Approved by Test Engineer on ${date}`);
      expect(page).not.toContain('PRELIMINARY');
    }
  });
});
