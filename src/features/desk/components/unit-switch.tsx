import type { UnitSystem } from '../../../../shared/engine/units';

/** US / SI for the whole desk: a two-button radio group. */
export function UnitSwitch({ value, onChange }: { value: UnitSystem; onChange: (next: UnitSystem) => void }) {
  return (
    <div
      role="radiogroup"
      aria-label="Units"
      className="inline-flex overflow-hidden rounded border border-concrete-300 text-xs"
    >
      {(['US', 'SI'] as const).map((system) => (
        <button
          key={system}
          type="button"
          role="radio"
          aria-checked={value === system}
          onClick={() => value !== system && onChange(system)}
          className={`px-2 py-1 font-medium ${value === system ? 'bg-concrete-800 text-white' : 'bg-white text-concrete-700 hover:bg-concrete-100'}`}
        >
          {system}
        </button>
      ))}
    </div>
  );
}
