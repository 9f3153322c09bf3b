/**
 * Lightest sections that work: every catalog shape of the chosen families put into the document
 * (same length, loads and connection), each a full design by the engine, ranked by steel weight.
 * For a tapered W document each W shape gets the shallowest tip depth that passes, searched on a
 * grid of 1/4 in (US) or 5 mm (SI) by bisection between the engine's shallowest allowed tip and
 * the full depth. The bisection assumes that a deeper tip never turns a pass into a failure
 * (deeper is stronger and stiffer; common practice, no source); the tip reported is always one the
 * engine passed, and the grid step below it was computed and failed (or is below the allowed tip).
 * HSS, pipe and C cannot be tapered and are checked prismatic.
 */
import { evaluateDesign } from '../engine/design';
import { findShape, SHAPES } from '../engine/shapes/table';
import type { ShapeFamily, ShapeLookup, ShapeRecord } from '../engine/shapes/types';
import { DesignInputError, type DesignResult } from '../engine/types';
import { quantity, type Quantity } from '../engine/units';
import {
  parsedDesignSchema,
  parsedQuantity,
  type ParsedDesign,
  type ParsedQuantity,
} from '../schemas/parsed-design';
import { toFieldIssues, type FieldIssue } from '../schemas/quantity';
import { passes, sortWorstFirst } from '../words/check-words';
import { shapesByWeight } from './axes';
import { highestRatio } from './evaluate-cell';

export const FAMILIES: readonly ShapeFamily[] = ['W', 'HSS', 'PIPE', 'C'];

export interface PassingShape {
  shape: string;
  steelWeight: Quantity;
  governing: { id: string; ratio: number | null };
  /** Tapered documents only (W shapes): the shallowest tip depth that passes; absent when only the full depth passes. */
  tipDepth?: Quantity;
}

export interface FailingShape {
  shape: string;
  steelWeight: Quantity;
  /** The worst check that does not pass, or the field the engine refused. */
  failedBy: string;
  /** The engine's words when it refused the document (a field problem rather than a check). */
  note?: string;
}

export interface LightestSections {
  passing: PassingShape[];
  failing: FailingShape[];
}

export interface LightestOptions {
  families?: readonly ShapeFamily[];
  /** The shapes to try (default: the published table); custom shapes may be added. */
  catalog?: readonly ShapeRecord[];
  /** How the engine finds a shape by label (default: the published table). */
  shapes?: ShapeLookup;
}

export type LightestOutcome = { ok: true; result: LightestSections } | { ok: false; issues: FieldIssue[] };

/** Validates the document and ranks every shape of the families; never throws for bad input. */
export function lightestSections(document: unknown, options: LightestOptions = {}): LightestOutcome {
  const parsed = parsedDesignSchema.safeParse(document);
  if (!parsed.success) return { ok: false, issues: toFieldIssues(parsed.error) };
  return { ok: true, result: rankSections(parsed.data, options) };
}

/** The ranking for a parsed document. */
export function rankSections(base: ParsedDesign, options: LightestOptions = {}): LightestSections {
  const lookup = options.shapes ?? findShape;
  const families = options.families ?? FAMILIES;
  const tapered = Boolean(base.member.section.shape && base.member.section.tipDepth);
  const passing: PassingShape[] = [];
  const failing: FailingShape[] = [];
  for (const shape of shapesByWeight(options.catalog ?? SHAPES, families)) {
    const outcome =
      tapered && shape.family === 'W'
        ? shallowestTip(base, shape, lookup)
        : tryShape(base, shape.label, undefined, lookup);
    if (outcome.kind === 'result' && outcome.pass) {
      const g = highestRatio(outcome.result.checks)!; // every row passes
      passing.push({
        shape: shape.label,
        steelWeight: outcome.result.member.steelWeight,
        governing: { id: g.id, ratio: g.ratio },
        ...(outcome.result.member.section.kind === 'tapered-rolled'
          ? { tipDepth: outcome.result.member.section.tipDepth }
          : {}),
      });
    } else if (outcome.kind === 'result') {
      failing.push({
        shape: shape.label,
        steelWeight: outcome.result.member.steelWeight,
        failedBy: sortWorstFirst(outcome.result.checks.filter((c) => !passes(c)))[0]?.id ?? '(none)',
      });
    } else {
      const L = base.member.length.value;
      failing.push({
        shape: shape.label,
        // Nominal weight (lb/ft) times the length, in kip, as the engine would report it.
        steelWeight: quantity((shape.W / 12000) * L, 'weight', base.units),
        failedBy: outcome.issues[0]?.path ?? '(document)',
        note: outcome.issues.map((i) => i.message).join('; '),
      });
    }
  }
  const byWeight = (
    a: { steelWeight: Quantity; shape: string },
    b: { steelWeight: Quantity; shape: string },
  ) => a.steelWeight.value - b.steelWeight.value || a.shape.localeCompare(b.shape);
  return { passing: passing.sort(byWeight), failing: failing.sort(byWeight) };
}

type Attempt =
  { kind: 'result'; result: DesignResult; pass: boolean } | { kind: 'invalid'; issues: FieldIssue[] };

function tryShape(
  base: ParsedDesign,
  label: string,
  tipDepth: ParsedQuantity | undefined,
  lookup: ShapeLookup,
): Attempt {
  const input: ParsedDesign = {
    ...base,
    member: { ...base.member, section: tipDepth ? { shape: label, tipDepth } : { shape: label } },
  };
  try {
    const result = evaluateDesign(input, { shapes: lookup });
    return {
      kind: 'result',
      result,
      pass: result.ok && result.checks.length > 0 && result.checks.every(passes),
    };
  } catch (e) {
    if (e instanceof DesignInputError) return { kind: 'invalid', issues: e.issues };
    throw e;
  }
}

function shallowestTip(base: ParsedDesign, shape: ShapeRecord, lookup: ShapeLookup): Attempt {
  const full = tryShape(base, shape.label, undefined, lookup);
  if (full.kind !== 'result' || !full.pass) return full;
  const si = base.units === 'SI';
  const step = si ? 5 / 25.4 : 0.25; // in
  const d = shape.d ?? 0;
  // The engine's shallowest tip (resolve-section.ts): two fillets and 1/4 in of web.
  const minTip = 2 * (shape.kdes ?? shape.tf ?? 0) + 0.25;
  const tips: ParsedQuantity[] = [];
  for (let k = Math.ceil(minTip / step - 1e-9); k * step < d - 1e-9; k++)
    tips.push(parsedQuantity(si ? `${k * 5} mm` : `${k * 0.25} in`, 'length'));
  // Bisection over tips[0..n-1] and the prismatic shape at n (known to pass).
  let lo = -1;
  let hi = tips.length;
  let best: Attempt = full;
  while (hi - lo > 1) {
    const mid = (lo + hi) >> 1;
    const attempt = tryShape(base, shape.label, tips[mid], lookup);
    if (attempt.kind === 'result' && attempt.pass) {
      hi = mid;
      best = attempt;
    } else lo = mid;
  }
  return best;
}
