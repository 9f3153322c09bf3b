import { describe, expect, it } from 'vitest';
import { parsedDesignSchema } from '../../../shared/schemas/parsed-design';
import { evaluateDesign } from '../../../shared/engine/design';
import { exampleDesign } from '../../../shared/engine/examples';
import { clearlyGreater } from '../../../shared/engine/ties';
import { governing } from '../../../shared/engine/connection/check-row';

describe('physically tied combinations', () => {
  it('keeps the earlier combination governing when two service combinations tie exactly', () => {
    // ASCE 7-16 2.4.1 (from memory): D + L and D + 0.75L + 0.75S give the same load when L = 3S.
    const doc = parsedDesignSchema.parse({
      ...exampleDesign,
      loads: {
        ...exampleDesign.loads,
        area: [
          { case: 'D', value: '15 psf' },
          { case: 'L', value: '75 psf' },
          { case: 'S', value: '25 psf' },
        ],
      },
    });
    const total = evaluateDesign(doc).checks.find((c) => c.id === 'member.deflection.total');
    expect(total?.combination).toBe('D + L');
  });

  it('lets a later combination govern once it is larger by more than rounding noise', () => {
    const doc = parsedDesignSchema.parse({
      ...exampleDesign,
      loads: {
        ...exampleDesign.loads,
        area: [
          { case: 'D', value: '15 psf' },
          { case: 'L', value: '75 psf' },
          { case: 'S', value: '26 psf' },
        ],
      },
    });
    const total = evaluateDesign(doc).checks.find((c) => c.id === 'member.deflection.total');
    expect(total?.combination).toBe('D + 0.75L + 0.75S');
    expect(clearlyGreater(1 + 1e-12, 1)).toBe(false);
    expect(clearlyGreater(1 + 1e-6, 1)).toBe(true);
  });

  it('the connection keeps the earlier combination when two ratios differ only by rounding', () => {
    // 0.1 + 0.2 and 0.3 are the same load written two ways (they differ in the last bit).
    const rows = [
      { name: 'first', ev: { demand: 0.3, capacity: 1, kind: 'force' as const, ratio: 0.3 } },
      { name: 'second', ev: { demand: 0.1 + 0.2, capacity: 1, kind: 'force' as const, ratio: 0.1 + 0.2 } },
      { name: 'third', ev: { demand: 0.2, capacity: 1, kind: 'force' as const, ratio: 0.2 } },
    ];
    expect(0.1 + 0.2).toBeGreaterThan(0.3);
    expect(governing(rows)?.name).toBe('first');
  });
});
