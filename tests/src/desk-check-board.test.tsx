import { render, screen, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import type { Check } from '../../shared/engine/types';
import { CheckBoard } from '../../src/features/desk/components/check-board';
import { Verdict } from '../../src/features/desk/components/verdict';
import { checkWord, passes, sortWorstFirst, verdictOf } from '../../shared/words/check-words';

function check(id: string, ratio: number | null, ok = ratio !== null && ratio <= 1): Check {
  return {
    id,
    title: `Title ${id}`,
    reference: 'AISC 360-16 F2',
    combination: '1.2D + 1.6L',
    demand: ratio === null ? null : { value: ratio * 10, unit: 'kip ft' },
    capacity: ratio === null ? null : { value: 10, unit: 'kip ft' },
    ratio,
    ok,
  };
}

describe('check words', () => {
  it('words each state, and never calls an uncomputed check a pass', () => {
    expect(checkWord(check('a', 0.3))).toBe('passes');
    expect(checkWord(check('a', 0.6))).toBe('passes');
    expect(checkWord(check('a', 0.95))).toBe('passes, near limit');
    expect(checkWord(check('a', 1.02))).toBe('does not pass');
    expect(checkWord(check('a', null))).toBe('not computed');
    expect(checkWord(check('a', 0.5, false))).toBe('does not pass');
    expect(passes(check('a', null, true))).toBe(false);
  });

  it('sorts worst first: not computed, then failing, then passing by ratio', () => {
    const sorted = sortWorstFirst([
      check('low', 0.2),
      check('over', 1.3),
      check('none', null),
      check('near', 0.93),
      check('worse', 2.1),
    ]);
    expect(sorted.map((c) => c.id)).toEqual(['none', 'worse', 'over', 'near', 'low']);
  });

  it('states the verdict in words, counting uncomputed checks as failing', () => {
    expect(verdictOf([check('a', 0.2), check('b', 0.5)]).sentence).toBe('All 2 checks pass.');
    const v = verdictOf([check('a', 0.2), check('b', null)]);
    expect(v.pass).toBe(false);
    expect(v.sentence).toBe('1 of 2 checks do not pass; 1 of them could not be computed.');
  });
});

describe('CheckBoard', () => {
  it('renders rows worst first with ratio and word beside the bar', () => {
    render(
      <CheckBoard checks={[check('flexure', 0.42), check('thickness', 1.15), check('breakout', null)]} />,
    );
    const rows = screen.getAllByRole('row').slice(1);
    expect(rows.map((r) => r.getAttribute('data-check'))).toEqual(['breakout', 'thickness', 'flexure']);
    expect(within(rows[0]).getByText(/not computed/)).toBeInTheDocument();
    expect(within(rows[1]).getByText('1.15')).toBeInTheDocument();
    expect(within(rows[1]).getByText(/does not pass/)).toBeInTheDocument();
    expect(within(rows[2]).getByText('0.42')).toBeInTheDocument();
    expect(within(rows[2]).getByText('passes')).toBeInTheDocument();
    expect(within(rows[2]).getByText('4.2 kip·ft')).toBeInTheDocument();
  });

  it('shows the verdict and the caution together', () => {
    render(<Verdict checks={[check('a', 0.2), check('b', 1.4)]} stale={false} />);
    expect(screen.getByTestId('verdict')).toHaveTextContent('Does not pass. 1 of 2 checks do not pass.');
    expect(screen.getByTestId('caution')).toHaveTextContent('licensed engineer');
  });
});

describe('check board: the direction of the governing combination', () => {
  it('marks an upward combination as uplift, and leaves a downward one plain', () => {
    const up = { ...check('member.flexure.uplift', 0.4), combination: '0.9D + 1.0W' };
    const down = check('member.flexure', 0.5);
    render(<CheckBoard checks={[up, down]} directions={{ '0.9D + 1.0W': 'up', '1.2D + 1.6L': 'down' }} />);
    const board = screen.getByRole('table', { name: 'Check board' });
    const upRow = board.querySelector('tr[data-check="member.flexure.uplift"]') as HTMLElement;
    const downRow = board.querySelector('tr[data-check="member.flexure"]') as HTMLElement;
    expect(within(upRow).getByText(/uplift: top flange in compression/)).toBeInTheDocument();
    expect(within(downRow).queryByText(/uplift/)).toBeNull();
  });
});

describe('check board: the tension-and-shear interaction row', () => {
  const interaction = (ratio: number, note: string): Check => ({
    id: 'anchors.interaction',
    title: 'Rods in tension and shear together',
    reference: 'ACI 318-19 17.8',
    combination: '1.2D + 1.6L',
    demand: null,
    capacity: null,
    ratio,
    ok: ratio <= 1,
    note,
  });

  it('shows Nua/φNn, Vua/φVn and their sum against 1.2 when both terms are above 0.2', () => {
    // (0.45 + 0.30) / 1.2 = 0.625: ACI 318-19 17.8.3, the engine's own rule (check-interaction.ts)
    render(
      <CheckBoard checks={[interaction(0.625, 'Tension ratio 0.45 + shear ratio 0.30 against 1.2.')]} />,
    );
    const row = screen
      .getByRole('table', { name: 'Check board' })
      .querySelector('tr[data-check="anchors.interaction"]') as HTMLElement;
    const demand = within(row).getByTestId('interaction-demand');
    expect(demand).toHaveTextContent('Nua/φNn 0.45');
    expect(demand).toHaveTextContent('Vua/φVn 0.30');
    expect(demand).toHaveTextContent('sum 0.75');
    expect(within(row).getByTestId('interaction-capacity')).toHaveTextContent('1.20');
    expect(within(row).getByText('0.63')).toBeInTheDocument();
    expect(within(row).queryByText('—')).toBeNull();
  });

  it('shows both terms and the larger alone against 1.0 when one is at most 0.2', () => {
    render(
      <CheckBoard
        checks={[
          interaction(
            0.24,
            'Tension ratio 0.24 and shear ratio 0.00: one is at most 0.2, so the larger alone against 1.0.',
          ),
        ]}
      />,
    );
    const row = document.querySelector('tr[data-check="anchors.interaction"]') as HTMLElement;
    expect(within(row).getByTestId('interaction-demand')).toHaveTextContent(
      'Nua/φNn 0.24Vua/φVn 0.00larger 0.24',
    );
    expect(within(row).getByTestId('interaction-capacity')).toHaveTextContent('1.00');
  });

  it('explains the mark on the bars as the limit 1.00', () => {
    render(<CheckBoard checks={[check('member.flexure', 0.5)]} />);
    const board = screen.getByRole('table', { name: 'Check board' });
    expect(board).toHaveAccessibleDescription(/the mark across it is the limit, 1\.00/);
    expect(screen.getByTestId('limit-mark')).toHaveAttribute('title', 'limit 1.00');
    expect(screen.getByTestId('limit-mark').style.left).toBe('80%');
  });
});
