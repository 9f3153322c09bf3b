/**
 * The connection at the pier: base plate with moment (AISC Design Guide 1, 2nd ed.) and cast-in
 * anchor rods (AISC 360-16 J3, ACI 318-19 ch. 17), for every combination of the chosen method.
 * Each check reports its own governing combination; the result describes the combination that
 * governs the plate. See METHOD.md for the method, assumptions and limits.
 */
import type { ParsedConnection } from '../../schemas/parsed-design';
import type { Check, ConnectionResult, Method, RootDemand, RootFootprint } from '../types';
import type { ShapeLookup } from '../shapes/types';
import type { UnitSystem } from '../units';
import { availableBearingStress, confinementFactor } from './bearing';
import { governing, notComputed, toCheck, type CheckSpec, type Evaluation } from './check-row';
import { analyseCombination } from './combo-state';
import { readGeometry, type ConnectionGeometry } from './connection-geometry';
import { resolveFootprint, type Footprint } from './footprint';
import { buildConnectionResult } from './connection-result';
import { ANCHOR_LAYOUT, evaluateAnchorLayout } from './check-anchor-layout';
import { ANCHOR_SHEAR, evaluateAnchorShear, rodShearCapacity } from './check-anchor-shear';
import { CONCRETE_BREAKOUT, breakoutCapacity, evaluateConcreteBreakout } from './check-concrete-breakout';
import { INTERACTION, evaluateInteraction } from './check-interaction';
import { PLATE_BEARING, evaluatePlateBearing } from './check-plate-bearing';
import { PLATE_GEOMETRY, evaluatePlateGeometry } from './check-plate-geometry';
import { PLATE_THICKNESS, evaluatePlateThickness } from './check-plate-thickness';
import { PULLOUT, evaluatePullout, pulloutCapacity } from './check-pullout';
import { SIDE_FACE_BLOWOUT, blowoutCapacity, evaluateSideFaceBlowout } from './check-side-face-blowout';
import { STEEL_TENSION, evaluateSteelTension, steelTensionCapacity } from './check-steel-tension';
import { POST_COMBINED, evaluatePost, postStrength } from './check-post';
import { WELD_STRENGTH, evaluateWeld } from './check-weld';

/**
 * A layout that cannot be built: a rod at or beyond the plate's or the pier's edge, a plate larger
 * than the pier, or a section that does not fit on the plate. Null when it can be built.
 */
export function impossibleLayout(geo: ConnectionGeometry): string | null {
  const out: string[] = [];
  if (geo.f >= geo.N / 2 || geo.rowSpan / 2 >= geo.B / 2) out.push('the rods fall outside the plate');
  if (geo.edgeBeyondRow <= 0 || geo.edgeSide <= 0) out.push('the rods fall outside the pier');
  if (geo.N > geo.pierLength * (1 + 1e-9) || geo.B > geo.pierWidth * (1 + 1e-9))
    out.push('the plate is larger than the pier');
  if (geo.footprint.ok) {
    const fp = geo.footprint.footprint;
    if (fp.d > geo.N * (1 + 1e-9) || fp.bf > geo.B * (1 + 1e-9))
      out.push('the section does not fit on the plate');
  }
  return out.length ? out.join(', ') : null;
}

export interface ConnectionContext {
  units: UnitSystem;
  method: Method;
  shapes: ShapeLookup;
}

const PER_COMBINATION: readonly CheckSpec[] = [
  PLATE_BEARING,
  PLATE_THICKNESS,
  STEEL_TENSION,
  CONCRETE_BREAKOUT,
  PULLOUT,
  SIDE_FACE_BLOWOUT,
  ANCHOR_SHEAR,
  INTERACTION,
];

/** What the connection is before any force reaches it: its geometry, the two geometry rows and the capacities. */
interface DemandFree {
  geo: ConnectionGeometry;
  footprint: Footprint | null;
  plateGeometry: Check;
  anchorLayout: Check;
  impossible: string | null;
  sqrtA2A1: number;
  fpMax: number;
  steel: ReturnType<typeof steelTensionCapacity>;
  breakout: ReturnType<typeof breakoutCapacity>;
  pullout: ReturnType<typeof pulloutCapacity>;
  blowout: ReturnType<typeof blowoutCapacity>;
  rodShear: ReturnType<typeof rodShearCapacity>;
}

