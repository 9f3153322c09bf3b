/**
 * The engine's entry point: one validated design document in, one result document out.
 * Pure and synchronous, so the desk can call it on every keystroke (in a web worker), the server
 * on every save and the CLI on a file. See METHOD.md for the method, sign convention and limits.
 */
import type { ParsedDesign } from '../schemas/parsed-design';
import { checkConnection } from './connection/check-connection';
import { deflectionChecks } from './checks/deflection-check';
import { flexureChecks } from './checks/flexure-check';
import { readLateralSupport } from './checks/lateral-support';
import { flangeWebWeldCheck } from './checks/flange-web-weld';
import { shearCheck } from './checks/shear-check';
import { vibrationCheck } from './checks/vibration-check';
import type { CheckContext } from './checks/check-context';
import { assertFinite, assertStationsFinite } from './finite-guard';
import { inputProblems, MAX_TAPER_SLOPE } from './input-limits';
import { Arena, analyseMember, combine, DEFAULT_INTERVALS } from './member/analysis';
import { gatherCaseLoads, selfWeightLine, type CaseLoads } from './member/case-loads';
import { allowableCombinations, serviceCombinations, strengthCombinations } from './member/combinations';
import { firstFrequency } from './member/frequency';
import { rootStiffness } from './connection/root-stiffness';
import type { LoadCase } from '../schemas/member';
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
import { quantity } from './units';

export interface EvaluateOptions {
  /** Fill `stations` with the display arrays for the charts. */
  stations?: boolean;
  /** Shape lookup (the published table plus a user's imported shapes); default: the published table. */
  shapes?: ShapeLookup;
  /** Equal intervals along the member (point loads add nodes); for convergence studies. */
  intervals?: number;
}

// Room for about 60 stations with five cases and their combinations; a larger design takes a
// second block for its rest (Arena.take).
const ENGINE_ARENA = new Arena(60 * (2 + 6 * 5 + 16));

/**
 * Evaluates a parsed design document (parsedDesignSchema output, or parseDesign of a validated one).
 * @throws DesignInputError with field paths for what the schema cannot see.
 */
