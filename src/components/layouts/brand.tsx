/** The Reachline mark: a pier and an oxide cantilever reaching off it. */
export function Brand({ compact = false }: { compact?: boolean }) {
  return (
    <span className="inline-flex items-center gap-2 font-semibold tracking-tight">
      <svg viewBox="0 0 32 32" width={compact ? 22 : 28} height={compact ? 22 : 28} aria-hidden="true">
        <rect width="32" height="32" rx="6" fill="#3d3935" />
        <rect x="4" y="9" width="5" height="19" fill="#a39b8f" />
        <path d="M9 9h19v3L9 15z" fill="#c8571b" />
      </svg>
      <span className={compact ? 'text-base' : 'text-lg'}>Reachline</span>
    </span>
  );
}

export const CAUTION_SHORT =
  'A design aid: final design, detailing and sealed calculations are by a licensed engineer under the locally adopted codes.';
