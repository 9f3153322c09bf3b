import { useFormContext, type FieldPath } from 'react-hook-form';
import type { DesignDocument } from '../../../../shared/schemas/design';
import { Field, describedBy, inputClass } from '../../../components/ui/field';
import { fieldId } from './field-context';
import { useFieldError } from './plain-fields';

/** A shape label typed as in the shapes table ("W12X26", "HSS8X8X1/2"). */
export function ShapeNameField({
  name,
  label,
  className,
}: {
  name: string;
  label: string;
  className?: string;
}) {
  const { register } = useFormContext<DesignDocument>();
  const error = useFieldError(name);
  const id = fieldId(name);
  return (
    <Field id={id} label={label} error={error} className={className}>
      <input
        id={id}
        autoComplete="off"
        spellCheck={false}
        className={inputClass(Boolean(error), 'font-mono uppercase')}
        {...describedBy(id, error)}
        {...register(name as FieldPath<DesignDocument>)}
      />
    </Field>
  );
}
