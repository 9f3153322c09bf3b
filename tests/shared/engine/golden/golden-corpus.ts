/**
 * The golden corpus: a large, varied, deterministic set of design documents (the examples, the demo
 * designs and systematic variations of lengths, tip depths, every shape family, connection variants
 * and the Version 2 keys) plus study cells and a lightest-sections ranking. golden.test.ts holds the
 * engine's output for every entry to the recorded hashes (golden-hashes.json), so a change made for
 * speed cannot change a result. Not a test file; no oracle values: the record is the engine's own
 * output at the time it was recorded.
 */
import { checkDocument } from '../../../../shared/engine/check-document';
import { exampleDesign, exampleMemberOnly, exampleTapered } from '../../../../shared/engine/examples';
import { findShape, SHAPES } from '../../../../shared/engine/shapes/table';
import type { DesignDocument } from '../../../../shared/schemas/design';
import { lightestSections } from '../../../../shared/study/lightest-sections';
import { cellOrder, planStudy, runCells, type StudySpec } from '../../../../shared/study/study-plan';
import { EAST_DECK_DESIGN, ENTRY_CANOPY_DESIGN } from '../../../../server/db/demo-designs';

export interface GoldenEntry {
  name: string;
  /** Computes the entry's output (a result, the field issues, study cells or a ranking). */
  run: () => unknown;
}

type Loads = NonNullable<DesignDocument['loads']>;
/** Every base here writes out its load lists, so the variations can push into them. */
type Doc = Omit<DesignDocument, 'loads'> & {
  loads: Loads & Required<Pick<Loads, 'area' | 'line' | 'point'>>;
};
const asDoc = (d: DesignDocument): Doc => d as Doc;
const EXAMPLE = asDoc(exampleDesign);
const MEMBER_ONLY = asDoc(exampleMemberOnly);
const TAPERED = asDoc(exampleTapered);
const EAST_DECK = asDoc(EAST_DECK_DESIGN);
const ENTRY_CANOPY = asDoc(ENTRY_CANOPY_DESIGN);
type Connection = NonNullable<Doc['connection']>;

const clone = <T>(value: T): T => structuredClone(value);

function withLength(doc: Doc, length: string): Doc {
  const d = clone(doc);
  const old = d.member.length;
  d.member.length = length;
  if (d.member.unbracedLength === old) d.member.unbracedLength = length;
  d.loads.point = (d.loads.point ?? []).map((p) => (p.at === old ? { ...p, at: length } : p));
  return d;
}

function withSection(doc: Doc, section: Doc['member']['section']): Doc {
  const d = clone(doc);
  d.member.section = section;
  return d;
}

function withConnection(doc: Doc, change: (c: Connection) => void): Doc {
  const d = clone(doc);
  if (!d.connection) throw new Error('no connection to vary');
  change(d.connection);
  return d;
}

const BUILT_UP: Doc = withSection(MEMBER_ONLY, {
  plates: {
    rootDepth: '18 in',
    tipDepth: '8 in',
    flangeWidth: '8 in',
    flangeThickness: '1/2 in',
    webThickness: '5/16 in',
  },
});

const SI_DOC: Doc = {
  units: 'SI',
  method: 'LRFD',
  member: { length: '3 m', spacing: '1.2 m', section: { shape: 'W10X19', tipDepth: '160 mm' } },
  loads: {
    selfWeight: true,
    area: [
      { case: 'D', value: '0.8 kPa' },
      { case: 'L', value: '2.9 kPa' },
    ],
    line: [{ case: 'D', value: '0.4 kN/m' }],
    point: [{ case: 'D', value: '0.7 kN', at: '3 m' }],
  },
  deflectionLimits: { live: 360, total: 240 },
  connection: {
    arrangement: 'post-base',
    plate: { N: '500 mm', B: '380 mm', thickness: '32 mm', Fy: '250 MPa' },
    anchors: {
      perSide: 2,
      diameter: '1 in',
      grade: 'F1554-55',
      offset: '220 mm',
      gauge: '250 mm',
      embedment: '350 mm',
    },
    concrete: { fc: '28 MPa', cracked: true },
    pier: { length: '900 mm', width: '700 mm' },
  },
};

