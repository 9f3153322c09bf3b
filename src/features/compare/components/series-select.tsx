import { useId } from 'react';

/** A labelled choice of combination or load case for one chart. */
export function SeriesSelect({
  label,
  value,
  names,
  onChange,
}: {
  label: string;
  value: string;
  names: string[];
  onChange: (name: string) => void;
}) {
  const id = useId();
  return (
    <span className="inline-flex items-center gap-2">
      <label htmlFor={id} className="font-medium text-concrete-800">
        {label}
      </label>
      <select
        id={id}
        value={value}
        onChange={(e) => onChange(e.target.value)}
        className="rounded border border-concrete-300 bg-white px-2 py-1 focus-visible:ring-2 focus-visible:ring-oxide-500"
      >
        {names.map((n) => (
          <option key={n} value={n}>
            {n}
          </option>
        ))}
      </select>
    </span>
  );
}
