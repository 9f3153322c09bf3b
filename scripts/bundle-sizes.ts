/**
 * Gzip size of the JavaScript each client route loads (after `npx vite build`): the entry chunk and
 * its static imports, plus the route's lazy chunk and its static imports; workers listed apart.
 * Usage: node --import tsx scripts/bundle-sizes.ts [--json]
 */
import { readFileSync, readdirSync } from 'node:fs';
import { join } from 'node:path';
import { gzipSync } from 'node:zlib';

const dir = join(process.cwd(), 'dist', 'assets');
const files = readdirSync(dir).filter((f) => f.endsWith('.js'));
const gz = new Map(files.map((f) => [f, gzipSync(readFileSync(join(dir, f))).length]));

function staticImports(file: string): string[] {
  const code = readFileSync(join(dir, file), 'utf8');
  const out = new Set<string>();
  for (const m of code.matchAll(/(?:import|export)\s*(?:[\w${}\s,*]*?from\s*)?["']\.\/([^"']+\.js)["']/g))
    out.add(m[1]);
  return [...out];
}

function closure(start: string, seen = new Set<string>()): Set<string> {
  if (seen.has(start) || !gz.has(start)) return seen;
  seen.add(start);
  for (const dep of staticImports(start)) closure(dep, seen);
  return seen;
}

const html = readFileSync(join(process.cwd(), 'dist', 'index.html'), 'utf8');
const entry = /assets\/(index-[\w-]+\.js)/.exec(html)?.[1];
if (!entry) throw new Error('no entry chunk in dist/index.html: run `npx vite build` first');
const base = closure(entry);
const routes = [
  'sign-in',
  'projects',
  'project',
  'design-desk',
  'shapes',
  'history',
  'compare',
  'review',
  'team',
  'outbox',
];
const kb = (n: number) => Math.round(n / 102.4) / 10;
const report: Record<string, number> = {};
for (const route of routes) {
  const chunk = files.find((f) => new RegExp(`^${route}-[\\w-]{8}\\.js$`).test(f));
  if (!chunk) continue;
  const all = closure(chunk, new Set(base));
  report[route] = kb([...all].reduce((sum, f) => sum + (gz.get(f) ?? 0), 0));
}
const workers = files.filter((f) => /worker/i.test(f));
for (const w of workers) report[`worker:${w.replace(/-[\w-]{8}\.js$/, '')}`] = kb(gz.get(w) ?? 0);

if (process.argv.includes('--json')) console.log(JSON.stringify(report));
else
  for (const [name, size] of Object.entries(report))
    console.log(`${name.padEnd(28)} ${size.toFixed(1).padStart(7)} KB gzip`);
