/**
 * Shared pieces of the fuzz tests: design documents made wrong in random ways (a leaf replaced by
 * a hostile value, a key deleted, an unknown key added), and the invariants every answer must hold.
 * The number of runs is FUZZ_RUNS (times the weight each test gives it); `npm run fuzz` raises it.
 */
import fc from 'fast-check';
import { EAST_DECK_DESIGN, ENTRY_CANOPY_DESIGN } from '../../server/db/demo-designs';

/** A test's time limit, scaled with its runs (a loaded 2-core machine is slow). */
export function fuzzTimeout(baseMs = 60_000): number {
  const scale = Number(process.env.FUZZ_SCALE ?? '1');
  return baseMs * Math.max(1, Number.isFinite(scale) ? scale : 1);
}

export function fuzzRuns(base: number): number {
  const scale = Number(process.env.FUZZ_SCALE ?? '1');
  return Math.max(1, Math.round(base * (Number.isFinite(scale) && scale > 0 ? scale : 1)));
}

type Json = null | boolean | number | string | Json[] | { [k: string]: Json };
type Path = (string | number)[];

function leafPaths(value: Json, prefix: Path = []): Path[] {
  if (value === null || typeof value !== 'object') return [prefix];
  const entries: [string | number, Json][] = Array.isArray(value)
    ? Array.from(value, (v, i): [number, Json] => [i, v])
    : Object.entries(value);
  const out: Path[] = [prefix];
  for (const [k, v] of entries) out.push(...leafPaths(v, [...prefix, k]));
  return out;
}

const BASES: Json[] = [EAST_DECK_DESIGN as unknown as Json, ENTRY_CANOPY_DESIGN as unknown as Json];

const UNITS = [
  'in',
  'ft',
  'mm',
  'm',
  'psf',
  'kPa',
  'lbf',
  'kip',
  'kN',
  'ksi',
  'MPa',
  'psi',
  'Hz',
  'lbf/ft',
  'kg',
  's',
  'furlong',
  '',
];
const NUMBERS = fc.oneof(
  fc.double({ noNaN: false }),
  fc.integer(),
  fc.constantFrom(0, -0, 1e-300, 1e300, -1, 0.5, Number.MAX_SAFE_INTEGER),
);
const NUMBER_TEXT = fc.oneof(
  NUMBERS.map(String),
  fc.constantFrom(
    'NaN',
    'Infinity',
    '-Infinity',
    '1e400',
    '1/0',
    '0/0',
    '3/4',
    '1 1/2',
    '0x10',
    '',
    ' ',
    '2^1024',
  ),
);
/** Hostile values: quantity-like text with odd numbers and units, wrong types, deep structures. */
export const hostileValue: fc.Arbitrary<unknown> = fc.oneof(
  fc
    .tuple(NUMBER_TEXT, fc.constantFrom(...UNITS), fc.constantFrom(' ', '', '  '))
    .map(([n, u, s]) => `${n}${s}${u}`),
  fc.string({ maxLength: 40 }),
  fc.string({ unit: 'binary', maxLength: 20 }),
  NUMBERS,
  fc.boolean(),
  fc.constant(null),
  fc.constantFrom(
    'W12X26',
    'HSS8X8X1/2',
    'W99X999',
    'D',
    'L',
    'W',
    'Lr',
    'S',
    'LRFD',
    'ASD',
    'SI',
    'US',
    'post-base',
    'face-plate',
  ),
  fc.constantFrom(
    {},
    [],
    [[]],
    { value: '1 ft' },
    { case: 'D', value: '-5 psf' },
    { __proto__: { polluted: true } },
  ),
  fc.jsonValue({ maxDepth: 3 }),
);

/** Own properties only, even for "__proto__", so a hostile key reaches the server as JSON text. */
function own(container: object, key: string | number): Json {
  return Object.hasOwn(container, key) ? ((container as Record<string | number, Json>)[key] ?? null) : null;
}

function put(target: object, key: string | number, value: unknown): void {
  Object.defineProperty(target, key, { value, enumerable: true, writable: true, configurable: true });
}

function shallowCopy(value: object): Json[] | Record<string, Json> {
  if (Array.isArray(value)) return Array.from(value as Json[]);
  const copy: Record<string, Json> = {};
  for (const [k, v] of Object.entries(value)) put(copy, k, v);
  return copy;
}

function setAt(root: Json, path: Path, value: unknown): Json {
  if (path.length === 0) return value as Json;
  const [head, ...rest] = path;
  const container = root !== null && typeof root === 'object' ? root : {};
  const copy = shallowCopy(container);
  put(copy, head!, setAt(own(container, head!), rest, value));
  return copy;
}

function deleteAt(root: Json, path: Path): Json {
  if (path.length === 0 || root === null || typeof root !== 'object') return root;
  const [head, ...rest] = path;
  const copy = shallowCopy(root);
  if (rest.length === 0) {
    if (Array.isArray(copy)) return copy.filter((_, i) => i !== head);
    delete copy[head as string];
    return copy;
  }
  put(copy, head!, deleteAt(own(root, head!), rest));
  return copy;
}

type Edit =
  | { kind: 'set'; pick: number; value: unknown }
  | { kind: 'delete'; pick: number }
  | { kind: 'add'; pick: number; key: string; value: unknown };

