/**
 * The design document of one point of a study: the base document with the axis values written in.
 * What follows a changed length (common practice, no source, stated in the study screen):
 * a point load at the tip stays at the tip (a guard or fascia), other point loads keep their
 * distance from the root (one that ends up past the tip makes the point invalid, as the engine
 * says); an unbraced length equal to the length follows it, a shorter one is kept and cut to the
 * new length when it would exceed it. A section axis keeps the base's taper ratio for W shapes;
 * other families cannot be tapered and are checked prismatic.
 *
 * The engine's cell (cellParsed) is built from the parsed base with the axis values read once per
 * axis (axisReading), so no cell writes and parses its own strings; the text document of a cell
 * (cellDocument, what the desk loads when a point is clicked) writes the same cell's text back.
 */
import type { DesignInput } from '../schemas/design';
import {
  parseDesign,
  parsedQuantity,
  type ParsedDesign,
  type ParsedQuantity,
  type ParsedSection,
} from '../schemas/parsed-design';
import type { ShapeLookup } from '../engine/shapes/types';
import type { UnitSystem } from '../engine/units';
import { axisUnit, type AxisKey } from './axes';

export type AxisValue = number | string;
/** An axis value read for the engine: a length (length, spacing, tip depth), a ratio or a shape label. */
export type AxisReading = ParsedQuantity | number | string;

/** Reads one axis value (in the document's units) the way the engine takes it. */
export function axisReading(key: AxisKey, value: AxisValue, units: UnitSystem): AxisReading {
  if (key === 'length' || key === 'spacing' || key === 'tipDepth')
    return parsedQuantity(`${value} ${axisUnit(key, units)}`, 'length');
  return key === 'taperRatio' ? Number(value) : String(value);
}

function reading(key: AxisKey, v: AxisReading, units: UnitSystem): AxisReading {
  return typeof v === 'object' ? v : axisReading(key, v, units);
}

function lengthOf(key: AxisKey, v: AxisReading, units: UnitSystem): ParsedQuantity {
  const r = reading(key, v, units);
  if (typeof r !== 'object') throw new Error(`the ${key} axis needs a length, got ${String(r)}`);
  return r;
}

/** The parsed document of a point: `values` (axis values or readings, one per key) written into `base`. */
export function cellParsed(
  base: ParsedDesign,
  values: Partial<Record<AxisKey, AxisReading>>,
  shapes: ShapeLookup,
): ParsedDesign {
  const units: UnitSystem = base.units;
  let member = base.member;
  let loads = base.loads;
  if (values.section !== undefined) {
    if (typeof values.section !== 'string') throw new TypeError('a section axis value is a shape name');
    member = { ...member, section: withShape(base, values.section, shapes) };
  }
  if (values.taperRatio !== undefined)
    member = { ...member, section: withRatio(member.section, Number(values.taperRatio), units, shapes) };
  if (values.tipDepth !== undefined)
    member = { ...member, section: withTip(member.section, lengthOf('tipDepth', values.tipDepth, units)) };
  if (values.spacing !== undefined)
    member = { ...member, spacing: lengthOf('spacing', values.spacing, units) };
  if (values.length !== undefined) {
    const length = lengthOf('length', values.length, units);
    const oldL = base.member.length.value;
    const newL = length.value;
    let unbracedLength = member.unbracedLength;
    if (unbracedLength !== undefined && (atTip(unbracedLength, oldL) || unbracedLength.value > newL))
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

/** The text document of a point (what the desk loads): the same cell as cellParsed, written as text. */
export function cellDocument(
  base: DesignInput,
  values: Partial<Record<AxisKey, AxisValue>>,
  shapes: ShapeLookup,
): DesignInput {
  const cell = cellParsed(parseDesign(base), values, shapes);
  const m = cell.member;
  const s = m.section;
  const section: DesignInput['member']['section'] = s.plates
    ? {
        plates: {
          rootDepth: s.plates.rootDepth.text,
          tipDepth: s.plates.tipDepth.text,
          flangeWidth: s.plates.flangeWidth.text,
          flangeThickness: s.plates.flangeThickness.text,
          webThickness: s.plates.webThickness.text,
        },
      }
    : { shape: s.shape, ...(s.tipDepth ? { tipDepth: s.tipDepth.text } : {}) };
  return {
    ...base,
    member: {
      ...base.member,
      length: m.length.text,
      spacing: m.spacing.text,
      unbracedLength: m.unbracedLength?.text,
      section,
    },
    loads: {
      ...base.loads,
      point: base.loads.point.map((p, k) => ({ ...p, at: cell.loads.point[k].at.text })),
    },
  };
}

/** A position at the tip of a member of length L (in), within a millionth of L. */
function atTip(at: ParsedQuantity, L: number): boolean {
  return Math.abs(at.value - L) <= L * 1e-6;
}

function withShape(base: ParsedDesign, label: string, shapes: ShapeLookup): ParsedSection {
  const shape = shapes(label);
  const ratio = taperRatioOf(base.member.section, shapes);
  if (!shape || shape.family !== 'W' || ratio === null || ratio >= 1) return { shape: label };
  return { shape: label, tipDepth: inchesQuantity(ratio * (shape.d ?? 0), base.units) };
}

/** Tip depth / root depth of a section, or null when it cannot be read (an unknown shape). */
export function taperRatioOf(section: ParsedSection, shapes: ShapeLookup): number | null {
  if (section.plates) return section.plates.tipDepth.value / section.plates.rootDepth.value;
  const d = section.shape ? shapes(section.shape)?.d : undefined;
  if (!d) return null;
  return section.tipDepth ? section.tipDepth.value / d : 1;
}

function withRatio(
  section: ParsedSection,
  ratio: number,
  units: UnitSystem,
  shapes: ShapeLookup,
): ParsedSection {
  if (section.plates) {
    const root = section.plates.rootDepth.value;
    return { plates: { ...section.plates, tipDepth: inchesQuantity(ratio * root, units) } };
  }
  const d = section.shape ? shapes(section.shape)?.d : undefined;
  if (ratio >= 1 || !d) return { shape: section.shape };
  return { shape: section.shape, tipDepth: inchesQuantity(ratio * d, units) };
}

function withTip(section: ParsedSection, tip: ParsedQuantity): ParsedSection {
  if (section.plates) return { plates: { ...section.plates, tipDepth: tip } };
  return { shape: section.shape, tipDepth: tip };
}

/** A depth in inches written in the document's small length unit, six significant figures, and read. */
function inchesQuantity(inches: number, units: UnitSystem): ParsedQuantity {
  const v = units === 'SI' ? inches * 25.4 : inches;
  return parsedQuantity(`${Number(v.toPrecision(6))} ${axisUnit('tipDepth', units)}`, 'length');
}
