import { useState } from 'react';
import type { DesignResult } from '../../../../shared/engine/types';
import { formatQuantity } from '../../../../shared/engine/units';

/**
 * Steel weight per beam and per deck (beams x weight) and the tip depth, on one line under the
 * verdict. The number of beams is not part of the design document: it is asked here and kept only
 * while the desk is open.
 */
export function SteelSummary({ result }: { result: DesignResult }) {
  const [beams, setBeams] = useState('');
  const n = Number(beams);
  const w = result.member.steelWeight;
  const valid = Number.isInteger(n) && n > 0 && n <= 500;
  const s = result.member.section;
  const camber = result.member.recommendedCamber;
  return (
    <p className="flex flex-wrap items-center gap-x-2 gap-y-1 text-sm" data-testid="steel-summary">
      <span>
        Steel{' '}
        <strong className="num" data-testid="steel-per-beam">
          {formatQuantity(w)}
        </strong>{' '}
        per beam
      </span>
      <span aria-hidden="true">·</span>
      <label className="flex items-center gap-1">
        beams in the deck
        <input
          value={beams}
          onChange={(e) => setBeams(e.target.value)}
          inputMode="numeric"
          className="w-14 rounded border border-concrete-300 px-1 py-0.5 text-sm"
          aria-describedby="steel-per-deck"
        />
      </label>
      <span id="steel-per-deck" className="num" data-testid="steel-per-deck">
        {valid
          ? `= ${formatQuantity({ value: w.value * n, unit: w.unit })} per deck`
          : beams
            ? '(a whole number, 1 to 500)'
            : ''}
      </span>
      <span aria-hidden="true">·</span>
      <span>
        tip depth{' '}
        <strong className="num" data-testid="summary-tip-depth">
          {formatQuantity(s.tipDepth)}
        </strong>
        {s.tipDepth.value < s.rootDepth.value ? ` (root ${formatQuantity(s.rootDepth)})` : ''}
      </span>
      {camber ? (
        <>
          <span aria-hidden="true">·</span>
          <span title={camber.basis}>
            recommended camber{' '}
            <strong className="num" data-testid="summary-camber">
              {formatQuantity({ value: camber.value, unit: camber.unit })}
            </strong>{' '}
            <span className="text-xs text-concrete-500">(for the dead load; no camber for live load)</span>
          </span>
        </>
      ) : null}
    </p>
  );
}
