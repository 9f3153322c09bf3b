/**
 * Units at the edges of the engine.
 *
 * Every quantity in a design document is a string that mathjs parses ("10 ft", "1/2 in", "60 psf").
 * Inside the engine one consistent system is used: kip, in, ksi, kip·in, kip/in, seconds.
 * This module turns strings into internal numbers and internal numbers into result quantities.
 *
 * The mathjs instance is built from only the factories it needs, so the browser bundle stays small.
 */
import {
  create,
  createUnitDependencies,
  evaluateDependencies,
  unitDependencies,
  divideDependencies,
  multiplyDependencies,
  addDependencies,
  subtractDependencies,
  unaryMinusDependencies,
  type Unit,
} from 'mathjs';

const math = create({
  createUnitDependencies,
  evaluateDependencies,
  unitDependencies,
  divideDependencies,
  multiplyDependencies,
  addDependencies,
  subtractDependencies,
  unaryMinusDependencies,
});

// The trade's units that mathjs does not know (mathjs knows kip, lbf, psi, kPa, ft, in).
math.createUnit(
  {
    ksi: { definition: '1000 psi' },
    psf: { definition: '1 lbf/ft^2' },
    plf: { definition: '1 lbf/ft' },
    klf: { definition: '1 kip/ft' },
    pcf: { definition: '1 lbf/ft^3' },
  },
  { override: false },
);

/** The physical dimensions the engine accepts, each with its internal unit. */
export const DIMENSIONS = {
  length: 'in',
  force: 'kip',
  stress: 'ksi',
  areaLoad: 'ksi', // kip/in^2, a pressure
  lineLoad: 'kip/in',
  moment: 'kip in',
  frequency: 'Hz',
  density: 'kip/in^3',
} as const;

export type Dimension = keyof typeof DIMENSIONS;

/** Display names of the dimensions, for error messages. */
const DIMENSION_WORDS: Record<Dimension, string> = {
  length: 'a length',
  force: 'a force',
  stress: 'a stress',
  areaLoad: 'an area load (pressure)',
  lineLoad: 'a line load (force per length)',
  moment: 'a moment',
  frequency: 'a frequency',
  density: 'a density',
};

export function dimensionWord(dimension: Dimension): string {
  return DIMENSION_WORDS[dimension];
}

export type ParseResult = { ok: true; value: number; unit: Unit } | { ok: false; message: string };

// One map per dimension, keyed by the text itself: a "dimension|text" key would be a new string to
// build and hash on every call, and this runs for every quantity of every design (the reach study).
const cache = new Map<Dimension, Map<string, ParseResult>>();
let cached = 0;

/**
 * Parses a quantity string and converts it to the internal unit of `dimension`.
 * A plain number, a unit of the wrong dimension or a non-finite value is refused.
 */
export function parseQuantity(text: string, dimension: Dimension): ParseResult {
  let byText = cache.get(dimension);
  const hit = byText?.get(text);
  if (hit) return hit;
  const result = parseUncached(text, dimension);
  if (cached > 5000) {
    cache.clear();
    cached = 0;
    byText = undefined;
  }
  if (!byText) {
    byText = new Map();
    cache.set(dimension, byText);
  }
  byText.set(text, result);
  cached += 1;
  return result;
}

function parseUncached(text: string, dimension: Dimension): ParseResult {
  const target = DIMENSIONS[dimension];
  let parsed: unknown;
  try {
    parsed = math.evaluate(mixedNumbers(text.trim()));
  } catch {
    return {
      ok: false,
      message: `could not read ${quoted(text)} as ${DIMENSION_WORDS[dimension]} with a unit`,
    };
  }
  if (!math.isUnit(parsed)) {
    return { ok: false, message: `needs a unit, got ${quoted(text)} (for example ${example(dimension)})` };
  }
  const unit = parsed;
  if (!unit.equalBase(math.unit(`1 ${target}`))) {
    return { ok: false, message: `must be ${DIMENSION_WORDS[dimension]}, got ${quoted(text)}` };
  }
  // mathjs converts through SI base units, so "12 in" can come back as 11.999999999999998 in and a
  // rod exactly at a required edge distance would fail by 1e-16. Fourteen significant digits keep
  // every real input and make exact inputs (and exact SI conversions of them) exact again.
  const raw = unit.toNumber(target);
  const value = Number.isFinite(raw) ? Number(raw.toPrecision(14)) : raw;
  if (!Number.isFinite(value)) {
    return { ok: false, message: `must be a finite value, got ${quoted(text)}` };
  }
  return { ok: true, value, unit };
}

