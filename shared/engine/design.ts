/**
 * The engine's entry point: one validated design document in, one result document out.
 * Pure and synchronous, so the desk can call it on every keystroke (in a web worker), the server
 * on every save and the CLI on a file. See METHOD.md for the method, sign convention and limits.
 */
import type { DesignInput } from '../schemas/design';
import { checkConnection } from './connection/check-connection';
import { deflectionChecks } from './checks/deflection-check';
import { flexureChecks } from './checks/flexure-check';
import { readLateralSupport } from './checks/lateral-support';
import { shearCheck } from './checks/shear-check';
import { vibrationCheck } from './checks/vibration-check';
import type { CheckContext } from './checks/check-context';
import { assertFinite } from './finite-guard';
import { inputProblems } from './input-limits';
import { analyseMember, combine, DEFAULT_INTERVALS } from './member/analysis';
import { gatherCaseLoads, selfWeightLine, type CaseLoads } from './member/case-loads';
import { allowableCombinations, serviceCombinations, strengthCombinations } from './member/combinations';
import { firstFrequency } from './member/frequency';
import { caseSummaries, combinationSummaries, directionOf, stationArrays } from './member-summary';
import { resolveSection } from './sections/resolve-section';
import type { MemberSection } from './sections/section-types';
import { E_STEEL, STEEL_DENSITY } from './sections/steel-grades';
import { findShape } from './shapes/table';
import type { ShapeLookup } from './shapes/types';
import {
  CAUTION,
  DesignInputError,
  ENGINE_VERSION,
  type Check,
  type DesignResult,
  type RootDemand,
  type RootFootprint,
} from './types';
import { quantity, toInternal } from './units';

export interface EvaluateOptions {
  /** Fill `stations` with the display arrays for the charts. */
  stations?: boolean;
  /** Shape lookup (the published table plus a user's imported shapes); default: the published table. */
  shapes?: ShapeLookup;
  /** Equal intervals along the member (point loads add nodes); for convergence studies. */
  intervals?: number;
}

/**
 * Evaluates a validated design document (designSchema.parse output).
 * @throws DesignInputError with field paths for what the schema cannot see.
 */
export function evaluateDesign(input: DesignInput, options: EvaluateOptions = {}): DesignResult {
  const shapes = options.shapes ?? findShape;
  const { units, method, member } = input;
  const L = toInternal(member.length, 'length');
  const resolved = resolveSection(member.section, shapes);
  const section: MemberSection | null = Array.isArray(resolved) ? null : resolved;
  const Fy = member.steel?.Fy ? toInternal(member.steel.Fy, 'stress') : (section?.defaultFy ?? 50);
  const E = member.steel?.E ? toInternal(member.steel.E, 'stress') : E_STEEL;
  const problems = [...(Array.isArray(resolved) ? resolved : []), ...inputProblems(input, L, Fy, E)];
  if (problems.length || !section) throw new DesignInputError(problems);

  const caseLoads = gatherCaseLoads(input.loads, section, L, toInternal(member.spacing, 'length'));
  if (caseLoads.length === 0) {
    throw new DesignInputError([
      { path: 'loads', message: 'there is no load to check: turn on self-weight or add a load' },
    ]);
  }
  const lateral = readLateralSupport(member);
  const model = analyseMember(
    section,
    L,
    E,
    caseLoads,
    options.intervals ?? DEFAULT_INTERVALS,
    lateral.braces,
  );
  const present = new Set(caseLoads.map((c) => c.case));
  const seismic = input.loads.seismic;
  const list =
    method === 'LRFD' ? strengthCombinations(present, seismic) : allowableCombinations(present, seismic);
  const combos = list.map((c) => ({
    name: c.name,
    factors: c.factors,
    response: combine(model, c.factors, options.stations === true),
  }));
  const Lb = member.unbracedLength ? toInternal(member.unbracedLength, 'length') : L;
  const signed = combos.some((c) => c.factors.W !== undefined || (c.factors.D ?? 0) < 0);
  const ctx: CheckContext = { model, section, method, units, Fy, E, Lb, combos, signed, lateral };

  const frequency = firstFrequency(model, massLoads(caseLoads, section, L, input.loads.selfWeight));
  const tipByCase = Object.fromEntries(model.cases.map((c) => [c.case, c.response.tip]));
  const checks: Check[] = [
    ...flexureChecks(ctx),
    shearCheck(ctx),
    ...deflectionChecks({
      tipByCase,
      service: serviceCombinations(present),
      L,
      limits: input.deflectionLimits,
      units,
    }),
  ];
  const fMin = input.frequencyMin ? toInternal(input.frequencyMin, 'frequency') : undefined;
  const vibration = vibrationCheck(frequency, fMin, units);
  if (vibration) checks.push(vibration);

  let connection: DesignResult['connection'] = null;
  if (input.connection) {
    const demands: RootDemand[] = combos.map((c) => ({
      combination: c.name,
      M: c.response.M[0],
      V: c.response.V[0],
      H: 0,
      direction: directionOf(c.response),
    }));
    const out = checkConnection(input.connection, demands, rootFootprint(section), { units, method, shapes });
    connection = out.result;
    checks.push(...out.checks);
  }

  const sw = selfWeightLine(section, L);
  const result: DesignResult = {
    engineVersion: ENGINE_VERSION,
    units,
    method,
    ok: checks.every((c) => c.ok),
    caution: CAUTION,
    member: {
      selfWeight: quantity(sw.q0, 'lineLoad', units),
      steelWeight: quantity(STEEL_DENSITY * L * ((section.root.A + section.tip.A) / 2), 'weight', units),
      section: {
        label: units === 'SI' && section.labelSI ? section.labelSI : section.label,
        kind: section.kind,
        rootDepth: quantity(section.root.d, 'smallLength', units),
        tipDepth: quantity(section.tip.d, 'smallLength', units),
      },
      steel: {
        grade: member.steel?.Fy ? 'as given (member.steel.Fy)' : section.defaultGrade,
        Fy: quantity(Fy, 'stress', units),
        E: quantity(E, 'stress', units),
      },
      cases: caseSummaries(model, units),
      combinations: combinationSummaries(combos, units),
      frequency: quantity(frequency, 'frequency', units),
    },
    connection,
    checks,
  };
  if (options.stations) result.stations = stationArrays(model, section, combos, units);
  assertFinite(result);
  return result;
}

/**
 * The weights that vibrate with the member: the steel (always, even when its weight is left out of
 * the load cases) and every dead load. Live load is not included (METHOD.md).
 */
function massLoads(
  caseLoads: CaseLoads[],
  section: MemberSection,
  L: number,
  selfWeightInD: boolean,
): CaseLoads {
  const dead = caseLoads.find((c) => c.case === 'D');
  const sw = selfWeightLine(section, L);
  const mass: CaseLoads = { case: 'D', q0: dead?.q0 ?? 0, q1: dead?.q1 ?? 0, points: dead?.points ?? [] };
  if (!selfWeightInD) {
    mass.q0 += sw.q0;
    mass.q1 += sw.q1;
  }
  return mass;
}

function rootFootprint(section: MemberSection): RootFootprint {
  const r = section.root;
  return { label: section.label, family: section.family, d: r.d, bf: r.bf, tf: r.tf };
}
