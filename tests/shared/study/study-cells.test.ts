/**
 * The reach study's points are the engine's own answers: each cell equals a single run of the
 * engine on a document written by hand with the same inputs (no oracle numbers of our own: the
 * reference is the engine entry used by the CLI and the API, checkDocument).
 */
import { describe, expect, it } from 'vitest';
import { checkDocument } from '../../../shared/engine/check-document';
import { exampleDesign } from '../../../shared/engine/examples';
import { findShape } from '../../../shared/engine/shapes/table';
import type { DesignDocument } from '../../../shared/schemas/design';
import { axisValues } from '../../../shared/study/axes';
import { summariseResult, type CellOutcome } from '../../../shared/study/evaluate-cell';
import { cellOrder, planStudy, runCells, type StudyCell } from '../../../shared/study/study-plan';

/** The demo scenario's tapered beam with its post base (invented numbers, shared/engine/examples). */
const base: DesignDocument = {
  ...exampleDesign,
  member: { length: '9 ft', spacing: '4 ft', section: { shape: 'W12X26', tipDepth: '7 in' } },
  loads: { ...exampleDesign.loads, point: [{ case: 'D', value: '160 lbf', at: '9 ft' }] },
};

/** What a person would write for the same point: length and tip depth, the guard at the new tip. */
function byHand(length: number, tip: number): DesignDocument {
  return {
    ...base,
    member: { ...base.member, length: `${length} ft`, section: { shape: 'W12X26', tipDepth: `${tip} in` } },
    loads: { ...base.loads, point: [{ case: 'D', value: '160 lbf', at: `${length} ft` }] },
  };
}

function single(doc: DesignDocument): CellOutcome {
  const out = checkDocument(doc);
  if (!out.ok) return { kind: 'invalid', issues: out.issues };
  return summariseResult(out.result);
}

const planned = planStudy(base, {
  x: { key: 'length', from: 5, to: 16, steps: 12 },
  y: { key: 'tipDepth', from: 3, to: 11, steps: 9 },
});
if (!planned.ok) throw new Error(JSON.stringify(planned.issues));
const plan = planned.plan;
const cells = runCells(plan, cellOrder(12, 9), findShape);
const at = (i: number, j: number) => cells.find((c) => c.i === i && c.j === j) as StudyCell;

describe('reach study cells', () => {
  it('visits every point once, coarse to fine (the corners of the coarse pass first)', () => {
    const order = cellOrder(12, 9);
    expect([...order].sort((a, b) => a - b)).toEqual(Array.from({ length: 108 }, (_, k) => k));
    expect(order.slice(0, 4)).toEqual([0, 8, 96, 104]);
  });

  it('writes the axis values with both ends included', () => {
    expect(plan.xValues).toEqual([5, 6, 7, 8, 9, 10, 11, 12, 13, 14, 15, 16]);
    expect(axisValues({ key: 'tipDepth', from: 4, to: 5, steps: 3 })).toEqual([4, 4.5, 5]);
  });

  it('has both passing and failing points, and every point equals a single engine run', () => {
    const results = cells.filter((c) => c.outcome.kind === 'result');
    expect(results.length).toBe(108);
    const pass = results.filter((c) => c.outcome.kind === 'result' && c.outcome.ok);
    expect(pass.length).toBeGreaterThan(5);
    expect(pass.length).toBeLessThan(100);
    for (const c of cells) {
      expect(c.outcome).toEqual(single(byHand(Number(plan.xValues[c.i]), Number(plan.yValues[c.j]))));
    }
  });

  it('the feasible edge: a passing point next to a failing one, each as the engine says alone', () => {
    let edges = 0;
    for (let j = 0; j < 9; j++) {
      for (let i = 0; i < 11; i++) {
        const a = at(i, j).outcome;
        const b = at(i + 1, j).outcome;
        if (a.kind !== 'result' || b.kind !== 'result' || a.ok === b.ok) continue;
        edges += 1;
        const alone = single(byHand(Number(plan.xValues[i + 1]), Number(plan.yValues[j])));
        expect(alone.kind === 'result' && alone.ok).toBe(b.ok);
        const failing = a.ok ? b : a;
        expect(failing.failedBy.length).toBeGreaterThan(0);
        expect(failing.failedBy).toContain(failing.governing.id);
      }
    }
    expect(edges).toBeGreaterThan(0);
  });

  it('longer reach at the same tip depth weighs more and deflects more', () => {
    const a = at(2, 4).outcome;
    const b = at(8, 4).outcome;
    if (a.kind !== 'result' || b.kind !== 'result') throw new Error('expected results');
    expect(b.steelWeight.value).toBeGreaterThan(a.steelWeight.value);
    expect(b.tipDeflection?.value ?? 0).toBeGreaterThan(a.tipDeflection?.value ?? 0);
    expect(a.rodTension?.unit).toBe('kip');
    expect(a.plateThickness?.unit).toBe('in');
  });

  it('a point the engine refuses is invalid with its field message (a mid-span load past a short tip)', () => {
    const doc: DesignDocument = {
      ...base,
      loads: { ...base.loads, point: [{ case: 'L', value: '300 lbf', at: '6 ft' }] },
    };
    const p = planStudy(doc, {
      x: { key: 'length', from: 5, to: 7, steps: 3 },
      y: { key: 'spacing', from: 3, to: 4, steps: 2 },
    });
    if (!p.ok) throw new Error('plan failed');
    const out = runCells(p.plan, [0, 1, 2], findShape);
    expect(out[0].outcome).toEqual({
      kind: 'invalid',
      issues: [{ path: 'loads.point[0].at', message: 'is beyond the tip (length 5 ft), got "6 ft"' }],
    });
    expect(out[2].outcome.kind).toBe('result');
  });

  it('a taper ratio axis and a section axis in SI: the tip depth is the ratio times the root depth', () => {
    const si: DesignDocument = { ...base, units: 'SI', member: { ...base.member, length: '2.7 m' } };
    si.loads = { ...base.loads, point: [{ case: 'D', value: '0.7 kN', at: '2.7 m' }] };
    const p = planStudy(si, {
      x: { key: 'section', shapes: ['W10X19', 'W12X26'] },
      y: { key: 'taperRatio', from: 0.5, to: 1, steps: 2 },
    });
    if (!p.ok) throw new Error(JSON.stringify(p.issues));
    const out = runCells(p.plan, [0, 1, 2, 3], findShape);
    const tip = (k: number) => {
      const o = out[k].outcome;
      return o.kind === 'result' ? o.tipDepth : null;
    };
    // W12X26 d = 12.2 in (AISC Shapes Database v15.0); half of it in mm.
    expect(tip(1)?.value).toBeCloseTo(0.5 * 12.2 * 25.4, 1);
    expect(tip(1)?.unit).toBe('mm');
    expect(tip(3)?.value).toBeCloseTo(12.2 * 25.4, 1);
  });

  it('refuses axes that cannot be run, naming the field', () => {
    const p = planStudy(base, {
      x: { key: 'tipDepth', from: 3, to: 11, steps: 61 },
      y: { key: 'taperRatio', from: 0.5, to: 1.2, steps: 4 },
    });
    expect(p.ok).toBe(false);
    if (p.ok) return;
    expect(p.issues.map((i) => i.path)).toEqual(['x.steps', 'y.to', 'y.key']);
  });
});