export function evaluateDesign(input: ParsedDesign, options: EvaluateOptions = {}): DesignResult {
  const shapes = options.shapes ?? findShape;
  const { units, method, member } = input;
  const L = member.length.value;
  const resolved = resolveSection(member.section, shapes);
  const section: MemberSection | null = Array.isArray(resolved) ? null : resolved;
  const Fy = member.steel?.Fy ? member.steel.Fy.value : (section?.defaultFy ?? 50);
  const E = member.steel?.E ? member.steel.E.value : E_STEEL;
  const problems = [...(Array.isArray(resolved) ? resolved : []), ...inputProblems(input, L, Fy, E)];
  if (section && !section.prismatic && (section.root.d - section.tip.d) / L > MAX_TAPER_SLOPE * (1 + 1e-9)) {
    // METHOD.md: beyond about 1:4 the plane-section assumption of the local-section checks weakens.
    problems.push({
      path: member.section.plates ? 'member.section.plates.tipDepth' : 'member.section.tipDepth',
      message: `makes the taper steeper than 1:4 (the depth falls ${(section.root.d - section.tip.d).toFixed(2)} in over ${L.toFixed(0)} in); use a deeper tip or a longer member`,
    });
  }
  if (problems.length || !section) throw new DesignInputError(problems);

  const caseLoads = gatherCaseLoads(input.loads, section, L, member.spacing.value);
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
    // One arena for every design: nothing of the model outlives this call (the result holds
    // numbers and arrays of its own), so the next design reuses the block instead of allocating.
    ENGINE_ARENA.reset(),
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
  const Lb = member.unbracedLength ? member.unbracedLength.value : L;
  const signed = combos.some((c) => c.factors.W !== undefined || (c.factors.D ?? 0) < 0);
  const ctx: CheckContext = { model, section, method, units, Fy, E, Lb, combos, signed, lateral };

  // A flexible root (connection.flexibleRoot, default true with a connection): the root rotates by
  // (M + V x offset) x flexibility (connection/root-stiffness.ts); cases stay the member's own bending.
  const flexible = input.connection ? (input.connection.flexibleRoot ?? true) : false;
  const spring =
    flexible && input.connection ? rootStiffness(input.connection, rootFootprint(section), shapes, E) : null;
  const root = spring?.ok ? spring : undefined;
  const frequency = firstFrequency(model, massLoads(caseLoads, section, L, input.loads.selfWeight), root);
  const memberTip: Partial<Record<LoadCase, number>> = {};
  const rotationByCase: Partial<Record<LoadCase, number>> = {};
  const tipByCase: Partial<Record<LoadCase, number>> = {};
  for (const c of model.cases) {
    const rotation = root ? (c.response.M[0] + c.response.V[0] * root.offset) * root.flexibility : 0;
    memberTip[c.case] = c.response.tip;
    rotationByCase[c.case] = rotation;
    tipByCase[c.case] = c.response.tip + rotation * L;
  }
  const service = serviceCombinations(present);
  const deflection = deflectionChecks({ tipByCase, service, L, limits: input.deflectionLimits, units });
  const fMin = input.frequencyMin ? input.frequencyMin.value : undefined;
  const vibration = vibrationCheck(frequency, fMin, units);
  const serviceRows = [...deflection, vibration];
  if (spring && !spring.ok) {
    // The root's rotation could not be computed: the serviceability rows are not passed.
    for (const row of serviceRows) {
      row.ratio = null;
      row.ok = false;
      row.note = `not computed: the root rotation of the connection could not be modelled (${spring.reason}); fix the connection or set connection.flexibleRoot to false`;
    }
  }
  const checks: Check[] = [...flexureChecks(ctx), shearCheck(ctx), ...serviceRows];
  // With welds asked for (connection.weld), a built-up or cut tapered I also gets its flange-to-web
  // welds designed; older documents keep their list of checks.
  const flangeWeb = input.connection?.weld ? flangeWebWeldCheck(ctx, input.connection.weld.electrode) : null;
  if (flangeWeb) checks.push(flangeWeb);
  let parts: { member: number; connection: number; rotation: number } | null = null;
  if (root) {
    const total = deflection.find((c) => c.id === 'member.deflection.total');
    const governing = service.find((s) => s.name === total?.combination);
    if (governing) {
      parts = { member: 0, connection: 0, rotation: 0 };
      for (const [c, f] of Object.entries(governing.factors) as [LoadCase, number][]) {
        parts.member += f * (memberTip[c] ?? 0);
        parts.rotation += f * (rotationByCase[c] ?? 0);
      }
      parts.connection = parts.rotation * L;
    }
    const rotationNote = "includes the root's rotation with the connection (flexibleRoot)";
    for (const row of deflection) row.note = row.note ? `${row.note}; ${rotationNote}` : rotationNote;
  }

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
    if (method === 'ASD') {
      // ACI 318 ch. 17 is strength design: for an ASD design the rods and the concrete are checked on
      // the ASCE 7 strength combinations with phi (a fixed divisor of phi Rn is not conservative for
      // every combination, e.g. D + 0.75L + 0.75S against 1.2D + 1.6S + L when S = L and D is light).
      const strength = strengthCombinations(present, seismic).map((c) => {
        const r = combine(model, c.factors, false);
        return { combination: c.name, M: r.M[0], V: r.V[0], H: 0, direction: directionOf(r) };
      });
      const lrfd = checkConnection(input.connection, strength, rootFootprint(section), {
        units,
        method: 'LRFD',
        shapes,
      });
      const byId = new Map(lrfd.checks.map((c) => [c.id, c]));
      out.checks = out.checks.map((c) => {
        const s = byId.get(c.id);
        if (!c.id.startsWith('anchors.') || c.id === 'anchors.layout' || !s) return c;
        const why = 'ACI 318 is strength design: checked on the ASCE 7 strength combinations (LRFD)';
        return { ...s, note: s.note ? `${s.note} ${why}.` : `${why}.` };
      });
    }
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
      // Camber for the full dead load, root rotation included, and none for live load (common
      // practice, no source): the tip then sits level under dead load and moves down only under live load.
      recommendedCamber: {
        ...quantity(Math.max(0, tipByCase.D ?? 0), 'smallLength', units),
        basis: 'the tip deflection under the dead load (100 % D, 0 % L; common practice, no source)',
      },
    },
    connection,
    checks,
  };
  if (parts) {
    result.member.tipDeflectionParts = {
      member: quantity(parts.member, 'smallLength', units),
      connection: quantity(parts.connection, 'smallLength', units),
    };
    if (connection) connection.rootRotation = { value: parts.rotation, unit: 'rad' };
  }
  if (connection && root) {
    const S = quantity(root.S, 'moment', units);
    connection.rootStiffness = { value: S.value, unit: `${S.unit}/rad` };
  }
  assertFinite(result);
  if (options.stations) {
    const stations = stationArrays(model, combos, units, root ? rotationByCase : {});
    assertStationsFinite(stations);
    result.stations = stations;
  }
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
  return { label: section.label, family: section.family, d: r.d, bf: r.bf, tf: r.tf, tw: r.tw };
}
