import { render, screen } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { KeyResults } from '../../src/features/review/components/key-results';
import { evaluateDesign } from '../../shared/engine/design';
import { exampleDesign } from '../../shared/engine/examples';
import { formatQuantity } from '../../shared/engine/units';
import { designSchema } from '../../shared/schemas/design';

describe('review key results', () => {
  it('shows the service deflections of the engine checks, unfactored, with their limits', () => {
    const result = evaluateDesign(designSchema.parse(exampleDesign));
    render(<KeyResults result={result} input={exampleDesign} />);
    const total = result.checks.find((c) => c.id === 'member.deflection.total');
    if (!total?.demand) throw new Error('the example design has a total-load deflection check');
    const tile = screen.getByText('Tip deflection, total load (service)').parentElement as HTMLElement;
    expect(tile).toHaveTextContent(formatQuantity(total.demand));
    expect(tile).toHaveTextContent(`${total.combination}, unfactored`);
    // never the deflection under a factored strength combination
    expect(tile.textContent).not.toMatch(/1\.2D|1\.4D/);
  });
});
