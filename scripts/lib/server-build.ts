/**
 * The server as `npm start` runs it: scripts/serve.ts and everything it imports bundled into
 * node_modules/.cache/reachline/server/ by Vite's SSR build, then run by plain Node. Run from
 * source through tsx, the start-up spent most of its time loading mathjs's ~1,000 modules through
 * the loader hooks (about 7 s of CPU); bundled, mathjs is tree-shaken to what the engine uses and
 * the other dependencies load natively. The engine pool's worker is a second entry. Dependencies other than mathjs stay external (imported from
 * node_modules at run time). Rebuilt only when its inputs change (scripts/lib/stamp.ts).
 */
import { join } from 'node:path';
import { inputsHash, staleReason, writeStamp } from './stamp';

export const SERVER_INPUTS = [
  'server',
  'shared',
  'migrations',
  'data/shapes.json',
  'scripts/serve.ts',
  'scripts/lib/database.ts',
  'scripts/lib/timing.ts',
  'scripts/lib/server-build.ts',
  'tsconfig.json',
  'package.json',
  'package-lock.json',
];
export const SERVER_ENTRY = 'scripts/serve.ts';
/** The engine pool's worker (server/engine/engine-pool.ts looks for engine-worker.js beside the bundle). */
export const ENGINE_WORKER_ENTRY = 'server/engine/engine-worker.ts';

export function serverOutDir(root: string): string {
  return join(root, 'node_modules', '.cache', 'reachline', 'server');
}

/**
 * The bundled entry when the bundle is up to date with its sources, else undefined. The stamp is
 * written only once a build has finished, so a bundle being rebuilt counts as stale.
 */
export function freshServerBundle(root: string): string | undefined {
  const outDir = serverOutDir(root);
  return staleReason(outDir, inputsHash(root, SERVER_INPUTS)) ? undefined : join(outDir, 'serve.js');
}

/** The server build step: what it is about to do, and the work (returns what it did). */
export function serverBuildStep(
  root: string,
  outDir = serverOutDir(root),
): { doing: string; run: () => Promise<string> } {
  const hash = inputsHash(root, SERVER_INPUTS);
  const reason = staleReason(outDir, hash);
  if (!reason) return { doing: 'checking the server bundle', run: async () => 'up to date, not rebuilt' };
  return {
    doing: `${reason}: bundling the server`,
    run: async () => {
      const { build } = await import('vite');
      // Vite's build sets NODE_ENV=production in this process when it is unset, and whatever this
      // process starts next would inherit it: npm start's server would skip the demo seed.
      const nodeEnv = process.env.NODE_ENV;
      try {
        await bundle(build, root, outDir);
      } finally {
        if (nodeEnv === undefined) delete process.env.NODE_ENV;
        else process.env.NODE_ENV = nodeEnv;
      }
      writeStamp(outDir, hash);
      return 'done';
    },
  };
}

async function bundle(build: typeof import('vite').build, root: string, outDir: string): Promise<void> {
  await build({
    configFile: false,
    root,
    logLevel: 'warn',
    publicDir: false,
    build: {
      ssr: true,
      outDir,
      emptyOutDir: true,
      target: 'node20',
      minify: false,
      rollupOptions: {
        input: { serve: SERVER_ENTRY, 'engine-worker': ENGINE_WORKER_ENTRY },
        // Every file in one folder, so a chunk's import.meta.url finds engine-worker.js beside it.
        output: { entryFileNames: '[name].js', chunkFileNames: '[name]-[hash].js' },
      },
    },
    ssr: { target: 'node', noExternal: ['mathjs'] },
  });
}
