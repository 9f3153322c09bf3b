import type { LegendItem } from '../../lib/plate-drawing';
import { paint } from './sketch-style';

/** The legend in words, each with its symbol (shape and pattern as well as colour). */
export function SketchLegend({ items, hatch }: { items: LegendItem[]; hatch: string }) {
  return (
    <ul aria-label="Legend" className="flex flex-wrap gap-x-5 gap-y-1 text-sm text-concrete-800">
      {items.map((item) => {
        const p = paint(item.symbol, hatch, hatch);
        return (
          <li key={item.symbol} className="flex items-center gap-2" data-legend={item.symbol}>
            <svg width="22" height="22" viewBox="-11 -11 22 22" aria-hidden="true" className="shrink-0">
              {item.symbol === 'washer' || item.symbol === 'bearing' ? (
                <rect data-role={item.symbol} x={-8} y={-8} width={16} height={16} {...p} />
              ) : (
                <circle data-role={item.symbol} r={item.symbol === 'warn-ring' ? 8 : 6} {...p} />
              )}
              {item.symbol === 'rod-compression' ? <circle r={2} fill="#28251f" /> : null}
            </svg>
            <span>{item.text}</span>
          </li>
        );
      })}
    </ul>
  );
}
