import { useMemo, useState, type KeyboardEvent } from 'react';
import type { Dimension } from '../../../../shared/engine/units';
import { UNIT_CHOICES } from '../lib/field-units';
import { rewriteQuantity, unitOfText } from '../lib/quantity-text';

export interface UnitOption {
  unit: string;
  /** What the box would read after choosing it, or null when there is nothing to convert. */
  text: string | null;
  /** The unit already typed in the box. */
  current: boolean;
}

/** A bare number ("200", "1-1/2") takes the chosen unit as it stands. */
const BARE_NUMBER = /^\s*[-+]?(?:\d+(?:[-\s]\d+\/\d+)?(?:\.\d*)?|\.\d+|\d+\/\d+)(?:e[-+]?\d+)?\s*$/i;

const same = (a: string, b: string) => a.replace(/\s/g, '') === b.replace(/\s/g, '');

/** The conversions a quantity box offers: every unit of its dimension, each with the value rewritten in it. */
export function unitOptions(text: string, dimension: Dimension): UnitOption[] {
  const typed = unitOfText(text);
  return UNIT_CHOICES[dimension].map((unit) => {
    const current = typed !== '' && same(typed, unit);
    if (current) return { unit, text: text.trim(), current };
    const rewritten = rewriteQuantity(text, dimension, unit);
    if (rewritten !== null) return { unit, text: rewritten, current };
    return { unit, text: BARE_NUMBER.test(text) ? `${text.trim()} ${unit}` : null, current };
  });
}

/**
 * The keyboard and open state of a quantity box's unit list, the editable-combobox way: focus stays
 * in the box; Alt+ArrowDown (or ArrowDown) opens the list, the arrows move the active unit, Enter
 * converts to it, Escape and Tab close. The unit typed in the box is never changed unless chosen.
 */
export function useUnitMenu(
  text: string,
  dimension: Dimension | undefined,
  onChoose: (text: string) => void,
) {
  const [open, setOpen] = useState(false);
  const [active, setActive] = useState(0);
  const options = useMemo(
    () => (open && dimension ? unitOptions(text, dimension) : []),
    [open, text, dimension],
  );

  function show() {
    if (!dimension) return;
    const current = unitOptions(text, dimension).findIndex((o) => o.current);
    setActive(Math.max(0, current));
    setOpen(true);
  }

  function choose(index: number) {
    const option = options[index];
    setOpen(false);
    if (option?.text && !option.current) onChoose(option.text);
  }

  function onKeyDown(event: KeyboardEvent<HTMLInputElement>) {
    if (!dimension) return;
    if (!open) {
      if (event.key === 'ArrowDown') {
        event.preventDefault();
        show();
      }
      return;
    }
    const last = options.length - 1;
    if (event.key === 'ArrowDown' && !event.altKey) {
      event.preventDefault();
      setActive((i) => Math.min(last, i + 1));
    } else if (event.key === 'ArrowUp' && !event.altKey) {
      event.preventDefault();
      setActive((i) => Math.max(0, i - 1));
    } else if (event.key === 'Enter') {
      event.preventDefault();
      choose(active);
    } else if (event.key === 'Escape' || (event.key === 'ArrowUp' && event.altKey)) {
      // Escape closes the list only, nothing around the field.
      event.preventDefault();
      event.stopPropagation();
      setOpen(false);
    } else if (event.key === 'Tab') {
      setOpen(false);
    }
  }

  return {
    open,
    options,
    active: Math.min(active, Math.max(0, options.length - 1)),
    setActive,
    show,
    close: () => setOpen(false),
    toggle: () => (open ? setOpen(false) : show()),
    choose,
    onKeyDown,
  };
}
