/**
 * npm run build: builds the client into dist/ and stamps it (scripts/lib/client-build.ts).
 * `--if-stale` skips the build when dist/ is up to date with the sources, as `npm start` does.
 * `--server` bundles the server instead, as `npm start` runs it (scripts/lib/server-build.ts; only
 * when stale): `npm test` runs it as one of its side-by-side steps.
 */
import { clientBuildStep } from './lib/client-build';
import { serverBuildStep } from './lib/server-build';
import { timed } from './lib/timing';

const server = process.argv.includes('--server');
const step = server
  ? serverBuildStep(process.cwd())
  : clientBuildStep(process.cwd(), !process.argv.includes('--if-stale'));
timed(server ? 'Server build' : 'Client build', step.doing, step.run).catch((err: unknown) => {
  console.error(err instanceof Error ? err.message : err);
  process.exit(1);
});
