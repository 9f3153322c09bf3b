import { useState } from 'react';
import type { ShapeFamily } from '../../../../shared/engine/shapes/types';
import { formatQuantity } from '../../../../shared/engine/units';
import type { LightestSections } from '../../../../shared/study/lightest-sections';
import { Button } from '../../../components/ui/button';

const FAMILIES: { key: ShapeFamily; label: string }[] = [
  { key: 'W', label: 'W' },
  { key: 'HSS', label: 'HSS' },
  { key: 'PIPE', label: 'Pipe' },
  { key: 'C', label: 'C' },
];
const SHOWN = 15;

export interface LightestState {
  status: 'idle' | 'running' | 'done' | 'invalid' | 'error';
  result: LightestSections | null;
  message: string | null;
}

/** Every shape of the chosen families at the desk's length, loads and connection, lightest passing first. */
export function LightestPanel({
  state,
  length,
  tapered,
  onFind,
  onUse,
  mayUse,
}: {
  state: LightestState;
  length: string;
  tapered: boolean;
  onFind: (families: ShapeFamily[]) => void;
  onUse: (shape: string, tipDepth: string | null) => void;
  mayUse: boolean;
}) {
  const [families, setFamilies] = useState<ShapeFamily[]>(['W', 'HSS', 'PIPE', 'C']);
  const [all, setAll] = useState(false);
  const r = state.result;
  const passing = r ? (all ? r.passing : r.passing.slice(0, SHOWN)) : [];
  return (
    <section aria-labelledby="lightest-title" className="rounded-md border border-concrete-300 bg-white p-3">
      <h2 id="lightest-title" className="text-sm font-semibold">
        Lightest sections that work
      </h2>
      <p className="text-xs text-concrete-600">
        Every shape of the chosen families at a length of {length}, with the desk&apos;s loads and connection,
        each a full design; ranked by steel weight.
        {tapered ? ' W shapes get the shallowest tip depth that passes (1/4 in or 5 mm steps).' : ''}
      </p>
      <div className="mt-2 flex flex-wrap items-center gap-3">
        <fieldset className="flex gap-3 text-sm">
          <legend className="sr-only">Families</legend>
          {FAMILIES.map((f) => (
            <label key={f.key} className="flex items-center gap-1">
              <input
                type="checkbox"
                checked={families.includes(f.key)}
                onChange={(e) =>
                  setFamilies((prev) =>
                    e.target.checked ? [...prev, f.key] : prev.filter((x) => x !== f.key),
                  )
                }
              />
              {f.label}
            </label>
          ))}
        </fieldset>
        <Button
          onClick={() => onFind(families)}
          disabled={families.length === 0 || state.status === 'running'}
        >
          {state.status === 'running' ? 'Checking every shape…' : 'Find lightest sections'}
        </Button>
      </div>
      {state.message ? (
        <p role="alert" className="mt-2 text-sm text-util-over">
          {state.message}
        </p>
      ) : null}
      {r ? (
        <>
          <p className="mt-2 text-sm" role="status">
            {r.passing.length} of {r.passing.length + r.failing.length} shapes pass
            {r.passing[0]
              ? `; the lightest is ${r.passing[0].shape} (${formatQuantity(r.passing[0].steelWeight)}).`
              : '.'}
          </p>
          <table
            className="mt-1 w-full border-collapse text-xs"
            data-testid="lightest-passing"
            aria-label="Passing shapes, lightest first"
          >
            <thead>
              <tr className="border-b border-concrete-300 text-left text-concrete-600">
                <th className="py-1 pr-2 font-medium">Shape</th>
                {tapered ? <th className="py-1 pr-2 text-right font-medium">Tip depth</th> : null}
                <th className="py-1 pr-2 text-right font-medium">Steel weight</th>
                <th className="py-1 pr-2 font-medium">Governing check</th>
                <th className="py-1 pr-2 text-right font-medium">Ratio</th>
                <th className="py-1 font-medium">
                  <span className="sr-only">Action</span>
                </th>
              </tr>
            </thead>
            <tbody>
              {passing.map((p) => (
                <tr key={p.shape} className="border-b border-concrete-200">
                  <td className="py-1 pr-2 font-medium">{p.shape}</td>
                  {tapered ? (
                    <td className="num py-1 pr-2 text-right">
                      {p.tipDepth ? formatQuantity(p.tipDepth) : '—'}
                    </td>
                  ) : null}
                  <td className="num py-1 pr-2 text-right">{formatQuantity(p.steelWeight)}</td>
                  <td className="py-1 pr-2">{p.governing.id}</td>
                  <td className="num py-1 pr-2 text-right">
                    {p.governing.ratio === null ? '—' : p.governing.ratio.toFixed(2)}
                  </td>
                  <td className="py-1">
                    {mayUse ? (
                      <Button
                        size="sm"
                        onClick={() =>
                          onUse(
                            p.shape,
                            p.tipDepth
                              ? `${Number(p.tipDepth.value.toPrecision(4))} ${p.tipDepth.unit}`
                              : null,
                          )
                        }
                        aria-label={`Use ${p.shape} in the desk`}
                      >
                        Use this
                      </Button>
                    ) : null}
                  </td>
                </tr>
              ))}
            </tbody>
          </table>
          {r.passing.length > SHOWN ? (
            <Button variant="ghost" size="sm" className="mt-1" onClick={() => setAll((v) => !v)}>
              {all ? `Show the lightest ${SHOWN}` : `Show all ${r.passing.length} passing shapes`}
            </Button>
          ) : null}
          <details className="mt-2 text-xs">
            <summary className="cursor-pointer text-concrete-700">
              {r.failing.length} shapes that do not pass, and why
            </summary>
            <ul className="mt-1 max-h-48 overflow-auto">
              {r.failing.map((f) => (
                <li key={f.shape} className="num">
                  {f.shape} ({formatQuantity(f.steelWeight)}): {f.failedBy}
                  {f.note ? `: ${f.note}` : ''}
                </li>
              ))}
            </ul>
          </details>
        </>
      ) : null}
    </section>
  );
}
