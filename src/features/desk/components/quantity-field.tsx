import { useController, useFormContext, type FieldPath } from 'react-hook-form';
import type { DesignDocument } from '../../../../shared/schemas/design';
import { Field, describedBy, inputClass } from '../../../components/ui/field';
import { fieldUnit, UNIT_CHOICES } from '../lib/field-units';
import { rewriteQuantity, unitOfText } from '../lib/quantity-text';
import { fieldId, useEngineIssue } from './field-context';

export interface QuantityFieldProps {
  name: string;
  label: string;
  hint?: string;
  /** Blank means "not given" (the engine's default applies). */
  optional?: boolean;
  placeholder?: string;
  className?: string;
}

/**
 * The text box and unit chooser of a quantity, without the form wiring: `name` gives the DOM id and
 * the field's unit; `onText` receives the text typed or rewritten (undefined when an optional field
 * is left blank).
 */
export function QuantityInput({
  name,
  label,
  hint,
  optional = false,
  placeholder,
  className,
  text,
  error,
  onText,
  onBlur,
  inputRef,
}: QuantityFieldProps & {
  text: string;
  error?: string;
  onText: (text: string | undefined) => void;
  onBlur?: () => void;
  inputRef?: (el: HTMLInputElement | null) => void;
}) {
  const id = fieldId(name);
  const unit = fieldUnit(name);
  const choices = unit ? UNIT_CHOICES[unit.dimension] : [];
  const current = unitOfText(text);
  const chosen = choices.find((c) => c.replace(/\s/g, '') === current.replace(/\s/g, '')) ?? '';

  function choose(next: string) {
    if (!unit || !next) return;
    const rewritten = rewriteQuantity(text, unit.dimension, next);
    if (rewritten !== null) onText(rewritten);
  }

  return (
    <Field id={id} label={label} error={error} hint={hint} className={className}>
      <div className="flex gap-1">
        <input
          id={id}
          name={name}
          ref={inputRef}
          value={text}
          placeholder={placeholder ?? (optional ? 'blank = default' : undefined)}
          onBlur={onBlur}
          onChange={(e) => onText(optional && e.target.value.trim() === '' ? undefined : e.target.value)}
          autoComplete="off"
          spellCheck={false}
          className={inputClass(Boolean(error), 'font-mono')}
          {...describedBy(id, error, Boolean(hint))}
        />
        {choices.length > 1 ? (
          <select
            aria-label={`${label}: unit`}
            value={chosen}
            disabled={!text}
            onChange={(e) => choose(e.target.value)}
            className="w-20 shrink-0 rounded border border-concrete-300 bg-concrete-100 px-1 text-xs text-concrete-700 focus-visible:ring-2 focus-visible:ring-oxide-500"
          >
            {chosen ? null : <option value="">unit…</option>}
            {choices.map((c) => (
              <option key={c} value={c}>
                {c}
              </option>
            ))}
          </select>
        ) : null}
      </div>
    </Field>
  );
}

/**
 * A quantity typed with its unit ("10 ft"), with a small chooser that rewrites the same physical
 * value in another unit. The error (schema or engine) sits right under it in plain words.
 */
export function QuantityField(props: QuantityFieldProps) {
  const { control } = useFormContext<DesignDocument>();
  const {
    field: { value, onChange, onBlur, ref },
    fieldState,
  } = useController({ control, name: props.name as FieldPath<DesignDocument> });
  const engineIssue = useEngineIssue(props.name);
  const error = fieldState.error?.message ?? engineIssue;
  const text = typeof value === 'string' ? value : '';
  return (
    <QuantityInput {...props} text={text} error={error} onText={onChange} onBlur={onBlur} inputRef={ref} />
  );
}
