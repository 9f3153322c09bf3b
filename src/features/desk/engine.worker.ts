/// <reference lib="webworker" />
/**
 * The design desk's engine off the main thread: typing never waits for a computation. The page
 * keeps at most one request in flight and sends only the newest document next (latest wins).
 */
import type { ShapeRecord } from '../../../shared/engine/shapes/types';
import { runDesign } from './lib/run-design';
import type { WorkerRequest, WorkerReply } from './lib/worker-protocol';

let extraShapes: readonly ShapeRecord[] = [];
const scope = self as unknown as DedicatedWorkerGlobalScope;

scope.onmessage = (event: MessageEvent<WorkerRequest>) => {
  const message = event.data;
  if (message.type === 'shapes') {
    extraShapes = message.shapes;
    return;
  }
  const reply: WorkerReply = { id: message.id, ...runDesign(message.doc, extraShapes) };
  scope.postMessage(reply);
};
