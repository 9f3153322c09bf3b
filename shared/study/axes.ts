/**
 * The two axes of a reach study: which input varies (length, tip depth, taper ratio, spacing or the
 * section) over which values. Values are in the document's unit system (US: ft for length and
 * spacing, in for tip depth; SI: m and mm); a taper ratio is tip depth / root depth. A section axis
 * is a list of catalog shapes, ordered by weight.
 */
import type { UnitSystem } from '../engine/units';
import type { ShapeRecord } from '../engine/shapes/types';
import type { FieldIssue } from '../schemas/quantity';

export type NumericAxisKey = 'length' | 'tipDepth' | 'taperRatio' | 'spacing';
export type AxisKey = NumericAxisKey | 'section';

export type AxisSpec =
  { key: NumericAxisKey; from: number; to: number; steps: number } | { key: 'section'; shapes: string[] };

/** Most points along one axis (60 x 60 = 3600 full designs). */
export const MAX_STEPS = 60;

export const AXIS_WORDS: Record<AxisKey, string> = {
  length: 'Length',
  tipDepth: 'Tip depth',
  taperRatio: 'Taper ratio (tip / root depth)',
  spacing: 'Spacing',
  section: 'Section',
};

/** The unit an axis is written in, or '' for a ratio or a list of shapes. */
export function axisUnit(key: AxisKey, units: UnitSystem): string {
  if (key === 'length' || key === 'spacing') return units === 'SI' ? 'm' : 'ft';
  if (key === 'tipDepth') return units === 'SI' ? 'mm' : 'in';
  return '';
}

/** The values along a numeric axis: `steps` evenly spaced from `from` to `to`, both included. */
export function axisValues(spec: AxisSpec): number[] | string[] {
  if (spec.key === 'section') return spec.shapes;
  if (spec.steps === 1) return [spec.from];
  const out: number[] = [];
  for (let i = 0; i < spec.steps; i++) {
    // Six significant figures: the value written into the cell's document is the value shown.
    out.push(Number((spec.from + ((spec.to - spec.from) * i) / (spec.steps - 1)).toPrecision(6)));
  }
  return out;
}

export function axisLength(spec: AxisSpec): number {
  return spec.key === 'section' ? spec.shapes.length : spec.steps;
}

/** Problems with an axis before anything runs, each naming its field (`x.from`, `y.steps`). */
export function axisProblems(spec: AxisSpec, name: 'x' | 'y'): FieldIssue[] {
  const problems: FieldIssue[] = [];
  if (spec.key === 'section') {
    if (spec.shapes.length === 0)
      problems.push({ path: `${name}.shapes`, message: 'needs at least one shape' });
    if (spec.shapes.length > MAX_STEPS)
      problems.push({
        path: `${name}.shapes`,
        message: `at most ${MAX_STEPS} shapes, got ${spec.shapes.length}`,
      });
    return problems;
  }
  const { from, to, steps } = spec;
  if (!Number.isInteger(steps) || steps < 1 || steps > MAX_STEPS)
    problems.push({
      path: `${name}.steps`,
      message: `must be a whole number from 1 to ${MAX_STEPS}, got ${steps}`,
    });
  for (const [field, v] of [
    ['from', from],
    ['to', to],
  ] as const) {
    if (!Number.isFinite(v) || v <= 0)
      problems.push({ path: `${name}.${field}`, message: `must be a positive number, got ${String(v)}` });
    else if (spec.key === 'taperRatio' && v > 1)
      problems.push({ path: `${name}.${field}`, message: `a taper ratio is at most 1 (no taper), got ${v}` });
  }
  if (problems.length === 0 && steps > 1 && !(to > from))
    problems.push({ path: `${name}.to`, message: `must be greater than from (${from}), got ${to}` });
  return problems;
}

/** Catalog shapes of the given families ordered by nominal weight, lightest first (then by label). */
export function shapesByWeight(
  shapes: readonly ShapeRecord[],
  families: readonly ShapeRecord['family'][],
): ShapeRecord[] {
  return shapes
    .filter((s) => families.includes(s.family))
    .sort((a, b) => a.W - b.W || a.label.localeCompare(b.label));
}