/**
 * The text someone typed, quoted for a message: escaped (a newline or a quote cannot break the
 * one-line-per-problem form) and cut to 40 characters.
 */
export function quoted(text: string): string {
  return JSON.stringify(text.length > 40 ? `${text.slice(0, 40)}…` : text);
}

/**
 * The trade writes mixed numbers as "1-1/2 in" or "1 1/2 in"; read them as 1.5 in, never as 1 - 1/2.
 */
function mixedNumbers(text: string): string {
  return text.replace(/(\d+)(?:-|\s+)(\d+)\/(\d+)/g, '($1+$2/$3)');
}

function example(dimension: Dimension): string {
  const examples: Record<Dimension, string> = {
    length: '"10 ft"',
    force: '"300 lbf"',
    stress: '"50 ksi"',
    areaLoad: '"60 psf"',
    lineLoad: '"40 lbf/ft"',
    moment: '"10 kip ft"',
    frequency: '"8 Hz"',
    density: '"490 pcf"',
  };
  return examples[dimension];
}

/** Converts a validated quantity string to the internal unit; throws if it does not parse. */
export function toInternal(text: string, dimension: Dimension): number {
  const r = parseQuantity(text, dimension);
  if (!r.ok) throw new Error(r.message);
  return r.value;
}

/** Converts a number between two units that mathjs knows, e.g. convert(1, 'ft', 'in') = 12. */
export function convert(value: number, from: string, to: string): number {
  return math.unit(value, from).toNumber(to);
}

export type UnitSystem = 'US' | 'SI';

/** A quantity in a result document: a number and a unit string that mathjs parses. */
export interface Quantity {
  value: number;
  unit: string;
}

/** The display unit of each kind of result quantity, per unit system. */
export const RESULT_UNITS = {
  US: {
    length: 'ft',
    smallLength: 'in',
    force: 'kip',
    moment: 'kip ft',
    stress: 'ksi',
    pressure: 'psf',
    lineLoad: 'lbf/ft',
    forcePerLength: 'kip/in',
    frequency: 'Hz',
    area: 'in^2',
    inertia: 'in^4',
    modulus: 'in^3',
    weight: 'lbf',
  },
  SI: {
    length: 'm',
    smallLength: 'mm',
    force: 'kN',
    moment: 'kN m',
    stress: 'MPa',
    pressure: 'kPa',
    lineLoad: 'kN/m',
    forcePerLength: 'kN/mm',
    frequency: 'Hz',
    area: 'mm^2',
    inertia: 'mm^4',
    modulus: 'mm^3',
    weight: 'kN',
  },
} as const;

export type ResultKind = keyof (typeof RESULT_UNITS)['US'];

/** The internal unit behind each kind of result quantity. */
const INTERNAL_OF_KIND: Record<ResultKind, string> = {
  length: 'in',
  smallLength: 'in',
  force: 'kip',
  moment: 'kip in',
  stress: 'ksi',
  pressure: 'ksi',
  lineLoad: 'kip/in',
  forcePerLength: 'kip/in',
  frequency: 'Hz',
  area: 'in^2',
  inertia: 'in^4',
  modulus: 'in^3',
  weight: 'kip',
};

const factorCache: Record<UnitSystem, Partial<Record<ResultKind, number>>> = { US: {}, SI: {} };

/** The factor that turns an internal value of `kind` into the display unit of `system`. */
export function displayFactor(kind: ResultKind, system: UnitSystem): number {
  const cached = factorCache[system][kind];
  if (cached !== undefined) return cached;
  const f = math.unit(1, INTERNAL_OF_KIND[kind]).toNumber(RESULT_UNITS[system][kind]);
  factorCache[system][kind] = f;
  return f;
}

/** Turns an internal value into a result quantity in the chosen unit system. */
export function quantity(internalValue: number, kind: ResultKind, system: UnitSystem): Quantity {
  return { value: internalValue * displayFactor(kind, system), unit: RESULT_UNITS[system][kind] };
}

/** Formats a number and unit the way the reports and the desk show it. */
export function formatQuantity(q: Quantity, digits = 3): string {
  const abs = Math.abs(q.value);
  const text =
    abs !== 0 && (abs >= 1e6 || abs < 1e-3) ? q.value.toExponential(2) : q.value.toPrecision(digits);
  return `${Number(text)} ${q.unit.replace(/ /g, '·')}`;
}
