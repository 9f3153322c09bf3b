/**
 * The open shapes table shipped with the product (data/shapes.json, built from the AISC Shapes
 * Database v15.0 by scripts/build-shapes-table.ts). Bundled, not read from disk, so the engine
 * stays free of I/O and runs the same in the browser, the server and the CLI.
 */
import table from '../../../data/shapes.json';
import type { ShapeLookup, ShapeRecord } from './types';

export const SHAPES_SOURCE: string = table.source;
export const SHAPES: readonly ShapeRecord[] = table.shapes as ShapeRecord[];

export function normalizeLabel(label: string): string {
  return label.trim().toUpperCase().replace(/\s+/g, '');
}

const byLabel = new Map<string, ShapeRecord>(SHAPES.map((s) => [normalizeLabel(s.label), s]));

/** Looks a shape up in the published table. */
export const findShape: ShapeLookup = (label) => byLabel.get(normalizeLabel(label));

/** A lookup that tries extra (user-imported) shapes first, then the published table. */
export function lookupWith(extra: readonly ShapeRecord[]): ShapeLookup {
  if (extra.length === 0) return findShape;
  const custom = new Map(extra.map((s) => [normalizeLabel(s.label), s]));
  return (label) => custom.get(normalizeLabel(label)) ?? findShape(label);
}
