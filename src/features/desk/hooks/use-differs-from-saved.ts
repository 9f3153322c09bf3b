import { useEffect, useState } from 'react';
import type { UseFormReturn } from 'react-hook-form';
import { diffDesigns } from '../../../../shared/schemas/diff';
import type { DesignDocument } from '../../../../shared/schemas/design';

/**
 * Whether the form's document differs, field by field, from the one it was loaded or last saved
 * with. Subscribes to value changes without re-rendering the desk on every keystroke: state changes
 * only when the answer flips.
 */
export function useDiffersFromSaved(form: UseFormReturn<DesignDocument>): boolean {
  const [differs, setDiffers] = useState(false);
  useEffect(
    () =>
      form.subscribe({
        formState: { values: true },
        callback: ({ values }) => setDiffers(diffDesigns(form.formState.defaultValues, values).length > 0),
      }),
    [form],
  );
  return differs;
}
