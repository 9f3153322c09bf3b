import { useState } from 'react';
import type { CantileverDto } from '../../../../shared/schemas/api';
import { useUpdateCantileverQuantity } from '../api/update-cantilever';

/**
 * The number of identical beams a cantilever stands for: shown to everyone, changed in place by
 * the design roles (the server checks the role and the range and names the field when it refuses).
 */
export function QuantityCell({ cantilever, editable }: { cantilever: CantileverDto; editable: boolean }) {
  const [text, setText] = useState(String(cantilever.quantity));
  const update = useUpdateCantileverQuantity(cantilever.projectId, cantilever.id);
  if (!editable) return <span className="num">{cantilever.quantity}</span>;
  const value = Number(text);
  const changed = text.trim() !== '' && value !== cantilever.quantity;
  const id = `quantity-${cantilever.id}`;
  const problem =
    update.error?.message ??
    (text.trim() !== '' && !(Number.isInteger(value) && value >= 1)
      ? 'a whole number of beams, 1 or more'
      : null);
  return (
    <form
      className="flex items-center gap-1"
      onSubmit={(e) => {
        e.preventDefault();
        if (changed && !problem) update.mutate(value);
      }}
    >
      <label htmlFor={id} className="sr-only">
        Number of beams for {cantilever.name}
      </label>
      <input
        id={id}
        value={text}
        onChange={(e) => {
          update.reset();
          setText(e.target.value);
        }}
        inputMode="numeric"
        aria-invalid={problem ? true : undefined}
        aria-describedby={problem ? `${id}-error` : undefined}
        className="num w-14 rounded border border-concrete-400 px-1 py-0.5 text-sm"
      />
      {changed ? (
        <button
          type="submit"
          disabled={update.isPending || Boolean(problem)}
          className="rounded border border-oxide-700 px-1.5 py-0.5 text-xs font-medium text-oxide-700 disabled:opacity-50"
        >
          Set
        </button>
      ) : null}
      {problem ? (
        <span id={`${id}-error`} role="alert" className="text-xs text-util-over">
          {problem}
        </span>
      ) : null}
    </form>
  );
}
