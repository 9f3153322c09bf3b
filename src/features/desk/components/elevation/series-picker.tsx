import { useId } from 'react';
import type { SeriesChoice } from '../../lib/chart-data';

const GROUPS = [
  { kind: 'combination', label: 'Combinations' },
  { kind: 'service', label: 'Service combinations of the deflection checks' },
  { kind: 'case', label: 'Load cases' },
] as const;

/** Which combination or case the elevation's diagrams show. */
export function SeriesPicker({
  choices,
  value,
  onChange,
}: {
  choices: SeriesChoice[];
  value: string;
  onChange: (key: string) => void;
}) {
  const id = useId();
  return (
    <div className="flex items-center gap-1 text-xs text-concrete-700">
      <label htmlFor={id}>Diagrams under</label>
      <select
        id={id}
        value={value}
        onChange={(e) => onChange(e.target.value)}
        className="max-w-full rounded border border-concrete-400 bg-white px-1 py-0.5 text-xs focus-visible:ring-2 focus-visible:ring-oxide-500"
      >
        {GROUPS.map((g) => {
          const inGroup = choices.filter((c) => c.kind === g.kind);
          return inGroup.length > 0 ? (
            <optgroup key={g.kind} label={g.label}>
              {inGroup.map((c) => (
                <option key={c.key} value={c.key}>
                  {c.label}
                </option>
              ))}
            </optgroup>
          ) : null;
        })}
      </select>
    </div>
  );
}
