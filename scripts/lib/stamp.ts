/**
 * "Is this build up to date?" for the builds `npm start` skips when nothing changed. A build's
 * folder holds .build-stamp.json: the SHA-256 of every input file (path and content) as it was when
 * the build started, and the list of files the build wrote. The build is up to date when the
 * inputs hash the same and every written file is still there. Contents are hashed, not
 * modification times, so a checkout, a copy or `touch` never fools it.
 */
import { createHash } from 'node:crypto';
import { existsSync, readdirSync, readFileSync, statSync, writeFileSync } from 'node:fs';
import { join, relative } from 'node:path';

export const STAMP_FILE = '.build-stamp.json';
// Bump when what a stamp means changes, so older stamps stop matching.
const STAMP_VERSION = 1;

interface Stamp {
  version: number;
  inputs: string;
  outputs: string[];
}

/** Files under `path` (a file or a folder, relative to root), relative to root, sorted. */
export function filesUnder(root: string, path: string): string[] {
  const full = join(root, path);
  if (!existsSync(full)) return [];
  if (!statSync(full).isDirectory()) return [path];
  return readdirSync(full, { recursive: true, withFileTypes: true })
    .filter((e) => e.isFile())
    .map((e) => relative(root, join(e.parentPath, e.name)))
    .sort();
}

/** SHA-256 over the path and content of every input file, in a stable order. */
export function inputsHash(root: string, inputs: readonly string[]): string {
  const hash = createHash('sha256');
  for (const input of inputs)
    for (const file of filesUnder(root, input)) {
      hash.update(`${file}\0`);
      hash.update(readFileSync(join(root, file)));
      hash.update('\0');
    }
  return hash.digest('hex');
}

/** Why the build in outDir must be redone, or null when it matches the inputs' hash. */
export function staleReason(outDir: string, hash: string): string | null {
  let stamp: Stamp;
  try {
    stamp = JSON.parse(readFileSync(join(outDir, STAMP_FILE), 'utf8')) as Stamp;
  } catch {
    return 'not built yet';
  }
  if (stamp.version !== STAMP_VERSION) return 'built by an older start script';
  if (stamp.inputs !== hash) return 'the sources changed since the last build';
  const missing = stamp.outputs.find((f) => !existsSync(join(outDir, f)));
  return missing ? `${missing} is missing from the last build` : null;
}

/** Records a finished build: the hash taken before it started, and every file now in outDir. */
export function writeStamp(outDir: string, hash: string): void {
  const outputs = filesUnder(outDir, '.').filter((f) => f !== STAMP_FILE);
  const stamp: Stamp = { version: STAMP_VERSION, inputs: hash, outputs };
  writeFileSync(join(outDir, STAMP_FILE), JSON.stringify(stamp, null, 2) + '\n');
}
