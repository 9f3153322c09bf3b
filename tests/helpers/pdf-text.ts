/**
 * Reading a PDF back with poppler (pdftotext, pdftoppm), installed by .ci/run from Debian. A
 * missing tool fails the test with a message that says what to install: these tests never skip.
 */
import { execFileSync, spawnSync } from 'node:child_process';
import { mkdirSync, mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';

function requireTool(name: string): void {
  const found = spawnSync('sh', ['-c', `command -v ${name}`], { encoding: 'utf8' });
  if (found.status !== 0)
    throw new Error(
      `${name} is missing: install Debian's poppler-utils (apt-get install poppler-utils), as .ci/run does`,
    );
}

function withFile<T>(pdf: Buffer, run: (path: string, dir: string) => T): T {
  const dir = mkdtempSync(join(tmpdir(), 'reachline-pdf-'));
  try {
    const path = join(dir, 'in.pdf');
    writeFileSync(path, pdf);
    return run(path, dir);
  } finally {
    rmSync(dir, { recursive: true, force: true });
  }
}

/** The text of every page, in reading order (pdftotext -layout). */
export function pdfText(pdf: Buffer): string {
  requireTool('pdftotext');
  return withFile(pdf, (path) =>
    execFileSync('pdftotext', ['-layout', '-enc', 'UTF-8', path, '-'], { encoding: 'utf8' }),
  );
}

/** The number of pages, from pdftotext's page breaks. */
export function pageTexts(pdf: Buffer): string[] {
  return pdfText(pdf)
    .split('\f')
    .filter((p) => p.trim().length > 0);
}

/** Renders page 1 to a PNG file at `outFile` (pdftoppm, 80 dpi). */
export function renderFirstPage(pdf: Buffer, outFile: string): void {
  requireTool('pdftoppm');
  mkdirSync(join(outFile, '..'), { recursive: true });
  withFile(pdf, (path) => {
    execFileSync('pdftoppm', [
      '-png',
      '-r',
      '80',
      '-f',
      '1',
      '-l',
      '1',
      '-singlefile',
      path,
      outFile.replace(/\.png$/, ''),
    ]);
  });
}
