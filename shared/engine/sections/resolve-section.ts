/**
 * Turns the document's `member.section` into the engine's section, refusing what the schema cannot
 * see: an unknown shape, a taper on a shape that is not a W, a tip not shallower than the root, a
 * tip too shallow to leave a web, plates that do not make an I.
 */
import type { ParsedPlates, ParsedSection } from '../../schemas/parsed-design';
import type { ShapeLookup, ShapeRecord } from '../shapes/types';
import type { MemberSection } from './section-types';
import { catalogSection, missingDimensions } from './catalog-section';
import { builtUpSection, taperedRolledSection } from './tapered-section';

export interface FieldProblem {
  path: string;
  message: string;
}

/** Returns the section, or the problems that make it impossible (internal units, in). */
export function resolveSection(section: ParsedSection, shapes: ShapeLookup): MemberSection | FieldProblem[] {
  if (section.plates) return resolvePlates(section.plates);
  const label = section.shape ?? '';
  const shape = shapes(label);
  if (!shape) {
    return [{ path: 'member.section.shape', message: `unknown shape "${label}": not in the shapes table` }];
  }
  const missing = missingDimensions(shape);
  if (missing.length) {
    return [
      {
        path: 'member.section.shape',
        message: `${shape.label} lacks ${missing.join(', ')} in the shapes table, needed for the checks`,
      },
    ];
  }
  if (!section.tipDepth) return catalogSection(shape);
  const path = 'member.section.tipDepth';
  if (shape.family !== 'W') {
    return [{ path, message: `a web taper applies to W shapes only, not ${shape.family} (${shape.label})` }];
  }
  const tip = section.tipDepth.value;
  const d = shape.d ?? 0;
  if (tip >= d) {
    return [
      {
        path,
        message: `must be less than the depth of ${shape.label} (${d} in), got "${section.tipDepth.text}"`,
      },
    ];
  }
  const minTip = 2 * (shape.kdes ?? shape.tf ?? 0) + 0.25;
  if (tip < minTip) {
    return [
      {
        path,
        message: `is too shallow: ${shape.label} needs at least ${round(minTip)} in to keep a web clear of the fillets, got "${section.tipDepth.text}"`,
      },
    ];
  }
  return taperedOf(shape, tip);
}

// A section is the same for the same shape and tip depth (as catalogSection keeps a catalog shape):
// a reach study asks for each tip depth at every length, and keeping the section also keeps its
// properties along the member (member/analysis.ts).
const tapered = new WeakMap<ShapeRecord, Map<number, MemberSection>>();

function taperedOf(shape: ShapeRecord, tip: number): MemberSection {
  let byTip = tapered.get(shape);
  if (!byTip) {
    byTip = new Map();
    tapered.set(shape, byTip);
  }
  let section = byTip.get(tip);
  if (!section) {
    section = taperedRolledSection(shape, tip);
    if (byTip.size >= 200) byTip.clear();
    byTip.set(tip, section);
  }
  return section;
}

function resolvePlates(plates: ParsedPlates): MemberSection | FieldProblem[] {
  const base = 'member.section.plates';
  const p = {
    rootDepth: plates.rootDepth.value,
    tipDepth: plates.tipDepth.value,
    flangeWidth: plates.flangeWidth.value,
    flangeThickness: plates.flangeThickness.value,
    webThickness: plates.webThickness.value,
  };
  const problems: FieldProblem[] = [];
  // Plates a shop can weld (common practice, no source): thicknesses 1/8 to 4 in, widths and
  // depths up to 10 ft; outside this the plate model and the clauses are not meant to apply.
  const ranges: [keyof typeof p, number, number][] = [
    ['rootDepth', 3, 120],
    ['flangeWidth', 2, 60],
    ['flangeThickness', 0.125, 4],
    ['webThickness', 0.125, 4],
  ];
  for (const [key, min, max] of ranges) {
    if (p[key] < min || p[key] > max) {
      problems.push({
        path: `${base}.${key}`,
        message: `must be between ${min} and ${max} in, got "${plates[key].text}"`,
      });
    }
  }
  if (problems.length) return problems;
  const minDepth = 2 * p.flangeThickness + 0.25;
  if (p.tipDepth > p.rootDepth) {
    problems.push({
      path: `${base}.tipDepth`,
      message: `must not exceed the root depth (${plates.rootDepth.text}), got "${plates.tipDepth.text}"`,
    });
  }
  if (p.tipDepth < minDepth) {
    problems.push({
      path: `${base}.tipDepth`,
      message: `is too shallow: two ${plates.flangeThickness.text} flanges need at least ${round(minDepth)} in to leave a web, got "${plates.tipDepth.text}"`,
    });
  }
  if (p.rootDepth < minDepth) {
    problems.push({
      path: `${base}.rootDepth`,
      message: `is too shallow to leave a web between the flanges, got "${plates.rootDepth.text}"`,
    });
  }
  if (p.webThickness >= p.flangeWidth) {
    problems.push({
      path: `${base}.webThickness`,
      message: `must be thinner than the flange width (${plates.flangeWidth.text}), got "${plates.webThickness.text}"`,
    });
  }
  return problems.length ? problems : builtUpSection(p);
}

function round(v: number): number {
  return Number(v.toFixed(2));
}
