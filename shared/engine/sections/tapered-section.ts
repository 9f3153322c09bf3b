/**
 * Web-tapered I members: a rolled W whose web is cut to a linear taper (flanges unchanged), and a
 * built-up I from plates. The depth runs linearly from the root depth to the tip depth; every
 * property at x is computed from the plates at that depth (iSectionProps), so the member is
 * consistent along its length. For a cut W this ignores the fillets: at the root the computed
 * area and J are a little below the table's (METHOD.md; tests/shared/sections).
 */
import type { ShapeRecord } from '../shapes/types';
import type { MemberSection, SectionProps } from './section-types';
import { iSectionIx, iSectionProps } from './i-section';
import { DEFAULT_STEEL } from './steel-grades';

export interface TaperPlates {
  rootDepth: number;
  tipDepth: number;
  flangeWidth: number;
  flangeThickness: number;
  webThickness: number;
  /** Fillet allowance each side when reading web slenderness (kdes - tf for a cut W; 0 for plates). */
  filletAllowance: number;
}

function taperedSection(
  plates: TaperPlates,
  label: [string, string],
  kind: 'tapered-rolled' | 'built-up',
  family: 'W' | 'I',
): MemberSection {
  const { rootDepth, tipDepth, flangeWidth: bf, flangeThickness: tf, webThickness: tw } = plates;
  const root = propsAt(plates, 0);
  const tip = propsAt(plates, 1);
  const steel = DEFAULT_STEEL[family];
  // The properties at each fraction asked for, kept: a section is kept per shape and tip depth
  // (resolve-section.ts), and the fractions x / L of the nodes repeat from one length to the next
  // (about a hundred distinct ones over a 60-length study), so a study computes each once. The
  // same fraction gives the same properties, so a kept one is exactly a new one.
  const memo = new Map<number, SectionProps>();
  // Methods rather than arrow properties: a section is built for every design of a study.
  return {
    label: label[0],
    labelSI: label[1],
    kind,
    family,
    prismatic: rootDepth === tipDepth,
    rolled: false,
    root,
    tip,
    at(t) {
      if (t <= 0) return root;
      if (t >= 1) return tip;
      let p = memo.get(t);
      if (!p) {
        p = propsAt(plates, t);
        if (memo.size >= 1024) memo.clear();
        memo.set(t, p);
      }
      return p;
    },
    IxAt(t) {
      return iSectionIx(rootDepth + (tipDepth - rootDepth) * t, bf, tf, tw);
    },
    defaultFy: steel.Fy,
    defaultGrade: steel.grade,
  };
}

/** The properties at t = x / L (0 root, 1 tip) from the plates at that depth. */
function propsAt(plates: TaperPlates, t: number): SectionProps {
  const d = plates.rootDepth + (plates.tipDepth - plates.rootDepth) * t;
  const tf = plates.flangeThickness;
  return iSectionProps(
    d,
    plates.flangeWidth,
    tf,
    plates.webThickness,
    d - 2 * tf - 2 * plates.filletAllowance,
  );
}

/** A rolled W shape with its web cut to a linear taper from full depth at the root to tipDepth (in). */
export function taperedRolledSection(s: ShapeRecord, tipDepth: number): MemberSection {
  const d = s.d ?? 0;
  const tf = s.tf ?? 0;
  const fillet = Math.max(0, (s.kdes ?? tf) - tf);
  const plates = {
    rootDepth: d,
    tipDepth,
    flangeWidth: s.bf ?? 0,
    flangeThickness: tf,
    webThickness: s.tw ?? 0,
    filletAllowance: fillet,
  };
  const label: [string, string] = [
    `${s.label} tapered to ${fmt(tipDepth)} in`,
    `${s.label} tapered to ${mm(tipDepth)} mm`,
  ];
  return taperedSection(plates, label, 'tapered-rolled', 'W');
}

/** A built-up I welded from plates (all in). */
export function builtUpSection(p: Omit<TaperPlates, 'filletAllowance'>): MemberSection {
  const text = (f: (v: number) => string, unit: string) =>
    p.rootDepth === p.tipDepth
      ? `Built-up I ${f(p.rootDepth)} x ${f(p.flangeWidth)} ${unit}`
      : `Built-up I ${f(p.rootDepth)} to ${f(p.tipDepth)} x ${f(p.flangeWidth)} ${unit}`;
  return taperedSection({ ...p, filletAllowance: 0 }, [text(fmt, 'in'), text(mm, 'mm')], 'built-up', 'I');
}

function fmt(v: number): string {
  return String(Number(v.toPrecision(4)));
}

function mm(inches: number): string {
  return String(Math.round(inches * 25.4));
}
