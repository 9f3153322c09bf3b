/// <reference lib="webworker" />
/** One of the reach study's workers: each request is a share of the points, or the lightest sections. */
import { handleRequest } from './lib/handle-request';
import type { StudyRequest } from './lib/study-protocol';

const scope = self as unknown as DedicatedWorkerGlobalScope;

scope.onmessage = (event: MessageEvent<StudyRequest>) => {
  handleRequest(event.data, (reply) => scope.postMessage(reply));
};
