/**
 * npm run dev: the API under `tsx watch` (restarts on server changes) and the Vite dev server
 * (hot reload for the client; vite.config.ts proxies /api to the API on port 3000) side by side.
 * Ctrl-C stops both.
 */
import { spawn, type ChildProcess } from 'node:child_process';

const apiPort = process.env.PORT ?? '3000';
if (apiPort !== '3000') {
  console.warn(
    `PORT=${apiPort}: the Vite proxy in vite.config.ts expects the API on 3000; /api calls from the dev page will miss it.`,
  );
}

const children: ChildProcess[] = [];

function run(label: string, command: string, args: string[], env: NodeJS.ProcessEnv = process.env): void {
  // Own process group, so stopping kills npx's grandchildren (vite, the tsx watcher) too.
  const child = spawn(command, args, { stdio: 'inherit', env, detached: true });
  children.push(child);
  child.on('exit', (code, signal) => {
    console.log(`[dev] ${label} stopped (${signal ?? `exit ${code}`}); stopping the rest.`);
    shutdown(code ?? 0);
  });
}

let stopping = false;
function shutdown(code: number): void {
  if (stopping) return;
  stopping = true;
  for (const child of children) {
    if (child.exitCode !== null || !child.pid) continue;
    try {
      process.kill(-child.pid, 'SIGTERM');
    } catch {
      child.kill('SIGTERM');
    }
  }
  setTimeout(() => process.exit(code), 500).unref();
}

process.on('SIGINT', () => shutdown(0));
process.on('SIGTERM', () => shutdown(0));

run('API', 'npx', ['tsx', 'watch', '--clear-screen=false', 'server/index.ts'], {
  ...process.env,
  PORT: apiPort,
  NODE_ENV: process.env.NODE_ENV ?? 'development',
});
run('Vite', 'npx', ['vite']);
