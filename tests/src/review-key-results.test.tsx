import { render, screen } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { KeyResults } from '../../src/features/review/components/key-results';
import { evaluateDesign } from '../../shared/engine/design';
import { exampleDesign } from '../../shared/engine/examples';
import { formatQuantity } from '../../shared/engine/units';
import { displayCheck } from '../../shared/words/check-display';
import { parsedDesignSchema } from '../../shared/schemas/parsed-design';

describe('review key results', () => {
  it('shows the service deflections of the engine checks, unfactored, with their limits', () => {
    const result = evaluateDesign(parsedDesignSchema.parse(exampleDesign));
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

describe('concrete bearing in stress units', () => {
  it('reads a large-moment bearing check as psi (US) and MPa (SI), the same ratio, the moments kept in the note', () => {
    for (const units of ['US', 'SI'] as const) {
      const result = evaluateDesign(parsedDesignSchema.parse({ ...exampleDesign, units }));
      const check = result.checks.find((c) => c.id === 'plate.bearing');
      const fpMax = result.connection?.availableBearingStress as { value: number; unit: string };
      if (!check?.demand || check.ratio === null) throw new Error('the example design checks bearing');
      // The example's plate carries a large moment: the engine gives moments about the rod row.
      expect(check.demand.unit).toBe(units === 'US' ? 'kip ft' : 'kN m');
      const shown = displayCheck(check, result.connection);
      const factor = units === 'US' ? 1000 : 1; // ksi to psi
      expect(shown.demand?.unit).toBe(units === 'US' ? 'psi' : 'MPa');
      expect(shown.capacity?.value).toBeCloseTo(fpMax.value * factor, 9);
      expect((shown.demand?.value as number) / (shown.capacity?.value as number)).toBeCloseTo(
        check.ratio,
        12,
      );
      expect(shown.ratio).toBe(check.ratio);
      expect(shown.note).toContain(formatQuantity(check.demand));
    }
  });

  it('shows bearing on Review in stress units, never kip·ft', () => {
    const result = evaluateDesign(parsedDesignSchema.parse(exampleDesign));
    render(<KeyResults result={result} input={exampleDesign} />);
    const tile = screen.getByText('Concrete bearing under the plate').parentElement as HTMLElement;
    expect(tile).toHaveTextContent(/\d psi/);
    expect(tile).toHaveTextContent(/available [\d.]+ psi/);
    expect(tile.textContent).not.toContain('kip·ft');
  });
});
