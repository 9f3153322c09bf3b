/**
 * `reachline report design.json -o out.pdf`: a preliminary calculation package from a design
 * file (the engine runs on it; nothing is stored). Exit 0 when written (whatever the checks say;
 * the package reports them), 2 when the input is invalid or the file cannot be written.
 */
import { readFile, stat, writeFile } from 'node:fs/promises';
import { basename } from 'node:path';
import { designSchema } from '../../shared/schemas/design';
import { toFieldIssues, type FieldIssue } from '../../shared/schemas/quantity';
import { DesignInputError } from '../../shared/engine/types';
import { CAUTION } from '../../shared/engine/types';
import { packageFromDocument } from '../features/package/package-from-file';
import { buildPackagePdf } from '../features/package/package-pdf';
import type { CliIo } from './check-command';

export async function reportCommand(source: string, out: string, io: CliIo): Promise<number> {
  let text: string;
  let modified = new Date(0);
  try {
    text = source === '-' ? await io.readStdin() : await readFile(source, 'utf8');
    if (source !== '-') modified = (await stat(source)).mtime;
  } catch (e) {
    return invalid(io, [
      {
        path: '(document)',
        message: `cannot read ${source}: ${(e as NodeJS.ErrnoException).code ?? String(e)}`,
      },
    ]);
  }
  let json: unknown;
  try {
    json = JSON.parse(text.replace(/^\uFEFF/, ''));
  } catch (e) {
    return invalid(io, [{ path: '(document)', message: `is not valid JSON: ${(e as Error).message}` }]);
  }
  const parsed = designSchema.safeParse(json);
  if (!parsed.success) return invalid(io, toFieldIssues(parsed.error));
  let pdf: Buffer;
  try {
    const name = source === '-' ? 'design from standard input' : basename(source).replace(/\.json$/i, '');
    pdf = await buildPackagePdf(packageFromDocument(parsed.data, { name, text, modified }));
  } catch (e) {
    if (e instanceof DesignInputError) return invalid(io, e.issues);
    throw e;
  }
  try {
    await writeFile(out, pdf);
  } catch (e) {
    return invalid(io, [
      { path: '-o', message: `cannot write ${out}: ${(e as NodeJS.ErrnoException).code ?? String(e)}` },
    ]);
  }
  io.err(`wrote ${out} (${pdf.length} bytes), a preliminary package: not a reviewed revision\n`);
  io.err(`${CAUTION}\n`);
  return 0;
}

function invalid(io: CliIo, issues: readonly FieldIssue[]): number {
  for (const i of issues) io.err(`${i.path}: ${i.message}\n`);
  return 2;
}
