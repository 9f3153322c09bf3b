import { describe, expect, it } from 'vitest';
import { exampleDesign } from '../../shared/engine/examples';
import { parseQuantity } from '../../shared/engine/units';
import type { DesignDocument } from '../../shared/schemas/design';
import { designSchema } from '../../shared/schemas/design';
import { fieldUnit } from '../../src/features/desk/lib/field-units';
import { rewriteQuantity, unitOfText } from '../../src/features/desk/lib/quantity-text';
import { switchUnits } from '../../src/features/desk/lib/switch-units';

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
    expect(si.member.length).toBe('2.7432 m');
    expect(si.connection?.plate.N).toBe('457.2 mm');
    expect(si.connection?.concrete.fc).toBe('27.579 MPa');
    expect(si.loads?.area?.[1].value).toBe('2.8728 kPa');
    const a = physical(us);
    const b = physical(si);
    expect([...b.keys()].sort()).toEqual([...a.keys()].sort());
    for (const [name, value] of a) expect(b.get(name)! / value).toBeCloseTo(1, 4);
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
    expect(doc.member.length).toBe('9.8425 ft');
    expect(doc.member.spacing).toBe('3.937 ft');
  });
});

describe('one field rewritten in another unit', () => {
  it('keeps the physical value and refuses text that does not parse', () => {
    expect(rewriteQuantity('1-1/2 in', 'length', 'mm')).toBe('38.1 mm');
    expect(rewriteQuantity('60 psf', 'areaLoad', 'kPa')).toBe('2.8728 kPa');
    expect(rewriteQuantity('50 ksi', 'stress', 'MPa')).toBe('344.74 MPa');
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
