import { formatRatio } from '../../lib/format';

/** A ratio with its verdict word; colour follows the word, never replaces it. */
export function RatioCell({ ratio, ok }: { ratio: number | null; ok: boolean | null }) {
  if (ok === null) return <span className="text-concrete-600">not checked</span>;
  const computed = ratio !== null && Number.isFinite(ratio);
  const passed = computed && ok;
  return (
    <span
      className={`whitespace-nowrap font-mono tabular-nums ${passed ? 'text-concrete-900' : 'font-semibold text-util-over'}`}
    >
      {formatRatio(ratio)} <span className="font-sans text-xs">{passed ? 'pass' : 'fail'}</span>
    </span>
  );
}
