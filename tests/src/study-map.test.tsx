/**
 * The reach study's map and table in jsdom: arrow keys move the focus point and the aria-live line
 * reads it; Enter loads the focused point; the feasible edge is drawn between passing and failing
 * points; the table lists the same points with the same numbers. The points here are made by hand
 * (display values only; the engine's own points are tested in tests/shared/study).
 */
import { fireEvent, render, screen, within } from '@testing-library/react';
import { describe, expect, it, vi } from 'vitest';
import { exampleDesign } from '../../shared/engine/examples';
import type { CellOutcome } from '../../shared/study/evaluate-cell';
import { planStudy } from '../../shared/study/study-plan';
import { StudyMap } from '../../src/features/study/components/study-map';
import { StudyTable } from '../../src/features/study/components/study-table';

const planned = planStudy(exampleDesign, {
  x: { key: 'length', from: 6, to: 10, steps: 3 },
  y: { key: 'spacing', from: 3, to: 4, steps: 2 },
});
if (!planned.ok) throw new Error('plan');
const plan = planned.plan;

function cell(ok: boolean, ratio: number, weight: number): CellOutcome {
  return {
    kind: 'result',
    ok,
    governing: { id: 'member.flexure', title: 'Bending at the root', ratio },
    failedBy: ok ? [] : ['member.flexure'],
    steelWeight: { value: weight, unit: 'lbf' },
    tipDepth: { value: 8.14, unit: 'in' },
    tipDeflection: { value: 0.2, unit: 'in' },
    rootMoment: { value: 12.5, unit: 'kip ft' },
    rodTension: { value: 3.1, unit: 'kip' },
    plateThickness: { value: 1.1, unit: 'in' },
  };
}

// Index j * 3 + i: the bottom row (spacing 3 ft) passes up to 8 ft; the top row only at 6 ft.
const cells: (CellOutcome | undefined)[] = [
  cell(true, 0.5, 108),
  cell(true, 0.8, 144),
  cell(false, 1.2, 180),
  cell(true, 0.7, 108),
  cell(false, 1.1, 144),
  { kind: 'invalid', issues: [{ path: 'loads.point[0].at', message: 'is beyond the tip' }] },
];

function renderMap(onPick = vi.fn()) {
  // jsdom has no canvas; the map draws the points only where a 2D context exists.
  vi.spyOn(HTMLCanvasElement.prototype, 'getContext').mockReturnValue(null);
  render(<StudyMap plan={plan} cells={cells} complete runId={1} onPick={onPick} onPoint={() => undefined} />);
  return onPick;
}

describe('study map', () => {
  it('arrow keys move the focus point and read it out; edges stop the focus', () => {
    renderMap();
    const map = screen.getByTestId('study-map');
    const said = () => screen.getByTestId('map-announcement').textContent;
    fireEvent.focus(map);
    expect(said()).toBe(
      'Length 6 ft, spacing 3 ft: passes; Bending at the root governs (0.50). Length 6 ft, tip depth 8.14 in, tip deflection 0.2 in, root moment 12.5 kip·ft, steel 108 lbf, rod tension 3.1 kip, plate thickness needed 1.1 in.',
    );
    fireEvent.keyDown(map, { key: 'ArrowLeft' });
    expect(said()).toMatch(/^Length 6 ft, spacing 3 ft: passes/);
    fireEvent.keyDown(map, { key: 'ArrowRight' });
    fireEvent.keyDown(map, { key: 'ArrowUp' });
    expect(said()).toMatch(
      /^Length 8 ft, spacing 4 ft: does not pass; Bending at the root governs \(1\.10\)/,
    );
    fireEvent.keyDown(map, { key: 'ArrowUp' });
    fireEvent.keyDown(map, { key: 'End' });
    expect(said()).toBe(
      'Length 10 ft, spacing 4 ft: not a valid design: loads.point[0].at: is beyond the tip.',
    );
    fireEvent.keyDown(map, { key: 'ArrowDown' });
    expect(said()).toMatch(/^Length 10 ft, spacing 3 ft: does not pass/);
    expect(screen.getByTestId('focus-cell')).toBeInTheDocument();
  });

  it('Enter loads the focused point', () => {
    const onPick = renderMap();
    const map = screen.getByTestId('study-map');
    fireEvent.focus(map);
    fireEvent.keyDown(map, { key: 'ArrowRight' });
    fireEvent.keyDown(map, { key: 'Enter' });
    expect(onPick).toHaveBeenCalledWith(1, 0);
  });

  it('outlines the edges between passing and other points, and names its axes', () => {
    renderMap();
    // 3 x 2 points on a 474 x 360 plot: cells 158 x 180, the bottom row drawn at y 180 to 360.
    // Edges: (1,0) | (2,0) upright, (1,0) under (1,1) flat, (0,1) | (1,1) upright; none between
    // (0,0) and (0,1) (both pass) or between a failing point and an invalid one.
    const d = screen.getByTestId('feasible-outline').getAttribute('d');
    expect(d).toBe('M316.0,180.0v180.0M158.0,180.0h158.0M158.0,0.0v180.0');
    const label = screen.getByTestId('study-map').getAttribute('aria-label') ?? '';
    expect(label).toContain('3 by 2 points: Length (ft) across, Spacing (ft) up');
  });
});

describe('study table', () => {
  it('lists every computed point with the same words and numbers as the readout', () => {
    render(<StudyTable plan={plan} cells={[...cells.slice(0, 5), undefined]} />);
    const table = screen.getByTestId('study-table');
    const rows = within(table).getAllByRole('row').slice(1);
    expect(rows).toHaveLength(5);
    const text = rows.map((r) =>
      within(r)
        .getAllByRole('cell')
        .map((c) => c.textContent),
    );
    expect(text[0]).toEqual([
      '6 ft',
      '3 ft',
      'passes',
      'Bending at the root governs (0.50)',
      '6 ft',
      '8.14 in',
      '0.2 in',
      '12.5 kip·ft',
      '108 lbf',
      '3.1 kip',
      '1.1 in',
    ]);
    expect(text[4].slice(0, 4)).toEqual([
      '8 ft',
      '4 ft',
      'does not pass',
      'Bending at the root governs (1.10)',
    ]);
    expect(within(table).getByText('5 of 6 points computed; one row per point.')).toBeInTheDocument();
  });
});
