/**
 * The design document of one point of a study: the base document with the axis values written in.
 * What follows a changed length (common practice, no source, stated in the study screen):
 * a point load at the tip stays at the tip (a guard or fascia), other point loads keep their
 * distance from the root (one that ends up past the tip makes the point invalid, as the engine
 * says); an unbraced length equal to the length follows it, a shorter one is kept and cut to the
 * new length when it would exceed it. A section axis keeps the base's taper ratio for W shapes;
 * other families cannot be tapered and are checked prismatic.
 */
import type { DesignInput } from '../schemas/design';
import type { ShapeLookup } from '../engine/shapes/types';
import { toInternal, type UnitSystem } from '../engine/units';
import { axisUnit, type AxisKey } from './axes';

export type AxisValue = number | string;

type Section = DesignInput['member']['section'];

/** Writes `values` (one per axis key, in the document's units) into a copy of `base`. */
export function cellDocument(
  base: DesignInput,
  values: Partial<Record<AxisKey, AxisValue>>,
  shapes: ShapeLookup,
): DesignInput {
  const units: UnitSystem = base.units;
  let member = base.member;
  let loads = base.loads;
  if (values.section !== undefined)
    member = { ...member, section: withShape(base, String(values.section), shapes) };
  if (values.taperRatio !== undefined)
    member = { ...member, section: withRatio(member.section, Number(values.taperRatio), units, shapes) };
  if (values.tipDepth !== undefined)
    member = {
      ...member,
      section: withTip(member.section, `${values.tipDepth} ${axisUnit('tipDepth', units)}`),
    };
  if (values.spacing !== undefined)
    member = { ...member, spacing: `${values.spacing} ${axisUnit('spacing', units)}` };
  if (values.length !== undefined) {
    const length = `${values.length} ${axisUnit('length', units)}`;
    const oldL = toInternal(base.member.length, 'length');
    const newL = toInternal(length, 'length');
    let unbracedLength = member.unbracedLength;
    if (
      unbracedLength !== undefined &&
      (atTip(unbracedLength, oldL) || toInternal(unbracedLength, 'length') > newL)
    )
      unbracedLength = length;
    member = { ...member, length, unbracedLength };
    if (loads.point.some((p) => atTip(p.at, oldL)))
      loads = {
        ...loads,
        point: loads.point.map((p) => (atTip(p.at, oldL) ? { ...p, at: length } : p)),
      };
  }
  return member === base.member && loads === base.loads ? base : { ...base, member, loads };
}

/** A position at the tip of a member of length L (in), within a millionth of L. */
function atTip(at: string, L: number): boolean {
  return Math.abs(toInternal(at, 'length') - L) <= L * 1e-6;
}

function withShape(base: DesignInput, label: string, shapes: ShapeLookup): Section {
  const shape = shapes(label);
  const ratio = taperRatioOf(base.member.section, shapes);
  if (!shape || shape.family !== 'W' || ratio === null || ratio >= 1) return { shape: label };
  return { shape: label, tipDepth: inchesText(ratio * (shape.d ?? 0), base.units) };
}

/** Tip depth / root depth of a section, or null when it cannot be read (an unknown shape). */
export function taperRatioOf(section: Section, shapes: ShapeLookup): number | null {
  if (section.plates)
    return toInternal(section.plates.tipDepth, 'length') / toInternal(section.plates.rootDepth, 'length');
  const d = section.shape ? shapes(section.shape)?.d : undefined;
  if (!d) return null;
  return section.tipDepth ? toInternal(section.tipDepth, 'length') / d : 1;
}

function withRatio(section: Section, ratio: number, units: UnitSystem, shapes: ShapeLookup): Section {
  if (section.plates) {
    const root = toInternal(section.plates.rootDepth, 'length');
    return { plates: { ...section.plates, tipDepth: inchesText(ratio * root, units) } };
  }
  const d = section.shape ? shapes(section.shape)?.d : undefined;
  if (ratio >= 1 || !d) return { shape: section.shape };
  return { shape: section.shape, tipDepth: inchesText(ratio * d, units) };
}

function withTip(section: Section, tip: string): Section {
  if (section.plates) return { plates: { ...section.plates, tipDepth: tip } };
  return { shape: section.shape, tipDepth: tip };
}

/** A depth in inches written in the document's small length unit, six significant figures. */
function inchesText(inches: number, units: UnitSystem): string {
  const v = units === 'SI' ? inches * 25.4 : inches;
  return `${Number(v.toPrecision(6))} ${axisUnit('tipDepth', units)}`;
}
