/**
 * npm start: builds the client (dist/) and bundles the server when either is not up to date with
 * its sources, then runs the bundled server (scripts/serve.ts: migrate, seed, serve) with plain
 * Node. One line per step, with the time it took. This process only waits for the server and
 * passes a stop signal on; Ctrl-C reaches both.
 */
import { spawn } from 'node:child_process';
import { join } from 'node:path';
import { clientBuildStep } from './lib/client-build';
import { serverBuildStep, serverOutDir } from './lib/server-build';
import { timed } from './lib/timing';

async function main(): Promise<void> {
  const root = process.cwd();
  const client = clientBuildStep(root, false);
  await timed('Client build', client.doing, client.run);
  const server = serverBuildStep(root);
  await timed('Server build', server.doing, server.run);

  const child = spawn(process.execPath, [join(serverOutDir(root), 'serve.js')], { stdio: 'inherit' });
  // The terminal sends Ctrl-C to the whole process group; the server shuts itself down.
  process.on('SIGINT', () => undefined);
  for (const signal of ['SIGTERM', 'SIGHUP'] as const) process.on(signal, () => child.kill(signal));
  child.on('exit', (code, signal) => process.exit(code ?? (signal ? 1 : 0)));
}

main().catch((err: unknown) => {
  console.error(err instanceof Error ? err.message : err);
  process.exit(1);
});
