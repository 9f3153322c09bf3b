import { describe, expect, it } from 'vitest';
import { designSchema } from '../../../shared/schemas/design';
import { evaluateDesign } from '../../../shared/engine/design';
import { exampleDesign } from '../../../shared/engine/examples';
import { clearlyGreater } from '../../../shared/engine/checks/ties';

describe('physically tied combinations', () => {
  it('keeps the earlier combination governing when two service combinations tie exactly', () => {
    // ASCE 7-16 2.4.1 (from memory): D + L and D + 0.75L + 0.75S give the same load when L = 3S.
    const doc = designSchema.parse({
      ...exampleDesign,
      loads: { ...exampleDesign.loads, area: [{ case: 'D', value: '15 psf' }, { case: 'L', value: '75 psf' }, { case: 'S', value: '25 psf' }] },
    });
    const total = evaluateDesign(doc).checks.find((c) => c.id === 'member.deflection.total');
    expect(total?.combination).toBe('D + L');
  });

  it('lets a later combination govern once it is larger by more than rounding noise', () => {
    const doc = designSchema.parse({
      ...exampleDesign,
      loads: { ...exampleDesign.loads, area: [{ case: 'D', value: '15 psf' }, { case: 'L', value: '75 psf' }, { case: 'S', value: '26 psf' }] },
    });
    const total = evaluateDesign(doc).checks.find((c) => c.id === 'member.deflection.total');
    expect(total?.combination).toBe('D + 0.75L + 0.75S');
    expect(clearlyGreater(1 + 1e-12, 1)).toBe(false);
    expect(clearlyGreater(1 + 1e-6, 1)).toBe(true);
  });
});
