/** Moves focus to a desk field by its name or issue path, opening the input group it sits in. */
import { fieldId } from '../components/field-context';
import { toFieldName } from './issue-paths';

export function focusField(path: string): boolean {
  const id = fieldId(toFieldName(path));
  // A problem on an object ("member.section") goes to its first field.
  const el =
    document.getElementById(id) ??
    document.querySelector<HTMLElement>(`[id^="${id}-"]:is(input, select, textarea, button)`);
  if (!el) return false;
  for (let d = el.closest('details'); d; d = d.parentElement?.closest('details') ?? null) d.open = true;
  el.scrollIntoView?.({ block: 'center' });
  el.focus();
  return document.activeElement === el;
}