const edit: fc.Arbitrary<Edit> = fc.oneof(
  {
    weight: 6,
    arbitrary: fc.record({ kind: fc.constant('set' as const), pick: fc.nat(), value: hostileValue }),
  },
  { weight: 2, arbitrary: fc.record({ kind: fc.constant('delete' as const), pick: fc.nat() }) },
  {
    weight: 1,
    arbitrary: fc.record({
      kind: fc.constant('add' as const),
      pick: fc.nat(),
      key: fc.oneof(
        fc.string({ maxLength: 12 }),
        fc.constantFrom('__proto__', 'constructor', 'seismic', 'lateralSupport'),
      ),
      value: hostileValue,
    }),
  },
);

/** A demo design with one to three hostile edits: mostly invalid, sometimes valid in odd ways. */
const hostileDesign: fc.Arbitrary<unknown> = fc
  .tuple(fc.nat({ max: BASES.length - 1 }), fc.array(edit, { minLength: 1, maxLength: 3 }))
  .map(([which, edits]) => {
    let doc: Json = structuredClone(BASES[which]!);
    for (const e of edits) {
      const paths = leafPaths(doc);
      const path = paths[e.pick % paths.length]!;
      if (e.kind === 'set') doc = setAt(doc, path, e.value);
      else if (e.kind === 'delete') doc = deleteAt(doc, path);
      else doc = setAt(doc, [...path, e.key], e.value);
    }
    return doc;
  });

interface CheckLike {
  id?: unknown;
  ok?: unknown;
  ratio?: unknown;
  demand?: { value?: unknown } | null;
  capacity?: { value?: unknown } | null;
}

/** Problems with an engine result: a pass that was not computed, a non-finite figure, NaN in words. */
export function resultProblems(result: unknown): string[] {
  const problems: string[] = [];
  const r = result as { ok?: unknown; checks?: CheckLike[] };
  if (typeof r?.ok !== 'boolean') problems.push('ok is not a boolean');
  if (!Array.isArray(r?.checks) || r.checks.length === 0) return [...problems, 'no checks'];
  for (const c of r.checks) {
    if (typeof c.id !== 'string') problems.push('a check without an id');
    if (c.ok === true) {
      if (typeof c.ratio !== 'number' || !Number.isFinite(c.ratio))
        problems.push(`${String(c.id)}: passes without a finite ratio`);
      for (const q of [c.demand, c.capacity])
        if (q && typeof q.value !== 'number') problems.push(`${String(c.id)}: passes with a missing figure`);
    }
  }
  if (r.ok === true && r.checks.some((c) => c.ok !== true))
    problems.push('ok is true while a check does not pass');
  const text = JSON.stringify(result);
  if (/\bNaN\b|\bInfinity\b/.test(text)) problems.push('NaN or Infinity in the result text');
  return problems;
}

/** Problems with a 400 answer: it must name at least one field, in words. */
export function errorProblems(body: unknown): string[] {
  const e = (body as { error?: { code?: unknown; message?: unknown; issues?: unknown } })?.error;
  if (!e || typeof e.message !== 'string' || e.message.length === 0) return ['no error message'];
  if (!Array.isArray(e.issues) || e.issues.length === 0) return [`no field named: ${e.message}`];
  const bad = (e.issues as { path?: unknown; message?: unknown }[]).filter(
    (i) => typeof i.path !== 'string' || typeof i.message !== 'string' || i.message.length === 0,
  );
  return bad.length > 0 ? [`issues without path or message: ${JSON.stringify(bad)}`] : [];
}

const QUANTITY = /^(\d+(?:\.\d+)?(?:e[-+]?\d+)?)\s+(\S.*)$/;

/**
 * A demo design with one to four of its quantities scaled (by 1e-6 to 1e3, or set to zero): mostly
 * valid documents far from the demo, which reach the engine's odd corners (tiny plates, huge
 * loads, rods off the pier).
 */
const scaledDesign: fc.Arbitrary<unknown> = fc
  .tuple(
    fc.nat({ max: BASES.length - 1 }),
    fc.array(
      fc.tuple(
        fc.nat(),
        fc.oneof(fc.double({ min: 0.01, max: 100, noNaN: true }), fc.constantFrom(0, 1e-6, 1e3)),
      ),
      { minLength: 1, maxLength: 4 },
    ),
  )
  .map(([which, edits]) => {
    let doc: Json = structuredClone(BASES[which]!);
    const paths = leafPaths(doc).filter((p) => {
      let v: Json = doc;
      for (const k of p) v = (v as Record<string | number, Json>)[k]!;
      return typeof v === 'string' && QUANTITY.test(v);
    });
    for (const [pick, factor] of edits) {
      const path = paths[pick % paths.length]!;
      let v: Json = doc;
      for (const k of path) v = (v as Record<string | number, Json>)[k]!;
      const match = typeof v === 'string' ? QUANTITY.exec(v) : null;
      if (!match) continue;
      const [, n, unit] = match;
      doc = setAt(doc, path, `${Number((Number(n) * factor).toPrecision(4))} ${unit}`);
    }
    return doc;
  });

/** Documents made wrong, or merely unusual, in random ways. */
export const mutatedDesign: fc.Arbitrary<unknown> = fc.oneof(hostileDesign, scaledDesign);
