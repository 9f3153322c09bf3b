/**
 * One point of a study: a full design (member and connection) by the same engine entry as the
 * desk, the server and the CLI (evaluateDesign), reduced to what the map and its table show.
 * A point the engine refuses is kept as invalid with the engine's own field messages; it is
 * never shown as a pass.
 */
import { evaluateDesign } from '../engine/design';
import type { ShapeLookup } from '../engine/shapes/types';
import { DesignInputError, type Check, type DesignResult } from '../engine/types';
import type { Quantity } from '../engine/units';
import type { ParsedDesign } from '../schemas/parsed-design';
import type { FieldIssue } from '../schemas/quantity';
import { passes, sortWorstFirst } from '../words/check-words';

export interface CellGoverning {
  id: string;
  title: string;
  /** null when the check could not be computed. */
  ratio: number | null;
}

export type CellOutcome =
  | {
      kind: 'result';
      /** Every check computed and passes. */
      ok: boolean;
      /** The worst check: not computed first, then the highest ratio. */
      governing: CellGoverning;
      /** Ids of the checks that do not pass, worst first. */
      failedBy: string[];
      steelWeight: Quantity;
      tipDepth: Quantity;
      /** Demand of member.deflection.total (the governing service combination), when checked. */
      tipDeflection: Quantity | null;
      /** Largest root moment over the method's combinations. */
      rootMoment: Quantity;
      rodTension: Quantity | null;
      plateThickness: Quantity | null;
    }
  | { kind: 'invalid'; issues: FieldIssue[] };

/** Evaluates one point; `input` is a parsed document (cellParsed of a parsed base). */
export function evaluateCell(input: ParsedDesign, shapes: ShapeLookup): CellOutcome {
  let result: DesignResult;
  try {
    result = evaluateDesign(input, { shapes });
  } catch (e) {
    if (e instanceof DesignInputError) return { kind: 'invalid', issues: e.issues };
    throw e;
  }
  return summariseResult(result);
}

/** The map's numbers from a result document (display units of the result). */
export function summariseResult(result: DesignResult): CellOutcome {
  // Worst first (sortWorstFirst) without sorting every row: a failing row always sorts before a
  // passing one, so only the failing rows need ordering, and with none the worst is the first row
  // with the highest ratio.
  const failing = sortWorstFirst(result.checks.filter((c) => !passes(c)));
  const governing = failing.length > 0 ? failing[0] : highestRatio(result.checks);
  const deflection = result.checks.find((c) => c.id === 'member.deflection.total');
  let rootMoment = result.member.combinations[0]?.rootMoment ?? { value: 0, unit: '' };
  for (const c of result.member.combinations)
    if (c.rootMoment.value > rootMoment.value) rootMoment = c.rootMoment;
  return {
    kind: 'result',
    ok: result.ok && failing.length === 0 && result.checks.length > 0,
    governing: governing
      ? { id: governing.id, title: governing.title, ratio: governing.ratio }
      : { id: '(none)', title: 'no check', ratio: null },
    failedBy: failing.map((c) => c.id),
    steelWeight: result.member.steelWeight,
    tipDepth: result.member.section.tipDepth,
    tipDeflection: deflection?.demand ?? null,
    rootMoment,
    rodTension: result.connection?.anchorTensionPerRod ?? null,
    plateThickness: result.connection?.requiredThickness ?? null,
  };
}

/** The first row with the highest ratio (rows that all pass: their ratios are finite). */
export function highestRatio(checks: readonly Check[]): Check | undefined {
  let best: Check | undefined;
  for (const c of checks) if (!best || (c.ratio ?? 0) > (best.ratio ?? 0)) best = c;
  return best;
}
