import { useEffect, useRef } from 'react';
import { useController, useFormContext, type FieldPath } from 'react-hook-form';
import type { DesignDocument } from '../../../../shared/schemas/design';
import { Field, describedBy, inputClass } from '../../../components/ui/field';
import { fieldUnit, UNIT_CHOICES } from '../lib/field-units';
import { fieldId, useFieldIssue } from './field-context';
import { useUnitMenu } from './unit-menu';

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
 * The text box of a quantity with its unit list folded in, without the form wiring: `name` gives the
 * DOM id and the field's unit; `onText` receives the text typed or rewritten (undefined when an
 * optional field is left blank). One Tab stop: the box is an editable combobox whose list (Alt+ArrowDown,
 * or the small button inside the box) rewrites the value in another unit; what is typed always wins.
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
  const listId = `${id}-units`;
  const dimension = fieldUnit(name)?.dimension;
  const offered = dimension ? UNIT_CHOICES[dimension].length > 1 : false;
  const box = useRef<HTMLInputElement | null>(null);
  const menu = useUnitMenu(text, offered ? dimension : undefined, onText);
  const activeId = menu.open && menu.options.length ? `${listId}-${menu.active}` : undefined;

  useEffect(() => {
    if (activeId) document.getElementById(activeId)?.scrollIntoView?.({ block: 'nearest' });
  }, [activeId]);

  const input = (
    <input
      id={id}
      name={name}
      ref={(el) => {
        box.current = el;
        inputRef?.(el);
      }}
      value={text}
      placeholder={placeholder ?? (optional ? 'blank = default' : undefined)}
      onBlur={() => {
        menu.close();
        onBlur?.();
      }}
      onChange={(e) => onText(optional && e.target.value.trim() === '' ? undefined : e.target.value)}
      onKeyDown={menu.onKeyDown}
      autoComplete="off"
      spellCheck={false}
      className={inputClass(Boolean(error), `min-w-0 font-mono ${offered ? 'pr-7' : ''}`)}
      {...(offered
        ? {
            role: 'combobox',
            'aria-autocomplete': 'none' as const,
            'aria-haspopup': 'listbox' as const,
            'aria-expanded': menu.open,
            'aria-controls': listId,
            'aria-activedescendant': activeId,
            'aria-keyshortcuts': 'Alt+ArrowDown',
          }
        : {})}
      {...describedBy(id, error, Boolean(hint))}
    />
  );

  return (
    <Field id={id} label={label} error={error} hint={hint} className={className}>
      {offered ? (
        <div className="relative">
          {input}
          <button
            type="button"
            tabIndex={-1}
            aria-label={`${label}: other units`}
            aria-haspopup="listbox"
            aria-expanded={menu.open}
            aria-controls={listId}
            // Keep the focus in the box: the list is driven from there.
            onMouseDown={(e) => e.preventDefault()}
            onClick={() => {
              box.current?.focus();
              menu.toggle();
            }}
            className="absolute inset-y-0 right-0 flex w-7 items-center justify-center rounded-r text-concrete-600 hover:bg-concrete-100 hover:text-concrete-900"
          >
            <span aria-hidden="true">▾</span>
          </button>
          <ul
            id={listId}
            role="listbox"
            aria-label={`${label}: convert to`}
            hidden={!menu.open}
            className="absolute right-0 z-20 mt-1 max-h-56 min-w-full overflow-auto rounded border border-concrete-300 bg-white py-1 text-sm shadow-lg"
          >
            {menu.options.map((o, i) => (
              <li
                key={o.unit}
                id={`${listId}-${i}`}
                role="option"
                aria-selected={o.current}
                aria-disabled={o.text === null ? true : undefined}
                onMouseDown={(e) => e.preventDefault()}
                onMouseEnter={() => menu.setActive(i)}
                onClick={() => menu.choose(i)}
                className={`flex items-baseline justify-between gap-3 whitespace-nowrap px-2 py-1 font-mono ${
                  i === menu.active ? 'bg-oxide-50' : ''
                } ${o.text === null ? 'cursor-default text-concrete-600' : 'cursor-pointer text-concrete-900'}`}
              >
                {o.text ?? o.unit}
                {o.current ? <span className="font-sans text-xs text-concrete-600"> as typed</span> : null}
              </li>
            ))}
          </ul>
        </div>
      ) : (
        input
      )}
    </Field>
  );
}

/**
 * A quantity typed with its unit ("10 ft"), with a small list that rewrites the same physical
 * value in another unit. The error (the worker's: schema or engine) sits right under it in plain words.
 */
export function QuantityField(props: QuantityFieldProps) {
  const { control } = useFormContext<DesignDocument>();
  const {
    field: { value, onChange, onBlur, ref },
  } = useController({ control, name: props.name as FieldPath<DesignDocument> });
  const error = useFieldIssue(props.name);
  const text = typeof value === 'string' ? value : '';
  return (
    <QuantityInput {...props} text={text} error={error} onText={onChange} onBlur={onBlur} inputRef={ref} />
  );
}