const BASES: Record<string, Doc> = {
  example: EXAMPLE,
  memberOnly: MEMBER_ONLY,
  tapered: TAPERED,
  eastDeck: EAST_DECK,
  entryCanopy: ENTRY_CANOPY,
  builtUp: BUILT_UP,
  si: SI_DOC,
};

function documents(): [string, Doc, boolean][] {
  const out: [string, Doc, boolean][] = [];
  const add = (name: string, doc: Doc, stations = false) => out.push([name, doc, stations]);
  for (const [name, base] of Object.entries(BASES)) {
    add(name, base);
    add(`${name}/stations`, base, true);
    const asd = clone(base);
    asd.method = 'ASD';
    add(`${name}/ASD`, asd);
    const lengths =
      base.units === 'SI' ? ['1.5 m', '2.4 m', '4 m', '5.5 m'] : ['4 ft', '6.5 ft', '12 ft', '16 ft'];
    for (const length of lengths) add(`${name}/length ${length}`, withLength(base, length));
    const noSw = clone(base);
    noSw.loads.selfWeight = false;
    add(`${name}/no self-weight`, noSw);
  }
  // Tip depths of a tapered W (the shallow ones are refused with a field error).
  for (const tip of ['3 in', '4.5 in', '6 in', '7 in', '8.25 in', '10 in', '12 in', '12.2 in', '14 in'])
    add(`eastDeck/tip ${tip}`, withSection(EAST_DECK, { shape: 'W12X26', tipDepth: tip }));
  for (const tip of ['3 in', '5 in', '8 in', '10 in'])
    add(
      `builtUp/tip ${tip}`,
      withSection(BUILT_UP, { plates: { ...BUILT_UP.member.section.plates!, tipDepth: tip } }),
    );
  // Every family: every 5th shape of the table, with and without the connection, and tapered Ws.
  SHAPES.forEach((shape, k) => {
    if (k % 5 !== 0) return;
    add(`shape ${shape.label}/with connection`, withSection(EXAMPLE, { shape: shape.label }));
    if (k % 10 === 0)
      add(`shape ${shape.label}/member only`, withSection(MEMBER_ONLY, { shape: shape.label }));
    if (shape.family === 'W' && k % 15 === 0 && shape.d)
      add(
        `shape ${shape.label}/tapered`,
        withSection(EAST_DECK, { shape: shape.label, tipDepth: `${(shape.d * 0.6).toFixed(2)} in` }),
      );
  });
  // Connection variants.
  const variants: [string, (c: Connection) => void][] = [
    ['face-plate', (c) => (c.arrangement = 'face-plate')],
    ['post 12 in', (c) => ((c.post = { height: '12 in' }), (c.footprint = { shape: 'HSS6X6X3/8' }))],
    ['post 30 in', (c) => ((c.post = { height: '30 in' }), (c.footprint = { shape: 'W8X31' }))],
    ['weld 5/16', (c) => (c.weld = { size: '5/16 in', electrode: 'E70' })],
    ['weld 3/16 E80', (c) => (c.weld = { size: '3/16 in', electrode: 'E80' })],
    ['rigid root', (c) => (c.flexibleRoot = false)],
    ['flexible root', (c) => (c.flexibleRoot = true)],
    ['torqued', (c) => (c.anchors.torqued = true)],
    ['supplementary', (c) => (c.anchors.supplementaryReinforcement = true)],
    ['uncracked', (c) => (c.concrete.cracked = false)],
    ['lightweight', (c) => (c.concrete.lambda = 0.85)],
    ['pier depth', (c) => (c.pier.depth = '18 in')],
    ['one rod a side', (c) => (c.anchors.perSide = 1)],
    ['three rods a side', (c) => (c.anchors.perSide = 3)],
    ['thin plate', (c) => (c.plate.thickness = '1/2 in')],
    ['small plate', (c) => ((c.plate.N = '12 in'), (c.plate.B = '8 in'))],
    ['F1554-105', (c) => (c.anchors.grade = 'F1554-105')],
    ['shallow rods', (c) => (c.anchors.embedment = '5 in')],
    ['small pier', (c) => ((c.pier.length = '20 in'), (c.pier.width = '16 in'))],
    ['footprint HSS', (c) => (c.footprint = { shape: 'HSS6X6X3/8' })],
    [
      'post, weld, rigid',
      (c) => (
        (c.post = { height: '18 in' }),
        (c.footprint = { shape: 'HSS8X8X1/2' }),
        (c.weld = { size: '1/4 in', electrode: 'E70' }),
        (c.flexibleRoot = false)
      ),
    ],
  ];
  for (const base of ['example', 'eastDeck', 'entryCanopy'] as const) {
    for (const [name, change] of variants) {
      const doc = withConnection(BASES[base], change);
      add(`${base}/connection ${name}`, doc);
      if (base === 'example') {
        const asd = clone(doc);
        asd.method = 'ASD';
        add(`${base}/connection ${name}/ASD`, asd);
      }
    }
  }
  // Version 2 keys: wind, seismic, lateral support.
  const v2: [string, (d: Doc) => void][] = [
    ['uplift wind', (d) => d.loads.area.push({ case: 'W', value: '-40 psf' })],
    ['down wind', (d) => d.loads.area.push({ case: 'W', value: '20 psf' })],
    ['strong uplift', (d) => d.loads.area.push({ case: 'W', value: '-150 psf' })],
    ['roof live', (d) => d.loads.area.push({ case: 'Lr', value: '20 psf' })],
    ['line live', (d) => d.loads.line.push({ case: 'L', value: '50 lbf/ft' })],
    ['mid point live', (d) => d.loads.point.push({ case: 'L', value: '300 lbf', at: '3 ft' })],
    ['seismic B', (d) => (d.loads.seismic = { SDS: 0.3, category: 'B' })],
    ['seismic D', (d) => (d.loads.seismic = { SDS: 1.0, category: 'D' })],
    [
      'seismic F wind',
      (d) => (
        (d.loads.seismic = { SDS: 1.5, category: 'F' }),
        d.loads.area.push({ case: 'W', value: '-30 psf' })
      ),
    ],
    [
      'top flange free',
      (d) => (delete d.member.unbracedLength, (d.member.lateralSupport = { topFlange: 'free' })),
    ],
    [
      'free, shear centre',
      (d) => (
        delete d.member.unbracedLength,
        (d.member.lateralSupport = { topFlange: 'free', loadAt: 'shear-centre' })
      ),
    ],
    [
      'free, twist-only root',
      (d) => (
        delete d.member.unbracedLength,
        (d.member.lateralSupport = { topFlange: 'free', root: 'twist-only' })
      ),
    ],
    [
      'free, tip braced',
      (d) => (
        delete d.member.unbracedLength,
        (d.member.lateralSupport = { topFlange: 'free', tip: 'braced' })
      ),
    ],
    [
      'braces',
      (d) => (delete d.member.unbracedLength, (d.member.lateralSupport = { braces: ['2 ft', '4.5 ft'] })),
    ],
    [
      'free, braces',
      (d) => (
        delete d.member.unbracedLength,
        (d.member.lateralSupport = { topFlange: 'free', braces: ['3 ft'] })
      ),
    ],
    [
      'K 1.7',
      (d) => (
        delete d.member.unbracedLength,
        (d.member.lateralSupport = { topFlange: 'free', effectiveLengthFactor: 1.7 })
      ),
    ],
    ['unbraced 4 ft', (d) => (delete d.member.lateralSupport, (d.member.unbracedLength = '4 ft'))],
    ['Fy 36', (d) => (d.member.steel = { Fy: '36 ksi' })],
    ['frequency 3 Hz', (d) => (d.frequencyMin = '3 Hz')],
    ['no frequency limit', (d) => delete d.frequencyMin],
    ['limits 180/120', (d) => (d.deflectionLimits = { live: 180, total: 120 })],
  ];
  for (const base of ['example', 'memberOnly', 'tapered', 'eastDeck', 'builtUp'] as const) {
    for (const [name, change] of v2) {
      const doc = clone(BASES[base]);
      change(doc);
      add(`${base}/${name}`, doc);
      if (base !== 'builtUp') {
        const asd = clone(doc);
        asd.method = 'ASD';
        add(`${base}/${name}/ASD`, asd);
      }
    }
  }
  const channelFree = withSection(MEMBER_ONLY, { shape: 'C10X20' });
  delete channelFree.member.unbracedLength;
  channelFree.member.lateralSupport = { topFlange: 'free' };
  add('channel/top flange free', channelFree);
  // Refused documents: the field issues are part of the record.
  add('refused/unknown shape', withSection(EXAMPLE, { shape: 'W99X1' }));
  add('refused/no load', {
    ...clone(MEMBER_ONLY),
    loads: { selfWeight: false, area: [], line: [], point: [] },
  });
  add(
    'refused/point beyond tip',
    (() => {
      const d = clone(EXAMPLE);
      d.loads.point.push({ case: 'L', value: '100 lbf', at: '20 ft' });
      return d;
    })(),
  );
  add('refused/steep taper', withLength(EAST_DECK, '1.5 ft'));
  return out;
}

