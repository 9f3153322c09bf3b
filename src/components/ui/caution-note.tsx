import { TriangleAlert } from 'lucide-react';
import { CAUTION } from '../../../shared/engine/types';

/**
 * The caution every result view carries, once, near the top (`data-caution`: the layout's footer
 * caution then steps aside, so a view never shows it twice).
 */
export function CautionNote() {
  return (
    <p
      role="note"
      data-caution
      className="flex items-start gap-2 rounded border border-oxide-300 bg-oxide-50 p-3 text-sm text-concrete-800"
    >
      <TriangleAlert aria-hidden="true" className="mt-0.5 h-4 w-4 shrink-0 text-oxide-600" />
      <span>{CAUTION}</span>
    </p>
  );
}
