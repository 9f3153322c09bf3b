import type { DesignResult } from '../../../../shared/engine/types';
import { formatQuantity } from '../../../../shared/engine/units';

/**
 * Steel weight per beam and per deck (the cantilever's number of identical beams x the weight)
 * and the tip depth, on one line under the verdict. Without a known number of beams (a stored
 * revision shown on its own) only the weight per beam is given.
 */
export function SteelSummary({ result, beams }: { result: DesignResult; beams?: number }) {
  const w = result.member.steelWeight;
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
      {beams !== undefined && beams > 0 ? (
        <>
          <span aria-hidden="true">·</span>
          <span className="num" data-testid="steel-per-deck">
            {beams} {beams === 1 ? 'beam' : 'beams'} in the deck ={' '}
            <strong>{formatQuantity({ value: w.value * beams, unit: w.unit })}</strong> per deck
          </span>
        </>
      ) : null}
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
