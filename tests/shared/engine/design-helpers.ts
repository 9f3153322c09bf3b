/** Small helpers for engine tests: build a validated document and read results in fixed units. */
import type { DesignDocument } from '../../../shared/schemas/design';
import { evaluateDesign, type EvaluateOptions } from '../../../shared/engine/design';
import type { Check, DesignResult } from '../../../shared/engine/types';
import { parsedDesignSchema } from '../../../shared/schemas/parsed-design';

/** A member-only document with no loads but the ones given (self-weight off unless asked). */
export function memberDoc(over: {
  length?: string;
  shape?: string;
  section?: DesignDocument['member']['section'];
  loads?: DesignDocument['loads'];
  method?: 'LRFD' | 'ASD';
  unbracedLength?: string;
  frequencyMin?: string;
  steel?: { Fy?: string; E?: string };
}): DesignDocument {
  return {
    units: 'US',
    method: over.method ?? 'LRFD',
    member: {
      length: over.length ?? '8 ft',
      spacing: '4 ft',
      section: over.section ?? { shape: over.shape ?? 'W12X26' },
      ...(over.unbracedLength ? { unbracedLength: over.unbracedLength } : {}),
      ...(over.steel ? { steel: over.steel } : {}),
    },
    loads: over.loads ?? { selfWeight: false, area: [], line: [], point: [] },
    ...(over.frequencyMin ? { frequencyMin: over.frequencyMin } : {}),
  };
}

export function run(doc: DesignDocument, options?: EvaluateOptions): DesignResult {
  return evaluateDesign(parsedDesignSchema.parse(doc), options);
}

export function check(result: DesignResult, id: string): Check {
  const found = result.checks.find((c) => c.id === id);
  if (!found) throw new Error(`no check ${id} in ${result.checks.map((c) => c.id).join(', ')}`);
  return found;
}

/** Relative difference |a - b| / |b|. */
export function rel(a: number, b: number): number {
  return Math.abs(a - b) / Math.abs(b);
}
