/**
 * A prismatic member made of one shape from the shapes table: the table's published properties
 * are used as they stand (they include the fillets and corner radii that plate formulas miss).
 */
import type { ShapeRecord } from '../shapes/types';
import type { MemberSection, SectionProps } from './section-types';
import { DEFAULT_STEEL } from './steel-grades';
import { iSectionProps } from './i-section';

/** The table's properties in the engine's form, for the shape's family. */
export function catalogProps(s: ShapeRecord): SectionProps {
  const base = { A: s.A, Ix: s.Ix, Sx: s.Sx, Zx: s.Zx, Iy: s.Iy, ry: s.ry, J: s.J };
  if (s.family === 'HSS') {
    const t = s.tdes ?? 0;
    const H = s.Ht ?? 0;
    // Closed section: no warping; rts and ho are not used by F7 and are given neutral values.
    return { ...base, d: H, bf: s.B ?? 0, tf: t, tw: t, h: H - 3 * t, Cw: 0, rts: s.ry, ho: H - t };
  }
  if (s.family === 'PIPE') {
    const t = s.tdes ?? 0;
    const D = s.OD ?? 0;
    return { ...base, d: D, bf: D, tf: t, tw: t, h: D - 2 * t, Cw: 0, rts: s.ry, ho: D - t };
  }
  const d = s.d ?? 0;
  const tf = s.tf ?? 0;
  const bf = s.bf ?? 0;
  const tw = s.tw ?? 0;
  // AISC's h for rolled shapes is the clear distance less the fillets: d - 2 kdes.
  const h = d - 2 * (s.kdes ?? tf);
  // A user's imported shape may lack the torsional columns: take them from the plate model.
  const plates =
    s.Cw === undefined || s.rts === undefined || s.ho === undefined ? iSectionProps(d, bf, tf, tw) : null;
  return {
    ...base,
    d,
    bf,
    tf,
    tw,
    h,
    Cw: s.Cw ?? plates!.Cw,
    rts: s.rts ?? plates!.rts,
    ho: s.ho ?? plates!.ho,
  };
}

/** The dimensions a family needs for its checks that a (user-imported) shape does not give. */
export function missingDimensions(s: ShapeRecord): string[] {
  const need: (keyof ShapeRecord)[] =
    s.family === 'HSS' ? ['Ht', 'B', 'tdes'] : s.family === 'PIPE' ? ['OD', 'tdes'] : ['d', 'bf', 'tf', 'tw'];
  return need.filter((k) => !(typeof s[k] === 'number' && s[k] > 0)).map(String);
}

const built = new WeakMap<ShapeRecord, MemberSection>();

/** A prismatic catalog member (built once per shape record: it never changes). */
export function catalogSection(s: ShapeRecord): MemberSection {
  let section = built.get(s);
  if (!section) {
    section = buildCatalogSection(s);
    built.set(s, section);
  }
  return section;
}

function buildCatalogSection(s: ShapeRecord): MemberSection {
  const p = catalogProps(s);
  const steel = DEFAULT_STEEL[s.family];
  return {
    label: s.label,
    kind: 'catalog',
    family: s.family,
    prismatic: true,
    rolled: s.family === 'W' || s.family === 'C',
    root: p,
    tip: p,
    at: () => p,
    IxAt: () => p.Ix,
    defaultFy: steel.Fy,
    defaultGrade: steel.grade,
  };
}
