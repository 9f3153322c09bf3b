import { useCallback, useEffect, useRef, useState } from 'react';
import type { ShapeFamily, ShapeRecord } from '../../../../shared/engine/shapes/types';
import type { FieldIssue } from '../../../../shared/schemas/quantity';
import type { CellOutcome } from '../../../../shared/study/evaluate-cell';
import type { LightestSections } from '../../../../shared/study/lightest-sections';
import { cellOrder, planStudy, type StudyPlan, type StudySpec } from '../../../../shared/study/study-plan';
import { axisLength } from '../../../../shared/study/axes';
import type { StudyReply, StudyRequest } from '../lib/study-protocol';

export type StudyStatus = 'idle' | 'running' | 'done' | 'cancelled' | 'invalid' | 'error';

export interface StudyRun {
  runId: number;
  plan: StudyPlan | null;
  /** One entry per point, index j * nx + i; undefined until computed. */
  cells: (CellOutcome | undefined)[];
  done: number;
  total: number;
  status: StudyStatus;
  issues: FieldIssue[];
  message: string | null;
  workers: number;
}

const IDLE: StudyRun = {
  runId: 0,
  plan: null,
  cells: [],
  done: 0,
  total: 0,
  status: 'idle',
  issues: [],
  message: null,
  workers: 0,
};

interface Engine {
  post(message: StudyRequest): void;
  stop(): void;
}

/** A worker when the browser has one; otherwise the same code on the main thread, after a tick. */
function startEngine(onReply: (reply: StudyReply) => void): Engine {
  if (typeof Worker !== 'undefined') {
    const worker = new Worker(new URL('../study.worker.ts', import.meta.url), { type: 'module' });
    worker.onmessage = (event: MessageEvent<StudyReply>) => onReply(event.data);
    return { post: (m) => worker.postMessage(m), stop: () => worker.terminate() };
  }
  let stopped = false;
  return {
    post(message) {
      setTimeout(() => {
        void import('../lib/handle-request').then(({ handleRequest }) => {
          if (!stopped) handleRequest(message, (r) => !stopped && onReply(r));
        });
      }, 0);
    },
    stop: () => {
      stopped = true;
    },
  };
}

/** As many workers as the browser offers (its count of logical cores), at most 8. */
export function workerCount(): number {
  const n = typeof navigator !== 'undefined' ? navigator.hardwareConcurrency : 0;
  return Math.max(1, Math.min(Number.isFinite(n) && n > 0 ? n : 2, 8));
}

/**
 * Runs a study over a pool of workers (started when the screen opens, so a run does not wait for
 * the engine to load), each with an interleaved share of the coarse-to-fine order; answers are
 * applied at most once per animation frame. Cancel stops the workers at once.
 */
export function useStudyRun() {
  const [run, setRun] = useState<StudyRun>(IDLE);
  const pool = useRef<Engine[]>([]);
  const current = useRef<StudyRun>(IDLE);
  const frame = useRef<number | null>(null);
  const finished = useRef(0);
  const [lightest, setLightest] = useState<{
    status: 'idle' | 'running' | 'done' | 'invalid' | 'error';
    result: LightestSections | null;
    message: string | null;
  }>({ status: 'idle', result: null, message: null });
  const side = useRef<Engine | null>(null);

  const flush = useCallback(() => {
    frame.current = null;
    setRun({ ...current.current, cells: current.current.cells.slice() });
  }, []);
  const schedule = useCallback(() => {
    if (frame.current === null) frame.current = requestAnimationFrame(flush);
  }, [flush]);

  const onReply = useCallback(
    (reply: StudyReply) => {
      const r = current.current;
      if (reply.runId !== r.runId || r.status !== 'running') return;
      if (reply.type === 'cells') {
        const nx = r.plan ? axisLength(r.plan.x) : 1;
        for (const c of reply.cells) r.cells[c.j * nx + c.i] = c.outcome;
        r.done += reply.cells.length;
      } else if (reply.type === 'done') {
        finished.current += 1;
        if (finished.current === r.workers) r.status = 'done';
      } else if (reply.type === 'invalid') {
        r.status = 'invalid';
        r.issues = reply.issues;
      } else if (reply.type === 'error') {
        r.status = 'error';
        r.message = reply.message;
      }
      schedule();
    },
    [schedule],
  );

  const ensurePool = useCallback(() => {
    while (pool.current.length < workerCount()) pool.current.push(startEngine(onReply));
    return pool.current;
  }, [onReply]);

  const stopPool = useCallback(() => {
    for (const e of pool.current) e.stop();
    pool.current = [];
  }, []);

  useEffect(() => {
    ensurePool();
    return () => {
      stopPool();
      side.current?.stop();
      side.current = null;
      if (frame.current !== null) cancelAnimationFrame(frame.current);
    };
  }, [ensurePool, stopPool]);

  const start = useCallback(
    (document: unknown, spec: StudySpec, shapes: ShapeRecord[]) => {
      const runId = current.current.runId + 1;
      if (current.current.status === 'running') stopPool();
      const planned = planStudy(document, spec);
      if (!planned.ok) {
        current.current = { ...IDLE, runId, status: 'invalid', issues: planned.issues };
        schedule();
        return;
      }
      const nx = axisLength(spec.x);
      const ny = axisLength(spec.y);
      const order = cellOrder(nx, ny);
      const engines = ensurePool();
      const shares = engines.map((_, k) => order.filter((_, n) => n % engines.length === k));
      performance.mark(`study-start-${runId}`);
      finished.current = 0;
      current.current = {
        ...IDLE,
        runId,
        plan: planned.plan,
        cells: new Array<CellOutcome | undefined>(nx * ny).fill(undefined),
        total: nx * ny,
        status: 'running',
        workers: engines.length,
      };
      engines.forEach((e, k) => e.post({ type: 'run', runId, document, spec, indices: shares[k], shapes }));
      schedule();
    },
    [ensurePool, schedule, stopPool],
  );

  const cancel = useCallback(() => {
    if (current.current.status !== 'running') return;
    stopPool();
    current.current = { ...current.current, status: 'cancelled' };
    schedule();
    ensurePool();
  }, [ensurePool, schedule, stopPool]);

  const findLightest = useCallback((document: unknown, families: ShapeFamily[], shapes: ShapeRecord[]) => {
    side.current?.stop();
    setLightest({ status: 'running', result: null, message: null });
    const engine = startEngine((reply) => {
      if (reply.type === 'lightest') setLightest({ status: 'done', result: reply.result, message: null });
      else if (reply.type === 'invalid')
        setLightest({
          status: 'invalid',
          result: null,
          message: reply.issues.map((i) => `${i.path}: ${i.message}`).join('; '),
        });
      else if (reply.type === 'error') setLightest({ status: 'error', result: null, message: reply.message });
      engine.stop();
    });
    side.current = engine;
    engine.post({ type: 'lightest', runId: 0, document, families, shapes });
  }, []);

  return { run, start, cancel, lightest, findLightest };
}
