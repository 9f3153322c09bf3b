/**
 * `reachline check design.json [--stations]` (or `-` for standard input): validates the document
 * with the shared schema, runs the engine and prints the result document as JSON on stdout.
 * Exit 0 when every check passes, 1 when any fails, 2 when the input is invalid (one line per
 * problem on stderr, `path: message`, and nothing on stdout).
 */
import { readFile } from 'node:fs/promises';
import type { FieldIssue } from '../../shared/schemas/quantity';
import { checkDocument } from '../../shared/engine/check-document';
import { CAUTION } from '../../shared/engine/types';
import { CHECK_WORDS, checkState, verdictOf } from '../../shared/words/check-words';

export interface CliIo {
  out(text: string): void;
  err(text: string): void;
  readStdin(): Promise<string>;
}

/** Reads and parses a JSON document from a file or standard input; problems go to stderr. */
export async function readDocument(
  source: string,
  io: CliIo,
): Promise<{ ok: true; json: unknown } | { ok: false }> {
  let text: string;
  try {
    text = source === '-' ? await io.readStdin() : await readFile(source, 'utf8');
  } catch (e) {
    invalid(io, [
      {
        path: '(document)',
        message: `cannot read ${source}: ${(e as NodeJS.ErrnoException).code ?? String(e)}`,
      },
    ]);
    return { ok: false };
  }
  try {
    // Editors on some systems save UTF-8 with a byte-order mark; JSON.parse refuses it.
    return { ok: true, json: JSON.parse(text.replace(/^\uFEFF/, '')) as unknown };
  } catch (e) {
    invalid(io, [{ path: '(document)', message: `is not valid JSON: ${(e as Error).message}` }]);
    return { ok: false };
  }
}

export async function checkCommand(source: string, stations: boolean, io: CliIo): Promise<number> {
  const read = await readDocument(source, io);
  if (!read.ok) return 2;
  const json = read.json;
  const outcome = checkDocument(json, { stations });
  if (!outcome.ok) return invalid(io, outcome.issues);
  const { result } = outcome;
  io.out(`${JSON.stringify(result, null, 2)}\n`);
  // Which way each combination bends the root: "up" puts the top flange and the other row of rods to work.
  io.err(`combinations: ${result.member.combinations.map((c) => `${c.name} (${c.direction})`).join('; ')}\n`);
  // The words of the desk and the package (shared/words/check-words.ts); stdout keeps the contract's keys.
  const verdict = verdictOf(result.checks, result.ok);
  io.err(`${verdict.word}. ${verdict.sentence}\n`);
  for (const c of result.checks) {
    const state = checkState(c);
    if (state === 'pass') continue;
    const ratio = c.ratio === null || !Number.isFinite(c.ratio) ? '' : ` (ratio ${c.ratio.toFixed(2)})`;
    io.err(`  ${c.id}: ${CHECK_WORDS[state]}${ratio}\n`);
  }
  io.err(`${CAUTION}\n`);
  return result.ok ? 0 : 1;
}

/** One line per problem, whatever the message holds (a file's own text may carry line breaks). */
function invalid(io: CliIo, issues: readonly FieldIssue[]): number {
  const oneLine = (t: string) => t.replace(/\s*[\r\n]+\s*/g, ' ');
  for (const i of issues) io.err(`${oneLine(i.path || '(document)')}: ${oneLine(i.message)}\n`);
  return 2;
}
