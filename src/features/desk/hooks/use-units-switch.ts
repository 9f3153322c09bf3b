import { useCallback, useRef } from 'react';
import type { UseFormReturn } from 'react-hook-form';
import type { UnitSystem } from '../../../../shared/engine/units';
import type { DesignDocument } from '../../../../shared/schemas/design';
import { switchUnits, type SwitchRecord } from '../lib/switch-units';

type Form = UseFormReturn<DesignDocument>;

/** Replaces the saved baseline and the edited values together, so a switch alone leaves nothing unsaved. */
export function replaceKeepingDirty(form: Form, baseline: DesignDocument, values: DesignDocument): void {
  form.reset(baseline);
  form.reset(values, { keepDefaultValues: true });
}

/**
 * Switches every input quantity to the other unit system. The baseline is switched too, so that the
 * same physical design does not count as an unsaved change; a switch straight back restores the text.
 */
export function useUnitsSwitch(form: Form) {
  const records = useRef<{ values: SwitchRecord | null; baseline: SwitchRecord | null }>({
    values: null,
    baseline: null,
  });
  return useCallback(
    (to: UnitSystem) => {
      const values = switchUnits(form.getValues(), to, records.current.values);
      const baseline = switchUnits(
        form.formState.defaultValues as DesignDocument,
        to,
        records.current.baseline,
      );
      records.current = { values: values.record, baseline: baseline.record };
      replaceKeepingDirty(form, baseline.doc, values.doc);
    },
    [form],
  );
}
