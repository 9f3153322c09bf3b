import { useDeferredValue, useId, useMemo, useState } from 'react';
import type { ShapeFamily } from '../../../shared/engine/shapes/types';
import { Button } from '../ui/button';
import { inputClass } from '../ui/field';
import { ErrorNote, Loading } from '../ui/status';
import { useShapes } from '../../lib/api/shapes/get-shapes';
import { filterShapes } from '../../lib/shape-filter';
import { ShapeDetail } from './shape-detail';
import { ShapesTable } from './shapes-table';

export interface ShapeAction {
  label: string;
  onUse: (shapeLabel: string) => void;
}

function depthValue(text: string): number | null {
  const n = Number(text);
  return text.trim() !== '' && Number.isFinite(n) && n >= 0 ? n : null;
}

/** Search, filter and inspect the shapes; optional actions ("use for member") for the chosen one. */
export function ShapesBrowser({
  actions = [],
  initial = null,
  projectId,
}: {
  actions?: ShapeAction[];
  initial?: string | null;
  /** Whose imported shapes to include (a project's own and the organisation's). */
  projectId?: number;
}) {
  const shapes = useShapes(projectId);
  const [q, setQ] = useState('');
  const [family, setFamily] = useState<ShapeFamily | ''>('');
  const [minDepth, setMin] = useState('');
  const [maxDepth, setMax] = useState('');
  const [selected, setSelected] = useState<string | null>(initial);
  const min = depthValue(minDepth);
  const max = depthValue(maxDepth);
  // One object per change of the filter (not per render): the rows keep their identity while a
  // key moves through the list, so only the rows whose state changes render again.
  const wanted = useMemo(() => ({ q, family, minDepth: min, maxDepth: max }), [q, family, min, max]);
  const filter = useDeferredValue(wanted);
  const rows = useMemo(() => filterShapes(shapes.data?.shapes ?? [], filter), [shapes.data, filter]);
  const chosen = shapes.data?.shapes.find((s) => s.label === selected) ?? null;
  const depthError = (t: string) => t.trim() !== '' && depthValue(t) === null;
  const keysId = useId();
  // Enter on a row does what the first action does (the one the picker was opened for).
  const primary = actions[0];

  if (shapes.isPending) return <Loading label="Loading shapes…" />;
  if (shapes.isError) return <ErrorNote error={shapes.error}>The shapes could not be loaded.</ErrorNote>;
  return (
    <div className="grid gap-3 lg:grid-cols-[1fr_18rem]">
      <div className="min-w-0">
        <div className="mb-2 grid grid-cols-2 gap-2 sm:grid-cols-4">
          <label className="flex flex-col text-xs text-concrete-700">
            Search by label
            <input
              type="search"
              value={q}
              onChange={(e) => setQ(e.target.value)}
              placeholder="e.g. W12"
              className={inputClass(false)}
              data-autofocus
            />
          </label>
          <label className="flex flex-col text-xs text-concrete-700">
            Family
            <select
              value={family}
              onChange={(e) => setFamily(e.target.value as ShapeFamily | '')}
              className={inputClass(false)}
            >
              <option value="">all</option>
              <option value="W">W</option>
              <option value="HSS">HSS</option>
              <option value="PIPE">Pipe</option>
              <option value="C">Channel</option>
            </select>
          </label>
          <label className="flex flex-col text-xs text-concrete-700">
            Depth from (in)
            <input
              inputMode="decimal"
              value={minDepth}
              onChange={(e) => setMin(e.target.value)}
              className={inputClass(depthError(minDepth))}
              aria-invalid={depthError(minDepth)}
            />
            {depthError(minDepth) ? (
              <span className="text-util-over">must be a number of inches, 0 or more</span>
            ) : null}
          </label>
          <label className="flex flex-col text-xs text-concrete-700">
            Depth to (in)
            <input
              inputMode="decimal"
              value={maxDepth}
              onChange={(e) => setMax(e.target.value)}
              className={inputClass(depthError(maxDepth))}
              aria-invalid={depthError(maxDepth)}
            />
            {depthError(maxDepth) ? (
              <span className="text-util-over">must be a number of inches, 0 or more</span>
            ) : null}
          </label>
        </div>
        <p className="num mb-1 text-xs text-concrete-600" role="status">
          {rows.length} of {shapes.data.shapes.length} shapes · {shapes.data.source}
        </p>
        <p id={keysId} className="sr-only">
          Arrow keys, Page Up, Page Down, Home and End move through the shapes; type the start of a label to
          jump to it; {primary ? `Enter: ${primary.label.toLowerCase()}.` : 'Enter shows its properties.'}
        </p>
        <div data-scroll className="max-h-[60vh] overflow-auto rounded border border-concrete-300 bg-white">
          <ShapesTable
            shapes={rows}
            selected={selected}
            onSelect={setSelected}
            onActivate={primary ? primary.onUse : undefined}
            describedBy={keysId}
          />
        </div>
      </div>
      <aside className="rounded-md border border-concrete-300 bg-white p-3" aria-label="Shape details">
        {chosen ? (
          <>
            <ShapeDetail shape={chosen} />
            {actions.length ? (
              <div className="mt-3 flex flex-col gap-2">
                {actions.map((a, i) => (
                  <Button
                    key={a.label}
                    variant={i === 0 ? 'primary' : 'secondary'}
                    onClick={() => a.onUse(chosen.label)}
                  >
                    {a.label}
                  </Button>
                ))}
              </div>
            ) : null}
          </>
        ) : (
          <p className="text-sm text-concrete-600">Choose a shape to see its properties.</p>
        )}
      </aside>
    </div>
  );
}
