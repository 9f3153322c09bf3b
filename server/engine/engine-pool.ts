/**
 * The engine of `POST /api/check`, in-line (ENGINE_THREADS=0, the default) or off the event loop
 * in a piscina worker pool (ENGINE_THREADS=n or auto), where the design is computed and its result
 * turned into JSON while reads keep flowing. A design takes well under a millisecond now, and on
 * the 2-core machine the hop to a thread (the parsed document copied over, the answer back, a
 * thread competing with the event loop for the cores) gained nothing: as many checks per second,
 * and in the 50-client mix on SQLite the checks queued for the thread while reads went by, a p99
 * four times as long as in-line (DEVELOPERS.md, Decisions).
 * Both ways give byte-equal answers (tests/server/engine-pool.test.ts).
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
