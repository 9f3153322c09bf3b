/**
 * Switching the whole design document between US and SI: every quantity string is rewritten in the
 * other system's customary unit for its field, and `units` is set. A record of the switch lets a
 * switch straight back restore exactly what was written before (no drift from rounding).
 */
import type { UnitSystem } from '../../../../shared/engine/units';
import type { DesignDocument } from '../../../../shared/schemas/design';
import { fieldUnit } from './field-units';
import { rewriteQuantity } from './quantity-text';

export interface SwitchRecord {
  to: UnitSystem;
  /** field name → [text before, text after] */
  rewritten: Record<string, [string, string]>;
}

function walk(value: unknown, prefix: string, visit: (name: string, text: string) => string): unknown {
  if (Array.isArray(value)) return value.map((item, i) => walk(item, `${prefix}.${i}`, visit));
  if (value !== null && typeof value === 'object') {
    const out: Record<string, unknown> = {};
    for (const [key, child] of Object.entries(value))
      out[key] = walk(child, prefix ? `${prefix}.${key}` : key, visit);
    return out;
  }
  if (typeof value === 'string') return visit(prefix, value);
  return value;
}

export function switchUnits(
  doc: DesignDocument,
  to: UnitSystem,
  previous?: SwitchRecord | null,
): { doc: DesignDocument; record: SwitchRecord } {
  const rewritten: Record<string, [string, string]> = {};
  const back = previous && previous.to !== to ? previous.rewritten : null;
  const next = walk(doc, '', (name, text) => {
    const unit = fieldUnit(name);
    if (!unit) return text;
    const undo = back?.[name];
    const after = undo && undo[1] === text ? undo[0] : rewriteQuantity(text, unit.dimension, unit[to]);
    if (after === null || after === text) return text;
    rewritten[name] = [text, after];
    return after;
  }) as DesignDocument;
  return { doc: { ...next, units: to }, record: { to, rewritten } };
}