const STUDIES: [string, Doc, StudySpec][] = [
  [
    'eastDeck length x tipDepth',
    EAST_DECK,
    {
      x: { key: 'length', from: 4, to: 16, steps: 9 },
      y: { key: 'tipDepth', from: 3, to: 12, steps: 9 },
    },
  ],
  [
    'example length x spacing',
    EXAMPLE,
    {
      x: { key: 'length', from: 5, to: 14, steps: 7 },
      y: { key: 'spacing', from: 2, to: 8, steps: 5 },
    },
  ],
  [
    'eastDeck taperRatio x length',
    EAST_DECK,
    {
      x: { key: 'taperRatio', from: 0.3, to: 1, steps: 6 },
      y: { key: 'length', from: 5, to: 13, steps: 5 },
    },
  ],
  [
    'example section x length',
    EXAMPLE,
    {
      x: {
        key: 'section',
        shapes: ['W8X10', 'W8X18', 'W10X26', 'HSS8X4X1/4', 'Pipe6STD', 'C10X20', 'W99X1'],
      },
      y: { key: 'length', from: 4, to: 14, steps: 6 },
    },
  ],
];

export function goldenEntries(): GoldenEntry[] {
  const entries: GoldenEntry[] = documents().map(([name, doc, stations]) => ({
    name,
    run: () => checkDocument(doc, stations ? { stations: true } : {}),
  }));
  for (const [name, doc, spec] of STUDIES) {
    entries.push({
      name: `study/${name}`,
      run: () => {
        const planned = planStudy(doc, spec);
        if (!planned.ok) return planned;
        const nx = planned.plan.xValues.length;
        const ny = planned.plan.yValues.length;
        return runCells(planned.plan, cellOrder(nx, ny), findShape);
      },
    });
  }
  const at12 = withLength(withSection(EAST_DECK, { shape: 'W12X26' }), '12 ft');
  entries.push({ name: 'lightest/eastDeck 12 ft', run: () => lightestSections(at12) });
  entries.push({
    name: 'lightest/eastDeck tapered W',
    run: () => lightestSections(EAST_DECK, { families: ['W'] }),
  });
  entries.push({
    name: 'lightest/canopy HSS, PIPE',
    run: () => lightestSections(ENTRY_CANOPY, { families: ['HSS', 'PIPE', 'C'] }),
  });
  return entries;
}

/** Entries whose full output is stored as well (readable diffs when a hash changes). */
export const FULL_RECORDS = [
  'example',
  'eastDeck/stations',
  'entryCanopy/ASD',
  'builtUp/free, braces',
  'si/stations',
];
