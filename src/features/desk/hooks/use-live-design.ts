import { useCallback, useEffect, useRef, useState } from 'react';
import { flushSync } from 'react-dom';
import type { ShapeRecord } from '../../../../shared/engine/shapes/types';
import type { DesignResult } from '../../../../shared/engine/types';
import type { DesignDocument } from '../../../../shared/schemas/design';
import type { FieldIssue } from '../../../../shared/schemas/quantity';
import { finishRedraw } from '../lib/redraw-measure';
import type { WorkerReply, WorkerRequest } from '../lib/worker-protocol';

export interface LiveDesign {
  /** The newest result that computed (kept while the inputs are being fixed). */
  result: DesignResult | null;
  /** The request id behind `result` (for the redraw measure). */
  resultId: number;
  /**
   * Problems with the newest document, the schema's and the engine's (the desk validates here, in the
   * worker, and nowhere else); empty when it computed.
   */
  issues: FieldIssue[];
  /** The engine failed unexpectedly on the newest document. */
  failure: string | null;
  /** True when `result` belongs to an older document than the one on screen. */
  stale: boolean;
  /** Milliseconds the engine took for the newest answer. */
  engineMs: number;
  /** The document behind `result` (for the sketches). */
  doc: DesignDocument | null;
}

// One shared empty list: a fresh [] per answer would change the engine-issues context on every
// result and re-render every field of the form.
const NO_ISSUES: FieldIssue[] = [];
const EMPTY: LiveDesign = {
  result: null,
  resultId: 0,
  issues: NO_ISSUES,
  failure: null,
  stale: true,
  engineMs: 0,
  doc: null,
};

interface Engine {
  post(message: WorkerRequest): void;
  stop(): void;
}

/** A worker when the browser has one; otherwise the same code on the main thread, after a tick. */
function startEngine(onReply: (reply: WorkerReply) => void): Engine {
  if (typeof Worker !== 'undefined') {
    const worker = new Worker(new URL('../engine.worker.ts', import.meta.url), { type: 'module' });
    worker.onmessage = (event: MessageEvent<WorkerReply>) => onReply(event.data);
    return { post: (m) => worker.postMessage(m), stop: () => worker.terminate() };
  }
  let shapes: ShapeRecord[] = [];
  let stopped = false;
  return {
    post(message) {
      if (message.type === 'shapes') {
        shapes = message.shapes;
        return;
      }
      void import('../lib/run-design').then(({ runDesign }) => {
        if (!stopped) onReply({ id: message.id, ...runDesign(message.doc, shapes) });
      });
    },
    stop: () => {
      stopped = true;
    },
  };
}

/**
 * Live recomputation, latest wins: at most one document is with the engine; while it works, only the
 * newest document typed since is kept and sent next. Each request is marked (performance marks
 * "desk-input-<id>") so the charts can measure the redraw.
 */
export function useLiveDesign(customShapes: ShapeRecord[]) {
  const [live, setLive] = useState<LiveDesign>(EMPTY);
  const [busy, setBusy] = useState(false);
  const engine = useRef<Engine | null>(null);
  const inFlight = useRef(false);
  const queued = useRef<{ id: number; doc: unknown } | null>(null);
  const nextId = useRef(0);
  const docs = useRef(new Map<number, DesignDocument>());
  const latest = useRef<LiveDesign>(EMPTY);
  const waiters = useRef<((answer: LiveDesign) => void)[]>([]);

  useEffect(() => {
    const e = startEngine((reply) => {
      if (performance.getEntriesByName(`desk-input-${reply.id}`, 'mark').length > 0)
        performance.measure('desk-engine', `desk-input-${reply.id}`);
      const next = queued.current;
      queued.current = null;
      if (next) engine.current?.post({ type: 'evaluate', ...next });
      else inFlight.current = false;
      const doc = docs.current.get(reply.id) ?? null;
      for (const id of docs.current.keys()) if (id <= reply.id) docs.current.delete(id);
      const prev = latest.current;
      const answer: LiveDesign =
        reply.kind === 'result'
          ? {
              result: reply.result,
              resultId: reply.id,
              issues: NO_ISSUES,
              failure: null,
              stale: Boolean(next),
              engineMs: reply.ms,
              doc,
            }
          : reply.kind === 'invalid'
            ? { ...prev, issues: reply.issues, failure: null, stale: true, engineMs: reply.ms }
            : { ...prev, issues: NO_ISSUES, failure: reply.message, stale: true, engineMs: reply.ms };
      latest.current = answer;
      // One task from the answer to the charts' final commit: as a sync update, the charts' effects
      // (which hand the new data to each chart's store) and the re-render they cause run in the same
      // task, instead of after a browser frame that would paint the half-updated results.
      flushSync(() => {
        setBusy(Boolean(next));
        setLive(answer);
      });
      if (!next) for (const waiter of waiters.current.splice(0)) waiter(answer);
      finishRedraw(reply.id);
    });
    engine.current = e;
    if (queued.current) {
      inFlight.current = true;
      e.post({ type: 'evaluate', ...queued.current });
      queued.current = null;
    }
    return () => {
      e.stop();
      engine.current = null;
      inFlight.current = false;
    };
  }, []);

  useEffect(() => {
    engine.current?.post({ type: 'shapes', shapes: customShapes });
  }, [customShapes]);

  const submit = useCallback((doc: unknown) => {
    nextId.current += 1;
    const id = nextId.current;
    performance.mark(`desk-input-${id}`);
    const request = { id, doc: structuredClone(doc) };
    docs.current.set(id, request.doc as DesignDocument);
    if (inFlight.current || !engine.current) {
      queued.current = request;
    } else {
      inFlight.current = true;
      engine.current.post({ type: 'evaluate', ...request });
    }
    setBusy(true);
  }, []);

  /** The answer for the newest document submitted, once the worker has given it (at once when idle). */
  const settled = useCallback(
    (): Promise<LiveDesign> =>
      inFlight.current || queued.current
        ? new Promise((resolve) => waiters.current.push(resolve))
        : Promise.resolve(latest.current),
    [],
  );

  return { live, busy, submit, settled };
}
