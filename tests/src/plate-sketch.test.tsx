/** The plate sketch component: one title and description, and every drawn number also in the table. */
import { describe, expect, it } from 'vitest';
import { render, screen, within } from '@testing-library/react';
import { evaluateDesign } from '../../shared/engine/design';
import { exampleDesign } from '../../shared/engine/examples';
import { designSchema } from '../../shared/schemas/design';
import { parseDesign } from '../../shared/schemas/parsed-design';
import { PlateSketch } from '../../src/features/desk/components/plate-sketch';

describe('PlateSketch', () => {
  const doc = designSchema.parse({
    ...exampleDesign,
    connection: { ...exampleDesign.connection!, pier: { length: '10 in', width: '10 in' } },
  });
  const result = evaluateDesign(parseDesign(doc), {});

  it('renders one titled drawing whose dimensions are all in the table, problems in red words', () => {
    render(<PlateSketch doc={doc} result={result} />);
    const img = screen.getByRole('img', { name: /Base plate on the pier, shop sketch/ });
    expect(img.querySelectorAll('title')).toHaveLength(1);
    expect(img.querySelector('desc')?.textContent).toMatch(
      /Plate N 18 in by B 14 in, 1-1\/4 in thick; pier 10 in by 10 in/,
    );
    const drawn = [...img.querySelectorAll('text')].map((t) => t.textContent ?? '');
    const table = screen.getByTestId('plate-dimensions');
    for (const row of within(table).getAllByRole('row').slice(1)) {
      const id = row.getAttribute('data-dim') ?? '';
      const size = row.querySelectorAll('td')[0].textContent ?? '';
      if (['rods', 'steel', 'bearing'].includes(id)) continue; // words, not a drawn length
      expect(
        drawn.some((t) => t.includes(size)),
        `${id} ${size}`,
      ).toBe(true);
    }
    expect(drawn).toContain(
      '⚠ Rod to pier edge along N (row away from the tip): outside the pier (2 in beyond its edge)',
    );
    expect(within(table).getAllByText('outside the pier (2 in beyond its edge)').length).toBeGreaterThan(0);
    expect(screen.getByRole('list', { name: 'Legend' }).textContent).toMatch(/red ring: rod off the pier/);
  });

  it('says why nothing is drawn without a connection', () => {
    const { connection: _omit, ...memberOnly } = exampleDesign;
    render(<PlateSketch doc={designSchema.parse(memberOnly)} result={null} />);
    expect(screen.getByText('No connection: only the member is checked.')).toBeInTheDocument();
  });
});
