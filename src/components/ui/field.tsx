import type { ReactNode } from 'react';

export interface FieldProps {
  id: string;
  label: string;
  /** Plain-words error shown next to the field; also wired to aria-describedby. */
  error?: string;
  hint?: ReactNode;
  children: ReactNode;
  className?: string;
}

/** A labelled field with its error in plain words right under it. */
export function Field({ id, label, error, hint, children, className = '' }: FieldProps) {
  return (
    <div className={`flex flex-col gap-0.5 ${className}`}>
      <label htmlFor={id} className="text-xs font-medium text-concrete-700">
        {label}
      </label>
      {children}
      {hint && !error ? (
        <p id={`${id}-hint`} className="text-[11px] text-concrete-500">
          {hint}
        </p>
      ) : null}
      {error ? (
        <p id={`${id}-error`} role="alert" className="text-xs text-util-over">
          {label} {error}
        </p>
      ) : null}
    </div>
  );
}

/** Classes for text inputs and selects, with a visible focus ring and an error state. */
export function inputClass(invalid: boolean, extra = ''): string {
  return `w-full rounded border bg-white px-2 py-1 text-sm text-concrete-900 focus:outline-none focus-visible:ring-2 focus-visible:ring-oxide-500 ${
    invalid ? 'border-util-over' : 'border-concrete-300'
  } ${extra}`;
}

/** aria props for an input inside a Field. */
export function describedBy(
  id: string,
  error?: string,
  hint?: boolean,
): { 'aria-invalid': boolean; 'aria-describedby'?: string } {
  const ids = [error ? `${id}-error` : null, hint && !error ? `${id}-hint` : null].filter(Boolean);
  return { 'aria-invalid': Boolean(error), ...(ids.length ? { 'aria-describedby': ids.join(' ') } : {}) };
}
