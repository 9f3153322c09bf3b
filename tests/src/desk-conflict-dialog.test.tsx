import { fireEvent, render, screen, within } from '@testing-library/react';
import { describe, expect, it, vi } from 'vitest';
import { exampleDesign } from '../../shared/engine/examples';
import type { RevisionDto } from '../../shared/schemas/api';
import type { DesignDocument } from '../../shared/schemas/design';
import { ConflictDialog } from '../../src/features/desk/components/conflict-dialog';

const latest = {
  id: 12,
  cantileverId: 3,
  number: 4,
  authorId: 2,
  authorName: 'Ana Ruiz',
  message: 'Thicker plate',
  engineVersion: '1.0.0',
  baseRevisionNumber: 3,
  createdAt: '2026-12-01T10:00:00Z',
  ok: true,
  reviewState: 'draft',
  input: {
    ...exampleDesign,
    connection: {
      ...exampleDesign.connection!,
      plate: { ...exampleDesign.connection!.plate, thickness: '1.5 in' },
    },
  },
  result: null as never,
  reviews: [],
} satisfies RevisionDto;

const mine: DesignDocument = { ...exampleDesign, member: { ...exampleDesign.member, length: '11 ft' } };

describe('ConflictDialog (stale save)', () => {
  it('lists the inputs that differ between the latest revision and mine', () => {
    render(
      <ConflictDialog
        latest={latest}
        mine={mine}
        onKeepMine={() => {}}
        onLoadLatest={() => {}}
        onClose={() => {}}
      />,
    );
    const dialog = screen.getByRole('dialog', { name: 'Revision 4 was saved while you worked' });
    const table = within(dialog).getByRole('table', { name: 'Inputs that differ' });
    const rows = within(table)
      .getAllByRole('row')
      .slice(1)
      .map((r) => [
        within(r).getByRole('rowheader').textContent,
        ...within(r)
          .getAllByRole('cell')
          .map((c) => c.textContent),
      ]);
    // Each input named in words, never by its path.
    expect(rows).toEqual([
      ['Support: plate thickness', '1.5 in', '1.25 in'],
      ['Reach: length, root to tip', '9 ft', '11 ft'],
    ]);
    expect(dialog.textContent).not.toMatch(/connection\.plate|member\.length/);
    expect(within(dialog).getByText(/Ana Ruiz saved revision 4/)).toBeInTheDocument();
  });

  it('offers to keep my changes on top of the latest, or to load the latest', () => {
    const keep = vi.fn();
    const load = vi.fn();
    render(
      <ConflictDialog latest={latest} mine={mine} onKeepMine={keep} onLoadLatest={load} onClose={() => {}} />,
    );
    fireEvent.click(screen.getByRole('button', { name: 'Keep my changes on top of revision 4' }));
    expect(keep).toHaveBeenCalledTimes(1);
    fireEvent.click(screen.getByRole('button', { name: 'Load revision 4' }));
    expect(load).toHaveBeenCalledTimes(1);
  });

  it('closes on Escape and keeps focus inside', () => {
    const close = vi.fn();
    render(
      <ConflictDialog
        latest={latest}
        mine={mine}
        onKeepMine={() => {}}
        onLoadLatest={() => {}}
        onClose={close}
      />,
    );
    const dialog = screen.getByRole('dialog');
    expect(dialog.contains(document.activeElement)).toBe(true);
    fireEvent.keyDown(document, { key: 'Escape' });
    expect(close).toHaveBeenCalledTimes(1);
  });
});