// A reach study or a lightest-sections ranking checks one connection under thousands of demands:
// what does not depend on the demand is computed once. The capacities depend on the connection,
// the method and the units only; the footprint, the geometry rows and whether the layout can be
// built also on the member's root section (one entry per root below the connection's). Keys hold
// every input readGeometry reads (by value, so a document changed in place is never stale); post
// and weld are checked per demand and are not part of them.
interface ConnectionEntry {
  geo: ConnectionGeometry;
  capacities: Pick<
    DemandFree,
    'sqrtA2A1' | 'fpMax' | 'steel' | 'breakout' | 'pullout' | 'blowout' | 'rodShear'
  >;
  byRoot: Map<string, DemandFree>;
}
const demandFreeCache = new WeakMap<ShapeLookup, Map<string, ConnectionEntry>>();
const CACHE_LIMIT = 500;

function demandFree(input: ParsedConnection, root: RootFootprint, ctx: ConnectionContext): DemandFree {
  const { units, method } = ctx;
  const { plate: p, anchors: a, concrete: c, pier } = input;
  const key = `${method}|${units}|${input.arrangement}|${input.footprint?.shape}|${p.N.text}|${p.B.text}|${p.thickness.text}|${p.Fy.text}|${a.perSide}|${a.diameter.text}|${a.grade}|${a.offset.text}|${a.gauge.text}|${a.embedment.text}|${a.supplementaryReinforcement}|${a.torqued}|${c.fc.text}|${c.cracked}|${c.lambda}|${pier.length.text}|${pier.width.text}|${pier.depth?.text}`;
  const rootKey = `${root.label}|${root.family}|${root.d}|${root.bf}|${root.tf}|${root.tw}`;
  let byKey = demandFreeCache.get(ctx.shapes);
  if (!byKey) {
    byKey = new Map();
    demandFreeCache.set(ctx.shapes, byKey);
  }
  let entry = byKey.get(key);
  if (!entry) {
    const geo = readGeometry(input, root, ctx.shapes);
    const sqrtA2A1 = confinementFactor(geo.N, geo.B, geo.pierLength, geo.pierWidth);
    entry = {
      geo,
      capacities: {
        sqrtA2A1,
        fpMax: availableBearingStress(geo.fc, sqrtA2A1, method),
        steel: steelTensionCapacity(geo, method),
        breakout: breakoutCapacity(geo, method, units),
        pullout: pulloutCapacity(geo, method),
        blowout: blowoutCapacity(geo, method),
        rodShear: rodShearCapacity(geo, method),
      },
      byRoot: new Map(),
    };
    if (byKey.size >= CACHE_LIMIT) byKey.clear();
    byKey.set(key, entry);
  }
  const hit = entry.byRoot.get(rootKey);
  if (hit) return hit;
  // readGeometry reads the root only for the footprint.
  const geo: ConnectionGeometry = {
    ...entry.geo,
    footprint: resolveFootprint(input.footprint?.shape, root, ctx.shapes),
  };
  const fixed: DemandFree = {
    geo,
    footprint: geo.footprint.ok ? geo.footprint.footprint : null,
    plateGeometry: toCheck(PLATE_GEOMETRY, null, evaluatePlateGeometry(geo, units), units),
    anchorLayout: toCheck(ANCHOR_LAYOUT, null, evaluateAnchorLayout(geo, units), units),
    impossible: impossibleLayout(geo),
    ...entry.capacities,
  };
  if (entry.byRoot.size >= CACHE_LIMIT) entry.byRoot.clear();
  entry.byRoot.set(rootKey, fixed);
  return fixed;
}

/** A fresh copy of a cached row (a result's rows are its own: callers may change them). */
function copyCheck(c: Check): Check {
  return {
    ...c,
    demand: c.demand && { ...c.demand },
    capacity: c.capacity && { ...c.capacity },
    ...(c.at ? { at: { ...c.at } } : {}),
  };
}

/**
 * Checks the plate and rods for each root demand (kip, kip·in). Geometry checks carry no
 * combination; every other check names the combination that governs it.
 */
