import { mkdtempSync, readFileSync, utimesSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import type { CliIo } from '../../server/cli/check-command';
import { main } from '../../server/cli/main';
import { checkDocument } from '../../shared/engine/check-document';
import { exampleDesign } from '../../shared/engine/examples';
import { pageTexts, pdfText } from '../helpers/pdf-text';

const dir = mkdtempSync(join(tmpdir(), 'reachline-report-'));

async function run(args: string[]) {
  let err = '';
  const io: CliIo = { out: () => undefined, err: (t) => void (err += t), readStdin: async () => '' };
  return { code: await main(args, io), err };
}

describe('reachline report design.json -o out.pdf', () => {
  it('writes a preliminary package with every check of the engine run on the file, the same bytes twice', async () => {
    const file = join(dir, 'east-deck.json');
    writeFileSync(file, JSON.stringify(exampleDesign));
    utimesSync(file, new Date('2026-11-30T10:00:00Z'), new Date('2026-11-30T10:00:00Z'));
    const out = join(dir, 'east-deck.pdf');
    const r = await run(['report', file, '-o', out]);
    expect(r.code).toBe(0);
    expect(r.err).toMatch(/preliminary package/);
    const pdf = readFileSync(out);
    const text = pdfText(pdf).replace(/\s+/g, ' ');
    const outcome = checkDocument(exampleDesign);
    if (!outcome.ok) throw new Error('the example design must compute');
    for (const c of outcome.result.checks) {
      expect(text).toContain(c.title);
      if (c.ratio !== null) expect(text).toContain(c.ratio.toFixed(2));
    }
    for (const page of pageTexts(pdf)) expect(page).toContain('PRELIMINARY, NOT FOR CONSTRUCTION');
    await run(['report', file, '-o', join(dir, 'again.pdf')]);
    expect(readFileSync(join(dir, 'again.pdf')).equals(pdf)).toBe(true);
  });

  it('refuses an invalid document with the field named (exit 2) and asks for -o', async () => {
    const bad = join(dir, 'bad.json');
    writeFileSync(
      bad,
      JSON.stringify({ ...exampleDesign, member: { ...exampleDesign.member, length: '-3 ft' } }),
    );
    const r = await run(['report', bad, '-o', join(dir, 'bad.pdf')]);
    expect(r.code).toBe(2);
    expect(r.err).toMatch(/^member\.length: /m);
    const noOut = await run(['report', bad]);
    expect(noOut.code).toBe(2);
    expect(noOut.err).toMatch(/-o <out\.pdf>/);
  });
});
