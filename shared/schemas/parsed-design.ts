/**
 * The parsed design document: what the engine takes. The stored and wire form stays the design
 * document of design.ts (quantities as the person typed them, "10 ft", "203.2 mm"); this is the same
 * tree with every quantity read once into the engine's internal unit of its dimension (in, kip, ksi,
 * kip/in, Hz; units.ts) and the text kept beside it, because the engine's messages quote what was
 * typed ('got "3 in"'). Key names are those of the document (ENGINE-CONTRACT.md), so a message
 * names the same field path.
 *
 *   parsedDesignSchema.safeParse(json)  validates and parses a document as written, in one call
 *   designWithParsedSchema.safeParse    the same, keeping the validated text document beside it
 *   parseDesign(input)                  parses a document designSchema already validated (a stored revision)
 */
import { toInternal, type Dimension } from '../engine/units';
import { connectionSchema, type ConnectionInput } from './connection';
import { designSchema, type DesignInput } from './design';
import type { LoadsInput, MemberInput } from './member';

/** A quantity as the engine reads it: `value` in the internal unit of its dimension, `text` as written. */
export interface ParsedQuantity {
  value: number;
  text: string;
}

/** T with the keys K (string quantities) read as ParsedQuantity; optional keys stay optional. */
type Parsed<T, K extends keyof T> = {
  [P in keyof T]: P extends K ? (undefined extends T[P] ? ParsedQuantity | undefined : ParsedQuantity) : T[P];
};

type SectionInput = MemberInput['section'];
type PlatesInput = NonNullable<SectionInput['plates']>;
type LateralInput = NonNullable<MemberInput['lateralSupport']>;

export type ParsedPlates = Parsed<PlatesInput, keyof PlatesInput>;
export type ParsedSection = Omit<Parsed<SectionInput, 'tipDepth'>, 'plates'> & { plates?: ParsedPlates };
export type ParsedLateralSupport = Omit<LateralInput, 'braces'> & { braces?: ParsedQuantity[] };
export type ParsedMember = Omit<
  Parsed<MemberInput, 'length' | 'spacing' | 'unbracedLength'>,
  'section' | 'steel' | 'lateralSupport'
> & {
  section: ParsedSection;
  steel?: { Fy?: ParsedQuantity; E?: ParsedQuantity };
  lateralSupport?: ParsedLateralSupport;
};

export type ParsedAreaLoad = Parsed<LoadsInput['area'][number], 'value'>;
export type ParsedLineLoad = Parsed<LoadsInput['line'][number], 'value'>;
export type ParsedPointLoad = Parsed<LoadsInput['point'][number], 'value' | 'at'>;
export type ParsedLoads = Omit<LoadsInput, 'area' | 'line' | 'point'> & {
  area: ParsedAreaLoad[];
  line: ParsedLineLoad[];
  point: ParsedPointLoad[];
};

type C = ConnectionInput;
export type ParsedConnection = Omit<C, 'plate' | 'anchors' | 'concrete' | 'pier' | 'post' | 'weld'> & {
  plate: Parsed<C['plate'], 'N' | 'B' | 'thickness' | 'Fy'>;
  anchors: Parsed<C['anchors'], 'diameter' | 'offset' | 'gauge' | 'embedment'>;
  concrete: Parsed<C['concrete'], 'fc'>;
  pier: Parsed<C['pier'], 'length' | 'width' | 'depth'>;
  post?: Parsed<NonNullable<C['post']>, 'height'>;
  weld?: Parsed<NonNullable<C['weld']>, 'size'>;
};

/** Reads a validated quantity string (the schema has refused any that does not parse). */
export function parsedQuantity(text: string, dimension: Dimension): ParsedQuantity {
  return { value: toInternal(text, dimension), text };
}

const len = (text: string) => parsedQuantity(text, 'length');
const lenOpt = (text: string | undefined) => (text === undefined ? undefined : len(text));

