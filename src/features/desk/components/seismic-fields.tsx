import { useFormContext, useWatch } from 'react-hook-form';
import type { DesignDocument } from '../../../../shared/schemas/design';
import { Field, describedBy, inputClass } from '../../../components/ui/field';
import { fieldId } from './field-context';
import { NumberField, useFieldError } from './plain-fields';

const CATEGORIES = ['A', 'B', 'C', 'D', 'E', 'F'] as const;

/**
 * Vertical seismic (ASCE 7-16 12.4.2.2, Ev = 0.2 SDS D; in categories D to F also the net upward
 * 0.2 D of 12.4.4). No category chosen means no `loads.seismic` in the document.
 */
export function SeismicFields() {
  const { control, getValues, setValue } = useFormContext<DesignDocument>();
  const seismic = useWatch({ control, name: 'loads.seismic' });
  const name = 'loads.seismic.category';
  const id = fieldId(name);
  const categoryError = useFieldError(name);
  const objectError = useFieldError('loads.seismic');
  const error = categoryError ?? objectError;

  function choose(category: string) {
    const opts = { shouldDirty: true, shouldValidate: true } as const;
    if (!category) return setValue('loads.seismic', undefined, opts);
    const current = getValues('loads.seismic');
    setValue(
      'loads.seismic',
      { ...current, category: category as (typeof CATEGORIES)[number] } as NonNullable<
        DesignDocument['loads']
      >['seismic'],
      opts,
    );
  }

  return (
    <div className="grid grid-cols-2 items-start gap-2">
      <Field
        id={id}
        label="Seismic design category"
        error={error}
        hint={
          seismic
            ? 'D to F add a net upward 0.2 D (ASCE 7-16 12.4.4); horizontal Eh is not modelled'
            : 'none = no seismic combinations'
        }
      >
        <select
          id={id}
          value={seismic?.category ?? ''}
          onChange={(e) => choose(e.target.value)}
          className={inputClass(Boolean(error))}
          {...describedBy(id, error, true)}
        >
          <option value="">None (no seismic case)</option>
          {CATEGORIES.map((c) => (
            <option key={c} value={c}>
              {c}
            </option>
          ))}
        </select>
      </Field>
      {seismic ? (
        <NumberField
          name="loads.seismic.SDS"
          label="SDS, in g"
          step={0.01}
          hint="Ev = 0.2 SDS D (ASCE 7-16 12.4.2.2)"
        />
      ) : null}
    </div>
  );
}
