/**
 * `reachline shapes [--json] [--family W|HSS|PIPE|C]`: the shapes table shipped with Reachline.
 * --json prints one object: the table's source and every shape with its properties under the
 * published database's column names. Without --json, a short aligned listing.
 */
import { SHAPES, SHAPES_SOURCE } from '../../shared/engine/shapes/table';
import type { CliIo } from './check-command';

const FAMILIES = ['W', 'HSS', 'PIPE', 'C'];

export function shapesCommand(json: boolean, family: string | undefined, io: CliIo): number {
  const wanted = family?.toUpperCase();
  if (wanted && !FAMILIES.includes(wanted)) {
    io.err(`--family: must be one of ${FAMILIES.join(', ')}, got "${family}"\n`);
    return 2;
  }
  const shapes = wanted ? SHAPES.filter((s) => s.family === wanted) : SHAPES;
  if (json) {
    io.out(`${JSON.stringify({ source: SHAPES_SOURCE, count: shapes.length, shapes })}\n`);
    return 0;
  }
  const cols = ['W', 'A', 'd', 'Ix', 'Sx', 'Zx', 'ry'] as const;
  const lines = [
    `# ${SHAPES_SOURCE}`,
    ['label'.padEnd(22), 'family'.padEnd(6), ...cols.map((c) => c.padStart(8))].join(' '),
  ];
  for (const s of shapes) {
    const depth = s.d ?? s.Ht ?? s.OD;
    const row: Record<(typeof cols)[number], number | undefined> = {
      W: s.W,
      A: s.A,
      d: depth,
      Ix: s.Ix,
      Sx: s.Sx,
      Zx: s.Zx,
      ry: s.ry,
    };
    lines.push(
      [
        s.label.padEnd(22),
        s.family.padEnd(6),
        ...cols.map((c) => (row[c] === undefined ? '' : String(row[c])).padStart(8)),
      ].join(' '),
    );
  }
  io.out(`${lines.join('\n')}\n`);
  return 0;
}
