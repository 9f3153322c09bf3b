/**
 * The parsed design document (shared/schemas/parsed-design.ts): the schema reads every quantity
 * once into the engine's internal unit and keeps the text; the study's parsed cells are the same as
 * parsing the text cell a person would load into the desk.
 */
import { describe, expect, it } from 'vitest';
import { exampleDesign, exampleTapered } from '../../shared/engine/examples';
import { findShape } from '../../shared/engine/shapes/table';
import { designSchema, type DesignDocument } from '../../shared/schemas/design';
import { parseDesign, parsedDesignSchema } from '../../shared/schemas/parsed-design';
import { cellInput, cellParsedInput, planStudy, type StudySpec } from '../../shared/study/study-plan';

const SI: DesignDocument = {
  units: 'SI',
  member: { length: '2.4384 m', spacing: '1219.2 mm', section: { shape: 'W12X26', tipDepth: '203.2 mm' } },
  loads: {
    area: [{ case: 'L', value: '60 psf' }],
    point: [{ case: 'D', value: '1 kN', at: '2.4384 m' }],
  },
  connection: {
    arrangement: 'post-base',
    plate: { N: '20 in', B: '16 in', thickness: '1-1/2 in' },
    anchors: {
      perSide: 2,
      diameter: '1 in',
      grade: 'F1554-36',
      offset: '8 in',
      gauge: '10 in',
      embedment: '12 in',
    },
    concrete: { fc: '4000 psi' },
    pier: { length: '3 ft', width: '36 in' },
  },
};

describe('parsedDesignSchema', () => {
  it('reads each quantity into the internal unit (in, kip, ksi) and keeps the text as written', () => {
    const p = parsedDesignSchema.parse(SI);
    // 1 in = 25.4 mm exactly, 1 ft = 12 in (NIST SP 811, B.8): 2.4384 m = 96 in, 203.2 mm = 8 in.
    expect(p.member.length).toEqual({ value: 96, text: '2.4384 m' });
    expect(p.member.spacing.value).toBe(48);
    expect(p.member.section.tipDepth).toEqual({ value: 8, text: '203.2 mm' });
    // 60 psf = 60 lbf / 144 in^2 = 0.41667 psi = 4.1667e-4 ksi (definition of the units).
    expect(p.loads.area[0].value.value).toBeCloseTo(60 / 144 / 1000, 12);
    // 1 kN = 224.809 lbf (NIST SP 811, B.8: 1 lbf = 4.448222 N).
    expect(p.loads.point[0].value.value).toBeCloseTo(1000 / 4.448222 / 1000, 6);
    expect(p.connection?.plate.thickness).toEqual({ value: 1.5, text: '1-1/2 in' });
    expect(p.connection?.plate.Fy).toEqual({ value: 36, text: '36 ksi' }); // the schema's default, read
    expect(p.connection?.concrete.fc.value).toBe(4);
    expect(p.connection?.pier.length.value).toBe(36);
    // Everything that is not a quantity is the validated document's own (defaults filled in).
    expect(p.method).toBe('LRFD');
    expect(p.deflectionLimits).toEqual({ live: 360, total: 240 });
    expect(p.loads.selfWeight).toBe(true);
    expect(p.connection?.concrete.cracked).toBe(true);
    expect(p.connection?.anchors.grade).toBe('F1554-36');
  });

  it('is the validating schema followed by parseDesign, and refuses what designSchema refuses', () => {
    for (const doc of [exampleDesign, exampleTapered, SI])
      expect(parsedDesignSchema.parse(doc)).toEqual(parseDesign(designSchema.parse(doc)));
    const bad = parsedDesignSchema.safeParse({ ...SI, member: { ...SI.member, length: '10' } });
    expect(bad.success).toBe(false);
    expect(bad.error?.issues[0].path).toEqual(['member', 'length']);
  });
});

describe('study cells, parsed directly', () => {
  const specs: [DesignDocument, StudySpec][] = [
    [
      exampleTapered,
      { x: { key: 'length', from: 4, to: 16, steps: 7 }, y: { key: 'tipDepth', from: 3, to: 12, steps: 5 } },
    ],
    [
      exampleDesign,
      {
        x: { key: 'spacing', from: 2, to: 8, steps: 4 },
        y: { key: 'taperRatio', from: 0.4, to: 1, steps: 4 },
      },
    ],
    [
      exampleTapered,
      {
        x: { key: 'section', shapes: ['W8X10', 'W10X26', 'HSS8X4X1/4', 'W99X1'] },
        y: { key: 'length', from: 5, to: 9, steps: 3 },
      },
    ],
    [
      SI,
      {
        x: { key: 'length', from: 1.5, to: 4, steps: 3 },
        y: { key: 'tipDepth', from: 100, to: 250, steps: 3 },
      },
    ],
  ];
  it('equal the parsed text document of the same point (what the desk loads when a point is clicked)', () => {
    let cells = 0;
    for (const [doc, spec] of specs) {
      const planned = planStudy(doc, spec);
      if (!planned.ok) throw new Error(JSON.stringify(planned.issues));
      const { plan } = planned;
      for (let i = 0; i < plan.xValues.length; i++)
        for (let j = 0; j < plan.yValues.length; j++) {
          const text = cellInput(plan, i, j, findShape);
          expect(cellParsedInput(plan, i, j, findShape)).toEqual(parseDesign(designSchema.parse(text)));
          cells += 1;
        }
    }
    expect(cells).toBe(35 + 16 + 12 + 9);
  });
});
