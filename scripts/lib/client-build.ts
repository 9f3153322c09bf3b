/**
 * The client build (dist/, served by the server) and whether it is up to date (scripts/lib/stamp.ts).
 * Inputs: src/, shared/ (the client bundles the engine), public/, data/shapes.json, index.html, the
 * vite, tailwind and TypeScript configs, package.json and package-lock.json (a dependency change
 * rebuilds). Tailwind also scans other folders for class names, but a class the client uses is
 * written in src/, so only unused CSS could differ.
 */
import { spawnSync } from 'node:child_process';
import { join } from 'node:path';
import { inputsHash, staleReason, writeStamp } from './stamp';

export const CLIENT_INPUTS = [
  'src',
  'shared',
  'public',
  'data/shapes.json',
  'index.html',
  'vite.config.ts',
  'tailwind.config.ts',
  'tsconfig.json',
  'package.json',
  'package-lock.json',
];

/** The client build step: what it is about to do, and the work (returns what it did). */
export function clientBuildStep(root: string, force: boolean): { doing: string; run: () => string } {
  const distDir = join(root, 'dist');
  const hash = inputsHash(root, CLIENT_INPUTS);
  const reason = force ? 'asked to rebuild' : staleReason(distDir, hash);
  if (!reason) return { doing: 'checking dist/', run: () => 'up to date with the sources, not rebuilt' };
  return {
    doing: `${reason}: building dist/`,
    run: () => {
      const vite = join(root, 'node_modules', 'vite', 'bin', 'vite.js');
      const r = spawnSync(process.execPath, [vite, 'build', '--logLevel', 'warn'], {
        cwd: root,
        stdio: 'inherit',
      });
      if (r.status !== 0) throw new Error(`vite build failed (exit ${r.status ?? r.signal})`);
      writeStamp(distDir, hash);
      return 'done';
    },
  };
}
