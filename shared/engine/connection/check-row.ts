/**
 * Builds the Check rows of the connection: one evaluation per combination, the governing one
 * chosen, and a guard so that nothing non-finite ever reaches a result (it becomes a failed check).
 */
import type { Check } from '../types';
import type { ResultKind, UnitSystem } from '../units';
import { resultQuantity as quantity } from './result-quantity';
import { clearlyGreater } from '../ties';

/** One check evaluated for one combination, internal units. */
export interface Evaluation {
  demand: number | null;
  capacity: number | null;
  kind: ResultKind;
  /** demand / capacity; null when it could not be computed (then `note` says why). */
  ratio: number | null;
  note?: string;
  /** Overrides the check's reference, e.g. to name the clause that governs. */
  reference?: string;
}

export interface CheckSpec {
  id: string;
  title: string;
  reference: string;
}

/** demand / capacity when both are finite and the capacity is positive; else null. */
export function safeRatio(demand: number, capacity: number): number | null {
  if (!Number.isFinite(demand) || !Number.isFinite(capacity) || capacity <= 0) return null;
  return demand / capacity;
}

/** An evaluation that could not be computed, with the plain reason. */
export function notComputed(kind: ResultKind, note: string): Evaluation {
  return { demand: null, capacity: null, kind, ratio: null, note };
}

/** The governing evaluation: any that could not be computed, else the largest ratio. */
export function governing<T extends { ev: Evaluation }>(rows: readonly T[]): T | undefined {
  let worst: T | undefined;
  for (const row of rows) {
    if (row.ev.ratio === null) return row;
    if (!worst || (worst.ev.ratio !== null && clearlyGreater(row.ev.ratio, worst.ev.ratio))) worst = row;
  }
  return worst;
}

function finiteOrNull(v: number | null): number | null {
  return v !== null && Number.isFinite(v) ? v : null;
}

/** Turns an evaluation into a result Check; a non-finite number turns into a failed check. */
export function toCheck(
  spec: CheckSpec,
  combination: string | null,
  ev: Evaluation,
  units: UnitSystem,
): Check {
  const demand = finiteOrNull(ev.demand);
  const capacity = finiteOrNull(ev.capacity);
  const ratio = finiteOrNull(ev.ratio);
  const lost = ev.ratio !== null && ratio === null;
  const note = lost
    ? [ev.note, 'A value could not be computed; the check is not passed.'].filter(Boolean).join(' ')
    : ev.note;
  const check: Check = {
    id: spec.id,
    title: spec.title,
    reference: ev.reference ?? spec.reference,
    combination,
    demand: demand === null ? null : quantity(demand, ev.kind, units),
    capacity: capacity === null ? null : quantity(capacity, ev.kind, units),
    ratio,
    ok: ratio !== null && ratio <= 1,
  };
  if (note) check.note = note;
  return check;
}
