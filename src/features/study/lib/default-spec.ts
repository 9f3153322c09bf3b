/**
 * The study a person sees first: length from half to 2.5 times the current reach, 40 points, against
 * the tip depth from a third of the root depth to the full depth (a W shape) or the spacing from half
 * to one and a half times the current one (any other section).
 */
import type { ShapeLookup } from '../../../../shared/engine/shapes/types';
import { toInternal } from '../../../../shared/engine/units';
import type { DesignDocument } from '../../../../shared/schemas/design';
import type { StudySpec } from '../../../../shared/study/study-plan';

function round(v: number, step: number): number {
  return Number((Math.round(v / step) * step).toPrecision(6));
}

export function defaultSpec(doc: DesignDocument, shapes: ShapeLookup, steps = 40): StudySpec {
  const si = doc.units === 'SI';
  const lengthIn = safeInches(doc.member?.length) ?? 96;
  const toLen = (inches: number) => (si ? inches * 0.0254 : inches / 12);
  const lenStep = si ? 0.05 : 0.25;
  const length = {
    key: 'length' as const,
    from: round(toLen(lengthIn * 0.5), lenStep),
    to: round(toLen(Math.min(lengthIn * 2.5, 600)), lenStep),
    steps,
  };
  const shape = doc.member?.section?.shape ? shapes(doc.member.section.shape) : undefined;
  if (shape?.family === 'W' && shape.d) {
    const d = si ? shape.d * 25.4 : shape.d;
    const tipStep = si ? 5 : 0.25;
    return {
      x: length,
      y: { key: 'tipDepth', from: round(d / 3, tipStep), to: round(d - tipStep, tipStep), steps },
    };
  }
  const spacingIn = safeInches(doc.member?.spacing) ?? 48;
  return {
    x: length,
    y: {
      key: 'spacing',
      from: round(toLen(spacingIn * 0.5), lenStep),
      to: round(toLen(spacingIn * 1.5), lenStep),
      steps,
    },
  };
}

function safeInches(text: string | undefined): number | null {
  if (!text) return null;
  try {
    return toInternal(text, 'length');
  } catch {
    return null;
  }
}