function parseSection(s: SectionInput): ParsedSection {
  const { tipDepth, plates, ...rest } = s;
  const out: ParsedSection = { ...rest };
  if (tipDepth !== undefined) out.tipDepth = len(tipDepth);
  if (plates)
    out.plates = {
      rootDepth: len(plates.rootDepth),
      tipDepth: len(plates.tipDepth),
      flangeWidth: len(plates.flangeWidth),
      flangeThickness: len(plates.flangeThickness),
      webThickness: len(plates.webThickness),
    };
  return out;
}

function parseMember(m: MemberInput): ParsedMember {
  const { length, spacing, section, steel, unbracedLength, lateralSupport, ...rest } = m;
  const out: ParsedMember = {
    ...rest,
    length: len(length),
    spacing: len(spacing),
    section: parseSection(section),
  };
  if (steel) {
    out.steel = {};
    if (steel.Fy !== undefined) out.steel.Fy = parsedQuantity(steel.Fy, 'stress');
    if (steel.E !== undefined) out.steel.E = parsedQuantity(steel.E, 'stress');
  }
  if (unbracedLength !== undefined) out.unbracedLength = len(unbracedLength);
  if (lateralSupport) {
    const { braces, ...ls } = lateralSupport;
    out.lateralSupport = braces === undefined ? ls : { ...ls, braces: braces.map(len) };
  }
  return out;
}

function parseLoads(l: LoadsInput): ParsedLoads {
  return {
    ...l,
    area: l.area.map((a) => ({ ...a, value: parsedQuantity(a.value, 'areaLoad') })),
    line: l.line.map((a) => ({ ...a, value: parsedQuantity(a.value, 'lineLoad') })),
    point: l.point.map((p) => ({ ...p, value: parsedQuantity(p.value, 'force'), at: len(p.at) })),
  };
}

/** Parses a connection designSchema (or connectionSchema) has validated. */
export function parseConnection(c: ConnectionInput): ParsedConnection {
  const { plate, anchors, concrete, pier, post, weld, ...rest } = c;
  const out: ParsedConnection = {
    ...rest,
    plate: {
      ...plate,
      N: len(plate.N),
      B: len(plate.B),
      thickness: len(plate.thickness),
      Fy: parsedQuantity(plate.Fy, 'stress'),
    },
    anchors: {
      ...anchors,
      diameter: len(anchors.diameter),
      offset: len(anchors.offset),
      gauge: len(anchors.gauge),
      embedment: len(anchors.embedment),
    },
    concrete: { ...concrete, fc: parsedQuantity(concrete.fc, 'stress') },
    pier: { ...pier, length: len(pier.length), width: len(pier.width), depth: lenOpt(pier.depth) },
  };
  if (post) out.post = { ...post, height: len(post.height) };
  if (weld) out.weld = { ...weld, size: len(weld.size) };
  return out;
}

/** Parses a document designSchema has validated (defaults filled in): every quantity read once. */
export function parseDesign(input: DesignInput): ParsedDesign {
  const { member, loads, frequencyMin, connection, ...rest } = input;
  const out: ParsedDesign = { ...rest, member: parseMember(member), loads: parseLoads(loads) };
  if (frequencyMin !== undefined) out.frequencyMin = parsedQuantity(frequencyMin, 'frequency');
  if (connection) out.connection = parseConnection(connection);
  return out;
}

/** The parsed document the engine takes (ENGINE-CONTRACT key names, quantities read). */
export type ParsedDesign = Omit<DesignInput, 'member' | 'loads' | 'frequencyMin' | 'connection'> & {
  member: ParsedMember;
  loads: ParsedLoads;
  frequencyMin?: ParsedQuantity;
  connection?: ParsedConnection;
};

/** Validates a design document as written and parses it: the engine's input in one call. */
export const parsedDesignSchema = designSchema.transform(parseDesign);
/**
 * Validates a document as written and gives both forms: the validated text (what is stored or
 * loaded into the desk) and the parsed document (what the engine takes).
 */
export const designWithParsedSchema = designSchema.transform((document) => ({
  document,
  parsed: parseDesign(document),
}));
/** Validates a connection as written and parses it (the plate sketch's input). */
export const parsedConnectionSchema = connectionSchema.transform(parseConnection);
