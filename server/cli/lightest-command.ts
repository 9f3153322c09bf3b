/**
 * `reachline lightest design.json [--families W,HSS,PIPE,C]`: every shape of the families put into
 * the document with its length, loads and connection, ranked by steel weight (the shared
 * lightest-sections ranking). Prints `{ passing, failing, caution }` as JSON on stdout; exit 0 when
 * at least one shape passes, 1 when none does, 2 for invalid input (one line per problem on stderr).
 */
import type { ShapeFamily } from '../../shared/engine/shapes/types';
import { CAUTION } from '../../shared/engine/types';
import { FAMILIES, lightestSections } from '../../shared/study/lightest-sections';
import { readDocument, type CliIo } from './check-command';

export function parseFamilies(text: string | undefined): ShapeFamily[] | string {
  if (text === undefined) return [...FAMILIES];
  const names = text
    .split(',')
    .map((s) => s.trim().toUpperCase())
    .filter(Boolean);
  const unknown = names.filter((n) => !FAMILIES.includes(n as ShapeFamily));
  if (names.length === 0 || unknown.length > 0)
    return `--families: must list families from ${FAMILIES.join(', ')}, got "${text}"`;
  return [...new Set(names)] as ShapeFamily[];
}

export async function lightestCommand(
  source: string,
  familiesText: string | undefined,
  io: CliIo,
): Promise<number> {
  const families = parseFamilies(familiesText);
  if (typeof families === 'string') {
    io.err(`${families}\n`);
    return 2;
  }
  const read = await readDocument(source, io);
  if (!read.ok) return 2;
  const outcome = lightestSections(read.json, { families });
  if (!outcome.ok) {
    for (const i of outcome.issues) io.err(`${i.path}: ${i.message}\n`);
    return 2;
  }
  const { passing, failing } = outcome.result;
  io.out(`${JSON.stringify({ passing, failing, caution: CAUTION }, null, 2)}\n`);
  io.err(
    passing.length
      ? `${passing.length} of ${passing.length + failing.length} shapes pass; the lightest is ${passing[0].shape}\n`
      : `none of the ${failing.length} shapes passes\n`,
  );
  io.err(`${CAUTION}\n`);
  return passing.length ? 0 : 1;
}
