/**
 * The section of the member as the engine sees it: properties at any point along x.
 * Internal units: in, in^2, in^3, in^4, in^6.
 */
import type { ShapeFamily } from '../shapes/types';

/** Properties of one cross-section (the published database's names where it has them). */
export interface SectionProps {
  /** Overall depth (Ht for HSS, OD for pipe). */
  d: number;
  A: number;
  Ix: number;
  Sx: number;
  Zx: number;
  Iy: number;
  ry: number;
  J: number;
  /** Warping constant; 0 for closed sections. */
  Cw: number;
  rts: number;
  /** Distance between flange centroids. */
  ho: number;
  /** Flange width (B for HSS, OD for pipe). */
  bf: number;
  /** Flange thickness (tdes for HSS and pipe). */
  tf: number;
  /** Web thickness (tdes for HSS and pipe). */
  tw: number;
  /** Clear web height used for web slenderness and shear (AISC 360-16 Table B4.1b; H - 3t for HSS). */
  h: number;
}

export type SectionFamily = ShapeFamily | 'I';
export type SectionKind = 'catalog' | 'tapered-rolled' | 'built-up';

/** The member's section along its length. */
export interface MemberSection {
  label: string;
  /** The label with its sizes in mm, for SI results (tapered and built-up sections). */
  labelSI?: string;
  kind: SectionKind;
  family: SectionFamily;
  /** True when the properties do not change along x. */
  prismatic: boolean;
  /**
   * True for a hot-rolled I or channel used as rolled: AISC 360-16 G2.1(a) and the rolled-flange
   * limit of Table B4.1b apply. A web cut to a taper and re-welded is treated as welded.
   */
  rolled: boolean;
  root: SectionProps;
  tip: SectionProps;
  /** Properties at the fraction t = x / L of the length (0 at the root, 1 at the tip). */
  at(t: number): SectionProps;
  /** Ix alone at the fraction t (in^4): the deflection integration needs only this. */
  IxAt(t: number): number;
  /** Default yield stress for the family's usual ASTM grade, ksi. */
  defaultFy: number;
  /** Grade named in notes, e.g. "ASTM A992". */
  defaultGrade: string;
}
