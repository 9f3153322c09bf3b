import type { ShapeFamily, ShapeRecord } from '../../../../shared/engine/shapes/types';
import type { FieldIssue } from '../../../../shared/schemas/quantity';
import type { LightestSections } from '../../../../shared/study/lightest-sections';
import type { StudyCell, StudySpec } from '../../../../shared/study/study-plan';

export type StudyRequest =
  | {
      type: 'run';
      runId: number;
      document: unknown;
      spec: StudySpec;
      indices: number[];
      shapes: ShapeRecord[];
    }
  | { type: 'lightest'; runId: number; document: unknown; families: ShapeFamily[]; shapes: ShapeRecord[] };

export type StudyReply =
  | { type: 'cells'; runId: number; cells: StudyCell[] }
  | { type: 'done'; runId: number }
  | { type: 'invalid'; runId: number; issues: FieldIssue[] }
  | { type: 'lightest'; runId: number; result: LightestSections }
  | { type: 'error'; runId: number; message: string };