export function checkConnection(
  input: ParsedConnection,
  demands: RootDemand[],
  root: RootFootprint,
  ctx: ConnectionContext,
): { result: ConnectionResult | null; checks: Check[] } {
  const { units, method } = ctx;
  const fixed = demandFree(input, root, ctx);
  const { geo, footprint, impossible, sqrtA2A1, fpMax, steel, breakout, pullout, blowout, rodShear } = fixed;
  const checks: Check[] = [copyCheck(fixed.plateGeometry), copyCheck(fixed.anchorLayout)];
  if (demands.length === 0) {
    checks.push({
      id: 'connection.demand',
      title: 'Forces at the pier',
      reference: '—',
      combination: null,
      demand: null,
      capacity: null,
      ratio: null,
      ok: false,
      note: 'No combination reached the connection, so the plate and rods were not checked.',
    });
    return { result: null, checks };
  }

  // A post base with its own post section: the beam's support face is the post's face, so the plate
  // gets M + V x (post depth / 2) (ENGINE-CONTRACT Version 2). Without a footprint it gets M.
  const offset = geo.arrangement === 'post-base' && input.footprint && footprint ? footprint.d / 2 : 0;
  const states = demands.map((d) => analyseCombination(d, geo, footprint, fpMax, method, offset));
  // One evaluation per check (in PER_COMBINATION order) per combination; blowout may be absent.
  const table = states.map((s) => {
    const shear = evaluateAnchorShear(s, rodShear, geo, method);
    const tension = [
      evaluateSteelTension(s, steel),
      evaluateConcreteBreakout(s, breakout),
      evaluatePullout(s, pullout),
    ];
    const blow = evaluateSideFaceBlowout(s, blowout, units);
    const tensionRatios = tension.map((e) => e.ratio);
    if (blow) tensionRatios.push(blow.ratio);
    return [
      evaluatePlateBearing(s, fpMax),
      evaluatePlateThickness(s, geo.t, footprint !== null, units),
      ...tension,
      blow,
      shear.ev,
      evaluateInteraction(tensionRatios, shear.rodRatio),
    ];
  });
  for (let i = 0; i < PER_COMBINATION.length; i++) {
    const rows: { combination: string; ev: Evaluation }[] = [];
    for (let j = 0; j < states.length; j++) {
      const ev = table[j][i];
      if (ev) rows.push({ combination: states[j].combination, ev });
    }
    const worst = governing(rows);
    if (!worst) continue;
    if (impossible) {
      // Every check that rests on the layout is not computed when the layout cannot be built.
      const note = `not computed: ${impossible}; fix the layout first (plate.geometry, anchors.layout)`;
      checks.push(toCheck(PER_COMBINATION[i], null, notComputed(worst.ev.kind, note), units));
    } else checks.push(toCheck(PER_COMBINATION[i], worst.combination, worst.ev, units));
  }
  if (input.post && geo.arrangement === 'post-base' && input.footprint) {
    const shape = ctx.shapes(input.footprint.shape);
    const strength = shape
      ? postStrength(shape, input.post.height.value, method)
      : ({
          ok: false,
          reason: `the post section "${input.footprint.shape}" is not in the shapes table`,
        } as const);
    const rows = states.map((s) => ({ combination: s.combination, ev: evaluatePost(s.P, s.M, strength) }));
    const worst = governing(rows);
    if (worst) checks.push(toCheck(POST_COMBINED, worst.combination, worst.ev, units));
  }
  if (input.weld) {
    const weld = {
      size: input.weld.size.value,
      electrode: input.weld.electrode ?? 'E70',
      plateThickness: geo.t,
    };
    const rows = states.map((s) => ({
      combination: s.combination,
      ev: footprint
        ? evaluateWeld(s.P, s.M, s.shear, footprint, weld, method, units)
        : notComputed('forcePerLength', 'the section at the plate is unknown, so its weld cannot be checked'),
    }));
    const worst = governing(rows);
    if (worst) checks.push(toCheck(WELD_STRENGTH, worst.combination, worst.ev, units));
  }
  const result = buildConnectionResult(states, geo, fpMax, sqrtA2A1, units, impossible);
  return { result, checks };
}
