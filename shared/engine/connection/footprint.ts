/**
 * The section welded to the plate ("footprint"), in plate coordinates: d along N (the moment
 * direction), bf along B. From `connection.footprint.shape` when given, else the member's root.
 */
import type { RootFootprint } from '../types';
import type { ShapeLookup, ShapeRecord } from '../shapes/types';

export type FootprintKind = 'I' | 'C' | 'box' | 'round';

export interface Footprint {
  label: string;
  kind: FootprintKind;
  /** Depth along N, in (outside diameter for a round tube). */
  d: number;
  /** Width along B, in. */
  bf: number;
  /** Flange or wall thickness, in. */
  tf: number;
  /** Web thickness, in (I and C only; drawing only). */
  tw: number;
}

export type FootprintResolution = { ok: true; footprint: Footprint } | { ok: false; message: string };

function fromShape(shape: ShapeRecord): Footprint | undefined {
  if (shape.family === 'HSS' && shape.Ht && shape.B && shape.tdes) {
    return { label: shape.label, kind: 'box', d: shape.Ht, bf: shape.B, tf: shape.tdes, tw: shape.tdes };
  }
  if (shape.family === 'PIPE' && shape.OD && shape.tdes) {
    return { label: shape.label, kind: 'round', d: shape.OD, bf: shape.OD, tf: shape.tdes, tw: shape.tdes };
  }
  if ((shape.family === 'W' || shape.family === 'C') && shape.d && shape.bf && shape.tf) {
    const kind = shape.family === 'W' ? 'I' : 'C';
    return { label: shape.label, kind, d: shape.d, bf: shape.bf, tf: shape.tf, tw: shape.tw ?? shape.tf };
  }
  return undefined;
}

function fromRoot(root: RootFootprint): Footprint {
  const kind: FootprintKind =
    root.family === 'HSS' ? 'box' : root.family === 'PIPE' ? 'round' : root.family === 'C' ? 'C' : 'I';
  // An older caller may give no web thickness; it is then used for drawing only, so a rough value will do.
  return {
    label: root.label,
    kind,
    d: root.d,
    bf: root.bf,
    tf: root.tf,
    tw: root.tw ?? (kind === 'I' || kind === 'C' ? 0.6 * root.tf : root.tf),
  };
}

/** Resolves the footprint; an unknown shape name is reported, never guessed. */
export function resolveFootprint(
  footprintShape: string | undefined,
  root: RootFootprint,
  shapes: ShapeLookup,
): FootprintResolution {
  if (!footprintShape) {
    const fp = fromRoot(root);
    if (!(fp.d > 0 && fp.bf > 0 && fp.tf > 0)) {
      return {
        ok: false,
        message: `the member's root section "${root.label}" has no usable depth and width`,
      };
    }
    return { ok: true, footprint: fp };
  }
  const shape = shapes(footprintShape);
  if (!shape)
    return { ok: false, message: `the footprint shape "${footprintShape}" is not in the shapes table` };
  const fp = fromShape(shape);
  if (!fp)
    return {
      ok: false,
      message: `the footprint shape "${footprintShape}" lacks the dimensions a plate needs`,
    };
  return { ok: true, footprint: fp };
}
