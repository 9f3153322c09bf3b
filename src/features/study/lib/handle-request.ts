/**
 * What a study worker does with one request (also run on the main thread where there is no
 * Worker, e.g. under jsdom): plan once, evaluate its points with the shared engine and post them in
 * small batches, the first one early, so the map fills while the rest runs.
 */
import { lookupWith, SHAPES } from '../../../../shared/engine/shapes/table';
import { lightestSections } from '../../../../shared/study/lightest-sections';
import { planStudy, runCells, type StudyCell } from '../../../../shared/study/study-plan';
import type { StudyReply, StudyRequest } from './study-protocol';

/** A batch goes out after this many ms of work (the first after the first point). */
const BATCH_MS = 40;

export function handleRequest(request: StudyRequest, post: (reply: StudyReply) => void): void {
  const { runId } = request;
  try {
    const lookup = lookupWith(request.shapes);
    if (request.type === 'lightest') {
      const catalog = [...request.shapes.filter((s) => s.custom), ...SHAPES];
      const out = lightestSections(request.document, { families: request.families, catalog, shapes: lookup });
      post(
        out.ok
          ? { type: 'lightest', runId, result: out.result }
          : { type: 'invalid', runId, issues: out.issues },
      );
      return;
    }
    const planned = planStudy(request.document, request.spec);
    if (!planned.ok) {
      post({ type: 'invalid', runId, issues: planned.issues });
      return;
    }
    let batch: StudyCell[] = [];
    let last = performance.now();
    let first = true;
    for (const index of request.indices) {
      batch.push(...runCells(planned.plan, [index], lookup));
      const now = performance.now();
      if (first || now - last >= BATCH_MS) {
        post({ type: 'cells', runId, cells: batch });
        batch = [];
        last = now;
        first = false;
      }
    }
    if (batch.length > 0) post({ type: 'cells', runId, cells: batch });
    post({ type: 'done', runId });
  } catch (error) {
    post({ type: 'error', runId, message: error instanceof Error ? error.message : String(error) });
  }
}
