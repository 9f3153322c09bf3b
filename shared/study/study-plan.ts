/**
 * A reach study: a base design document and two axes. The plan validates both once and reads the
 * base and every axis value once (parsedDesignSchema, axisReading); each point's parsed document is
 * the parsed base with the two readings written in (cellParsed) and is evaluated by the engine like
 * any other document. Points are visited coarse to fine (cellOrder) so that a map
 * drawn while the study runs covers the whole area early and sharpens as the rest arrives.
 */
import type { ShapeLookup } from '../engine/shapes/types';
import type { DesignInput } from '../schemas/design';
import { designWithParsedSchema, type ParsedDesign } from '../schemas/parsed-design';
import { toFieldIssues, type FieldIssue } from '../schemas/quantity';
import { axisLength, axisProblems, axisValues, type AxisSpec } from './axes';
import { axisReading, cellDocument, cellParsed, type AxisReading } from './cell-document';
import { evaluateCell, type CellOutcome } from './evaluate-cell';

export interface StudySpec {
  x: AxisSpec;
  y: AxisSpec;
}

export interface StudyPlan extends StudySpec {
  /** The validated document as written (what a point loaded into the desk starts from). */
  base: DesignInput;
  /** The same document parsed once for the engine. */
  parsed: ParsedDesign;
  xValues: (number | string)[];
  yValues: (number | string)[];
  /** Each axis value read once (axisReading), in the order of xValues and yValues. */
  xReadings: AxisReading[];
  yReadings: AxisReading[];
}

export type PlanOutcome = { ok: true; plan: StudyPlan } | { ok: false; issues: FieldIssue[] };

/** Validates and parses the document (designWithParsedSchema) and the axes; never throws for bad input. */
export function planStudy(document: unknown, spec: StudySpec): PlanOutcome {
  const issues = [...axisProblems(spec.x, 'x'), ...axisProblems(spec.y, 'y')];
  const depthKeys = new Set(['tipDepth', 'taperRatio']);
  if (spec.x.key === spec.y.key || (depthKeys.has(spec.x.key) && depthKeys.has(spec.y.key)))
    issues.push({ path: 'y.key', message: `must vary another input than the first axis (${spec.x.key})` });
  const read = designWithParsedSchema.safeParse(document);
  if (!read.success) issues.push(...toFieldIssues(read.error));
  if (issues.length > 0 || !read.success) return { ok: false, issues };
  const { document: base, parsed } = read.data;
  const units = parsed.units;
  const xValues = axisValues(spec.x);
  const yValues = axisValues(spec.y);
  return {
    ok: true,
    plan: {
      ...spec,
      base,
      parsed,
      xValues,
      yValues,
      xReadings: xValues.map((v) => axisReading(spec.x.key, v, units)),
      yReadings: yValues.map((v) => axisReading(spec.y.key, v, units)),
    },
  };
}

/** The validated text document of point (i along x, j along y): what the desk loads. */
export function cellInput(plan: StudyPlan, i: number, j: number, shapes: ShapeLookup): DesignInput {
  return cellDocument(plan.base, { [plan.x.key]: plan.xValues[i], [plan.y.key]: plan.yValues[j] }, shapes);
}

/** The parsed document of point (i, j), as the engine takes it. */
export function cellParsedInput(plan: StudyPlan, i: number, j: number, shapes: ShapeLookup): ParsedDesign {
  return cellParsed(
    plan.parsed,
    { [plan.x.key]: plan.xReadings[i], [plan.y.key]: plan.yReadings[j] },
    shapes,
  );
}

export interface StudyCell {
  /** Index along x and along y. */
  i: number;
  j: number;
  outcome: CellOutcome;
}

/** Evaluates the points at the given flat indices (index = j * nx + i). */
export function runCells(plan: StudyPlan, indices: readonly number[], shapes: ShapeLookup): StudyCell[] {
  const nx = axisLength(plan.x);
  return indices.map((index) => {
    const i = index % nx;
    const j = Math.floor(index / nx);
    return { i, j, outcome: evaluateCell(cellParsedInput(plan, i, j, shapes), shapes) };
  });
}

/**
 * Every flat index of an nx x ny grid once, coarse to fine: first every 8th point both ways, then
 * every 4th, 2nd and the rest (each pass skips what an earlier pass visited).
 */
export function cellOrder(nx: number, ny: number): number[] {
  const seen = new Uint8Array(nx * ny);
  const out: number[] = [];
  for (let stride = 8; stride >= 1; stride /= 2) {
    for (let j = 0; j < ny; j += stride) {
      for (let i = 0; i < nx; i += stride) {
        const k = j * nx + i;
        if (!seen[k]) {
          seen[k] = 1;
          out.push(k);
        }
      }
    }
  }
  return out;
}
