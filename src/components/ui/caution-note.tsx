import { TriangleAlert } from 'lucide-react';
import { CAUTION } from '../../../shared/engine/types';

/** The caution every result view carries. */
export function CautionNote() {
  return (
    <p
      role="note"
      className="flex items-start gap-2 rounded border border-oxide-300 bg-oxide-50 p-3 text-sm text-concrete-800"
    >
      <TriangleAlert aria-hidden="true" className="mt-0.5 h-4 w-4 shrink-0 text-oxide-600" />
      <span>{CAUTION}</span>
    </p>
  );
}
