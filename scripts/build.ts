/**
 * npm run build: builds the client into dist/ and stamps it (scripts/lib/client-build.ts).
 * `--if-stale` skips the build when dist/ is up to date with the sources, as `npm start` does.
 */
import { clientBuildStep } from './lib/client-build';
import { timed } from './lib/timing';

const step = clientBuildStep(process.cwd(), !process.argv.includes('--if-stale'));
timed('Client build', step.doing, step.run).catch((err: unknown) => {
  console.error(err instanceof Error ? err.message : err);
  process.exit(1);
});
