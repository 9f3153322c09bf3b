/**
 * The engine off the event loop: `POST /api/check` runs the design (and turns its result into
 * JSON) in a piscina worker pool, so reads keep flowing while designs are computed. With no worker
 * threads configured (ENGINE_THREADS=0, the API tests' default) the same task runs in-line.
 *
 * The worker is engine-worker.js beside the bundle when `npm start` runs the built server, or the
 * TypeScript source through tsx when the server runs from source (tests, scripts, development).
 */
import { existsSync } from 'node:fs';
import { availableParallelism } from 'node:os';
import { fileURLToPath } from 'node:url';
import { Piscina } from 'piscina';
import { runEngineTask, type EngineAnswer, type EngineTask } from './engine-task';

export interface EnginePool {
  run(task: EngineTask): Promise<EngineAnswer>;
  readonly threads: number;
  close(): Promise<void>;
}

/** "auto": one thread fewer than the cores (the event loop keeps one), at least one. */
export function engineThreads(setting: number | 'auto'): number {
  return setting === 'auto' ? Math.max(1, availableParallelism() - 1) : setting;
}

function workerFile(): { filename: string; execArgv: string[] } {
  const bundled = new URL('./engine-worker.js', import.meta.url);
  if (existsSync(fileURLToPath(bundled))) return { filename: bundled.href, execArgv: [] };
  return { filename: new URL('./engine-worker.ts', import.meta.url).href, execArgv: ['--import', 'tsx'] };
}

export function createEnginePool(threads: number): EnginePool {
  if (threads <= 0) {
    return {
      threads: 0,
      run: (task) => Promise.resolve(runEngineTask(task)),
      close: () => Promise.resolve(),
    };
  }
  const { filename, execArgv } = workerFile();
  const piscina = new Piscina<EngineTask, EngineAnswer>({
    filename,
    execArgv,
    minThreads: threads,
    maxThreads: threads,
    // Every task waits its turn (an unbounded queue): a burst of checks is slow, never refused.
    // The request body limit and the proxy's time limit bound what can pile up.
    maxQueue: Infinity,
    recordTiming: false,
  });
  return {
    threads,
    run: (task) => piscina.run(task),
    close: () => piscina.destroy(),
  };
}
