import { describe, expect, it } from 'vitest';
import { exampleDesign } from '../../shared/engine/examples';
import { parseQuantity } from '../../shared/engine/units';
import type { DesignDocument } from '../../shared/schemas/design';
import { designSchema } from '../../shared/schemas/design';
import { fieldUnit } from '../../src/features/desk/lib/field-units';
import { rewriteQuantity, unitOfText } from '../../src/features/desk/lib/quantity-text';
import { switchUnits } from '../../src/features/desk/lib/switch-units';
import { LOAD_PRESETS, presetValueText } from '../../src/features/desk/lib/load-presets';

/** Every quantity field of a document as [name, physical value in the engine's internal unit]. */
function physical(doc: unknown, prefix = '', out = new Map<string, number>()): Map<string, number> {
  if (Array.isArray(doc)) doc.forEach((d, i) => physical(d, `${prefix}.${i}`, out));
  else if (doc && typeof doc === 'object')
    for (const [k, v] of Object.entries(doc)) physical(v, prefix ? `${prefix}.${k}` : k, out);
  else if (typeof doc === 'string') {
    const unit = fieldUnit(prefix);
    if (unit) {
      const parsed = parseQuantity(doc, unit.dimension);
      if (!parsed.ok) throw new Error(`${prefix}: ${parsed.message}`);
      out.set(prefix, parsed.value);
    }
  }
  return out;
}

describe('switching the desk between US and SI', () => {
  const us: DesignDocument = exampleDesign;

  it('rewrites every quantity in the other system with the same physical value', () => {
    const { doc: si } = switchUnits(us, 'SI');
    expect(si.units).toBe('SI');
    expect(si.member.length).toBe('2.743 m');
    expect(si.connection?.plate.N).toBe('457.2 mm');
    expect(si.connection?.concrete.fc).toBe('27.58 MPa');
    expect(si.loads?.area?.[1].value).toBe('2.873 kPa');
    const a = physical(us);
    const b = physical(si);
    expect([...b.keys()].sort()).toEqual([...a.keys()].sort());
    for (const [name, value] of a) expect(b.get(name)! / value).toBeCloseTo(1, 3);
    expect(designSchema.safeParse(si).success).toBe(true);
  });

  it('uses the customary unit of each field in SI', () => {
    const { doc: si } = switchUnits(us, 'SI');
    for (const [name] of physical(si)) {
      const text = name
        .split('.')
        .reduce<unknown>((node, key) => (node as Record<string, unknown>)[key], si) as string;
      expect(unitOfText(text)).toBe(fieldUnit(name)!.SI);
    }
  });

  it('restores exactly what was written when switched straight back', () => {
    const there = switchUnits(us, 'SI');
    const back = switchUnits(there.doc, 'US', there.record);
    expect(back.doc).toEqual({ ...us, units: 'US' });
  });

  it('converts a document from SI without a record to US customary units', () => {
    const si: DesignDocument = {
      units: 'SI',
      member: { length: '3 m', spacing: '1200 mm', section: { shape: 'W8X18' } },
    };
    const { doc } = switchUnits(si, 'US');
    expect(doc.member.length).toBe('9.843 ft');
    expect(doc.member.spacing).toBe('3.937 ft');
  });
});

describe('one field rewritten in another unit', () => {
  it('keeps the physical value and refuses text that does not parse', () => {
    expect(rewriteQuantity('1-1/2 in', 'length', 'mm')).toBe('38.1 mm');
    expect(rewriteQuantity('60 psf', 'areaLoad', 'kPa')).toBe('2.873 kPa');
    expect(rewriteQuantity('50 ksi', 'stress', 'MPa')).toBe('344.7 MPa');
    expect(rewriteQuantity('ten feet', 'length', 'm')).toBeNull();
    const v = parseQuantity(rewriteQuantity('40 lbf/ft', 'lineLoad', 'kN/m')!, 'lineLoad');
    expect(v.ok ? v.value : NaN).toBeCloseTo(40 / 12 / 1000, 6);
  });

  it('reads the unit written in a quantity', () => {
    expect(unitOfText('10 ft')).toBe('ft');
    expect(unitOfText('1-1/2 in')).toBe('in');
    expect(unitOfText('40 lbf/ft')).toBe('lbf/ft');
    expect(unitOfText('2.4 kPa')).toBe('kPa');
  });
});

describe('load presets follow the desk unit system', () => {
  it('writes each preset value in the chosen system, with the same physical value', () => {
    const [live, guardLine, guardPoint] = LOAD_PRESETS;
    expect(presetValueText(live, 'US')).toBe('60 psf');
    expect(presetValueText(live, 'SI')).toBe('2.873 kPa'); // 60 psf = 2.8728 kPa (1 psf = 47.880 Pa, NIST SP 811)
    expect(presetValueText(guardLine, 'SI')).toBe('0.7297 kN/m × spacing, at the tip'); // 50 lbf/ft = 0.72970 kN/m
    expect(presetValueText(guardPoint, 'SI')).toBe('0.8896 kN at the tip'); // 200 lbf = 0.88964 kN
    for (const p of LOAD_PRESETS) expect(presetValueText(p, 'SI')).not.toMatch(/psf|lbf/);
  });
});
