/**
 * The result document and the pieces the engine's modules pass to each other.
 *
 * Internal units everywhere inside the engine: kip, in, ksi, kip·in, kip/in.
 * Sign convention (stated once, used everywhere): x runs from the root (x = 0, the support face)
 * to the tip (x = L). Gravity loads act downward. Shear V(x) is the total load between x and the tip;
 * M(x) is the hogging moment of those loads about x. Both are reported as magnitudes (positive).
 * Deflection is the downward movement, positive down.
 */
import type { Quantity, UnitSystem } from './units';
import type { LoadCase } from '../schemas/member';

/**
 * Stored with every revision. 2.0.0: the Version 2 keys, and results that change on purpose for older
 * documents (the flexible root by default, the 5 Hz vibration row, the rods' spread strip, ASD anchors
 * on strength combinations; METHOD.md).
 */
export const ENGINE_VERSION = '2.0.0';

export const CAUTION =
  'Reachline is a design aid. Final design, detailing and sealed calculations are by a licensed engineer under the locally adopted codes.';

export type Method = 'LRFD' | 'ASD';

/** One check: demand against capacity under a named clause. */
export interface Check {
  /** Stable id, e.g. "member.flexure" (see ENGINE-CONTRACT). */
  id: string;
  /** Plain words, e.g. "Bending at the root". */
  title: string;
  /** The clause, e.g. "AISC 360-16 F2". */
  reference: string;
  /** The governing combination's name, or null for a check that has none. */
  combination: string | null;
  demand: Quantity | null;
  capacity: Quantity | null;
  /** demand / capacity; null only when it could not be computed (then ok is false and note says why). */
  ratio: number | null;
  ok: boolean;
  /** Where along the member the check governs, when it varies along x. */
  at?: Quantity;
  /** Plain words when something is off, and a suggestion. */
  note?: string;
  /** member.flexure(.uplift): the effective length of the governing unbraced segment. */
  effectiveLength?: Quantity;
}

/** Root demand and tip deflection for one case or one combination. */
export interface EffectSummary {
  rootMoment: Quantity;
  rootShear: Quantity;
  tipDeflection: Quantity;
}

export interface CombinationSummary extends EffectSummary {
  name: string;
  /** The sense of the root moment: "up" when net load lifts the tip (top flange in compression). */
  direction: 'down' | 'up';
}

/** Station arrays for the charts and `reachline check --stations` (display units). */
export interface StationSeries {
  name: string;
  V: number[];
  M: number[];
  deflection: number[];
  /** Rotation (slope), positive tip-down, radians. Always filled by the engine. */
  rotation?: number[];
}

export interface Stations {
  units: { x: string; V: string; M: string; deflection: string; rotation?: string };
  x: number[];
  cases: StationSeries[];
  combinations: StationSeries[];
  /** Section depth along x (display small-length unit), for the elevation sketch. */
  depth: number[];
}

export interface MemberResult {
  selfWeight: Quantity;
  /** Total steel weight of one member. */
  steelWeight: Quantity;
  section: {
    label: string;
    kind: 'catalog' | 'tapered-rolled' | 'built-up';
    rootDepth: Quantity;
    tipDepth: Quantity;
  };
  /** The steel the checks used: the family's default grade unless the document gave Fy or E. */
  steel?: { grade: string; Fy: Quantity; E: Quantity };
  cases: Partial<Record<LoadCase, EffectSummary>>;
  combinations: CombinationSummary[];
  frequency: Quantity;
  /** Under the service combination that governs member.deflection.total: the member's bending and the root's rotation x length. */
  tipDeflectionParts?: { member: Quantity; connection: Quantity };
  /** Dead-load camber at the tip (the root's rotation included) and the rule used. */
  recommendedCamber?: Quantity & { basis: string };
}

export interface ConnectionResult {
  arrangement: 'post-base' | 'face-plate';
  combination: string;
  bearingLength: Quantity;
  bearingPressure: Quantity;
  anchorTensionPerRod: Quantity;
  requiredThickness: Quantity;
  [extra: string]: unknown;
}

export interface DesignResult {
  engineVersion: string;
  units: UnitSystem;
  method: Method;
  ok: boolean;
  caution: string;
  member: MemberResult;
  connection: ConnectionResult | null;
  checks: Check[];
  stations?: Stations;
}

/**
 * What the member analysis hands to the connection: the demand at the root for each combination
 * of the chosen method (internal units, magnitudes).
 */
export interface RootDemand {
  combination: string;
  /** Moment at the root, kip·in. */
  M: number;
  /** Vertical reaction at the root, kip (compression on a post-base plate; shear on a face plate). */
  V: number;
  /** Horizontal force at the root, kip (zero under gravity loads alone). */
  H: number;
  /** The sense of the root moment (the rows of rods swap roles under "up"). */
  direction?: 'down' | 'up';
}

/** The member's section at the root, as the default footprint on the plate (internal units, in). */
export interface RootFootprint {
  label: string;
  family: 'W' | 'HSS' | 'PIPE' | 'C' | 'I';
  /** Depth along N (the moment direction). */
  d: number;
  /** Width along B. */
  bf: number;
  tf: number;
  /** Web thickness (or wall), in, when known. */
  tw?: number;
}

/** A problem in a document that the schema alone cannot see (an unknown shape, a point load past the tip). */
export class DesignInputError extends Error {
  constructor(public readonly issues: { path: string; message: string }[]) {
    super(issues.map((i) => `${i.path}: ${i.message}`).join('\n'));
    this.name = 'DesignInputError';
  }
}
