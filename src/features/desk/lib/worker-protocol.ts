import type { ShapeRecord } from '../../../../shared/engine/shapes/types';
import type { DesignAnswer } from './run-design';

export type WorkerRequest =
  { type: 'evaluate'; id: number; doc: unknown } | { type: 'shapes'; shapes: ShapeRecord[] };
export type WorkerReply = DesignAnswer & { id: number };
