/**
 * A study point in words, for the hover and focus readout, the aria-live announcement and the
 * table: the axis values, the verdict, the governing check and the numbers in the study's units.
 */
import { formatQuantity, type Quantity } from '../../../../shared/engine/units';
import { AXIS_WORDS, axisUnit, type AxisSpec } from '../../../../shared/study/axes';
import type { CellOutcome } from '../../../../shared/study/evaluate-cell';
import type { StudyPlan } from '../../../../shared/study/study-plan';

export function axisValueText(spec: AxisSpec, value: number | string, units: 'US' | 'SI'): string {
  if (spec.key === 'section') return String(value);
  const unit = axisUnit(spec.key, units);
  return unit ? `${value} ${unit}` : String(value);
}

/** "Length 9 ft, tip depth 7 in" */
export function pointLabel(plan: StudyPlan, i: number, j: number): string {
  const units = plan.base.units;
  const part = (spec: AxisSpec, v: number | string) =>
    `${AXIS_WORDS[spec.key].replace(/ \(.*\)$/, '').toLowerCase()} ${axisValueText(spec, v, units)}`;
  const text = `${part(plan.x, plan.xValues[i])}, ${part(plan.y, plan.yValues[j])}`;
  return text.charAt(0).toUpperCase() + text.slice(1);
}

const q = (v: Quantity | null) => (v ? formatQuantity(v) : '—');

export function verdictText(o: CellOutcome | undefined): string {
  if (!o) return 'not computed yet';
  if (o.kind === 'invalid') return 'not a valid design';
  return o.ok ? 'passes' : 'does not pass';
}

export function governingText(o: CellOutcome): string {
  if (o.kind === 'invalid') return o.issues.map((i) => `${i.path}: ${i.message}`).join('; ');
  const r = o.governing.ratio;
  return `${o.governing.title} governs (${r === null ? 'not computed' : r.toFixed(2)})`;
}

export interface CellNumbers {
  tipDepth: string;
  tipDeflection: string;
  rootMoment: string;
  steelWeight: string;
  rodTension: string;
  plateThickness: string;
}

export function cellNumbers(o: CellOutcome): CellNumbers | null {
  if (o.kind !== 'result') return null;
  return {
    tipDepth: q(o.tipDepth),
    tipDeflection: q(o.tipDeflection),
    rootMoment: q(o.rootMoment),
    steelWeight: q(o.steelWeight),
    rodTension: q(o.rodTension),
    plateThickness: q(o.plateThickness),
  };
}

/** One sentence for the aria-live region. */
export function cellSentence(plan: StudyPlan, i: number, j: number, o: CellOutcome | undefined): string {
  const head = `${pointLabel(plan, i, j)}: ${verdictText(o)}`;
  if (!o) return `${head}.`;
  const n = cellNumbers(o);
  if (!n) return `${head}: ${governingText(o)}.`;
  return `${head}; ${governingText(o)}. Length ${lengthOf(plan, i, j)}, tip depth ${n.tipDepth}, tip deflection ${n.tipDeflection}, root moment ${n.rootMoment}, steel ${n.steelWeight}, rod tension ${n.rodTension}, plate thickness needed ${n.plateThickness}.`;
}

/** The length of a point: its axis value, or the base document's length. */
export function lengthOf(plan: StudyPlan, i: number, j: number): string {
  const units = plan.base.units;
  if (plan.x.key === 'length') return axisValueText(plan.x, plan.xValues[i], units);
  if (plan.y.key === 'length') return axisValueText(plan.y, plan.yValues[j], units);
  return plan.base.member.length;
}
