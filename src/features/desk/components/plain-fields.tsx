import { useState, type ReactNode } from 'react';
import { useFormContext, useWatch, type FieldPath } from 'react-hook-form';
import type { DesignDocument } from '../../../../shared/schemas/design';
import { Field, describedBy, inputClass } from '../../../components/ui/field';
import { fieldId, useFieldIssue } from './field-context';

type Name = FieldPath<DesignDocument>;

/** The problem shown at one field (the worker's or the server's; the form does not validate). */
export function useFieldError(name: string): string | undefined {
  return useFieldIssue(name);
}

/** A whole number or ratio; the browser keeps what is typed, the schema says what is wrong. */
export function NumberField({
  name,
  label,
  hint,
  step = 1,
  optional = false,
}: {
  name: string;
  label: string;
  hint?: string;
  step?: number;
  /** Blank means "not given" (the engine's default applies) instead of "not a number". */
  optional?: boolean;
}) {
  const { register } = useFormContext<DesignDocument>();
  const error = useFieldError(name);
  const id = fieldId(name);
  const options = optional
    ? { setValueAs: (v: unknown) => (v === '' || v === undefined || v === null ? undefined : Number(v)) }
    : { valueAsNumber: true as const };
  return (
    <Field id={id} label={label} error={error} hint={hint}>
      <input
        id={id}
        type="number"
        step={step}
        inputMode={optional || step < 1 ? 'decimal' : 'numeric'}
        placeholder={optional ? 'blank = default' : undefined}
        className={inputClass(Boolean(error), 'font-mono')}
        {...describedBy(id, error, Boolean(hint))}
        {...register(name as Name, options)}
      />
    </Field>
  );
}

export function SelectField({
  name,
  label,
  children,
  deps,
}: {
  name: string;
  label: string;
  children: ReactNode;
  /** Fields whose check depends on this choice (re-checked when it changes). */
  deps?: string[];
}) {
  const { register } = useFormContext<DesignDocument>();
  const error = useFieldError(name);
  const id = fieldId(name);
  return (
    <Field id={id} label={label} error={error}>
      <select
        id={id}
        className={inputClass(Boolean(error))}
        {...describedBy(id, error)}
        {...register(name as Name, deps ? { deps: deps as Name[] } : undefined)}
      >
        {children}
      </select>
    </Field>
  );
}

/**
 * A choice whose key is left out of the document until the person picks one: the select shows the
 * engine's default (`fallback`) while the key is absent, so an untouched field never writes a key.
 */
export function ChoiceField({
  name,
  label,
  fallback,
  choices,
  hint,
}: {
  name: string;
  label: string;
  fallback: string;
  choices: readonly (readonly [value: string, words: string])[];
  hint?: string;
}) {
  const { control, setValue } = useFormContext<DesignDocument>();
  const value = useWatch({ control, name: name as Name }) as unknown;
  const error = useFieldError(name);
  const id = fieldId(name);
  return (
    <Field id={id} label={label} error={error} hint={hint}>
      <select
        id={id}
        value={typeof value === 'string' ? value : fallback}
        onChange={(e) =>
          setValue(name as Name, e.target.value as never, { shouldDirty: true, shouldValidate: true })
        }
        className={inputClass(Boolean(error))}
        {...describedBy(id, error, Boolean(hint))}
      >
        {choices.map(([v, words]) => (
          <option key={v} value={v}>
            {words}
          </option>
        ))}
      </select>
    </Field>
  );
}

/** A yes/no key with an engine default: absent reads as `fallback`; a key is written only when ticked or unticked. */
export function SwitchField({ name, label, fallback }: { name: string; label: string; fallback: boolean }) {
  const { control, setValue } = useFormContext<DesignDocument>();
  const value = useWatch({ control, name: name as Name }) as unknown;
  const id = fieldId(name);
  return (
    <label htmlFor={id} className="flex items-center gap-2 text-sm">
      <input
        id={id}
        type="checkbox"
        className="h-4 w-4 accent-oxide-500"
        checked={typeof value === 'boolean' ? value : fallback}
        onChange={(e) =>
          setValue(name as Name, e.target.checked as never, { shouldDirty: true, shouldValidate: true })
        }
      />
      {label}
    </label>
  );
}

export function CheckField({ name, label }: { name: string; label: string }) {
  const { register } = useFormContext<DesignDocument>();
  const id = fieldId(name);
  return (
    <label htmlFor={id} className="flex items-center gap-2 text-sm">
      <input id={id} type="checkbox" className="h-4 w-4 accent-oxide-500" {...register(name as Name)} />
      {label}
    </label>
  );
}

/** One input group of the desk, collapsible, with its own heading. */
/** The desk's two-column breakpoint (Tailwind lg); without matchMedia (tests) the screen counts as wide. */
function wideScreen(): boolean {
  return typeof window.matchMedia !== 'function' || window.matchMedia('(min-width: 1024px)').matches;
}

export function Group({
  title,
  children,
  disabled = false,
  note,
}: {
  title: string;
  children: ReactNode;
  disabled?: boolean;
  note?: string;
}) {
  // Open on a wide screen, where the inputs sit beside the results; folded on a phone, where they
  // come below the verdict and the results and a person opens the group they want to change.
  const [open, setOpen] = useState(wideScreen);
  return (
    <details
      open={open}
      onToggle={(e) => setOpen(e.currentTarget.open)}
      className="rounded-md border border-concrete-300 bg-white"
    >
      <summary className="cursor-pointer select-none px-3 py-2 text-sm font-semibold text-concrete-800">
        {/* A heading, so the groups' own sub-headings (h3) follow an h2 and a screen reader can jump between groups. */}
        <h2 className="inline text-sm font-semibold">{title}</h2>
      </summary>
      <fieldset disabled={disabled} className="flex flex-col gap-2 px-3 pb-3">
        <legend className="sr-only">{title}</legend>
        {disabled && note ? <p className="text-xs text-concrete-500">{note}</p> : null}
        {children}
      </fieldset>
    </details>
  );
}
