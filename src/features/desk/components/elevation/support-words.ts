import { convert, formatQuantity } from '../../../../../shared/engine/units';
import type { ElevationShape } from '../../lib/elevation-geometry';

/** The drawing in words: depths at the root and tip and what holds the root (the drawing itself is decorative). */
export function supportWords(
  label: string,
  shape: ElevationShape,
  smallUnit: string,
  depth: readonly number[],
): string {
  const f = convert(1, 'in', smallUnit);
  const q = (inches: number) => formatQuantity({ value: inches * f, unit: smallUnit });
  const root = depth[0] ?? 0;
  const tip = depth[depth.length - 1] ?? 0;
  const member = `Drawn to scale: ${label}, ${formatQuantity({ value: root, unit: smallUnit })} deep at the root, ${formatQuantity({ value: tip, unit: smallUnit })} at the tip${root !== tip ? ' (tapered underneath)' : ''}`;
  const rods = shape.rods.length > 0 ? `; anchor rods dashed, the tension row in orange` : '';
  if (shape.arrangement === 'post-base' && shape.post && shape.plate && shape.pier)
    return `${member}; the root held by a post ${q(shape.post.x1 - shape.post.x0)} deep and ${q(shape.post.y1 - shape.beam.depth[0] / 2)} to the beam's centreline, on a plate ${q(shape.plate.x1 - shape.plate.x0)} long and ${q(shape.plate.y1 - shape.plate.y0)} thick on a pier ${q(shape.pier.x1 - shape.pier.x0)} long (cut below the rods)${rods}.${shape.notes.map((n) => ` ${n}`).join('')}`;
  if (shape.arrangement === 'face-plate' && shape.plate && shape.pier)
    return `${member}; the root welded to a plate ${q(shape.plate.y1 - shape.plate.y0)} high and ${q(shape.plate.x1 - shape.plate.x0)} thick on the face of the pier${shape.pierCut ? ' (cut behind the rods)' : ''}${rods}.`;
  return `${member}; fixed at the root (no connection checked).`;
}
