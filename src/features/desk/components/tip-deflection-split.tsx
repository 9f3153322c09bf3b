import type { DesignResult } from '../../../../shared/engine/types';
import { formatQuantity } from '../../../../shared/engine/units';

/**
 * The tip deflection of the governing service combination split into the member's own bending and
 * the movement from the root's rotation with the connection, as a stacked bar with the numbers in
 * words (the bar's colours are never the only way to read it).
 */
export function TipDeflectionSplit({ result }: { result: DesignResult }) {
  const parts = result.member.tipDeflectionParts;
  if (!parts) return null;
  const member = Math.abs(parts.member.value);
  const connection = Math.abs(parts.connection.value);
  const total = member + connection;
  const share = (v: number) => (total > 0 ? Math.round((100 * v) / total) : 0);
  const totalText = formatQuantity({
    value: parts.member.value + parts.connection.value,
    unit: parts.member.unit,
  });
  const raw = result.connection?.rootRotation as { value?: unknown } | undefined;
  const rotation = typeof raw?.value === 'number' && Number.isFinite(raw.value) ? raw.value : null;
  return (
    <figure
      aria-label="Tip deflection: member and connection"
      className="flex flex-col gap-1"
      data-testid="tip-split"
    >
      <figcaption className="text-xs font-medium text-concrete-700">
        Tip deflection {totalText}, from the combination that governs the total deflection
      </figcaption>
      <div
        className="flex h-3 w-full overflow-hidden rounded border border-concrete-300 bg-concrete-100"
        aria-hidden="true"
      >
        <div
          className="h-full bg-[#5b8a72]"
          style={{ width: `${share(member)}%` }}
          data-testid="tip-split-member"
        />
        <div
          className="h-full bg-[repeating-linear-gradient(45deg,#c8571b_0_3px,#e9a27a_3px_6px)]"
          style={{ width: `${share(connection)}%` }}
          data-testid="tip-split-connection"
        />
      </div>
      <ul className="text-xs text-concrete-700">
        <li>
          <span className="mr-1 inline-block h-2 w-2 rounded-sm bg-[#5b8a72]" aria-hidden="true" />
          Member bending <span className="num">{formatQuantity(parts.member)}</span> ({share(member)} %)
        </li>
        <li>
          <span className="mr-1 inline-block h-2 w-2 rounded-sm bg-[#c8571b]" aria-hidden="true" />
          Connection rotation <span className="num">{formatQuantity(parts.connection)}</span> (
          {share(connection)} %)
          {rotation !== null ? (
            <>
              {' '}
              (root turns <span className="num">{rotation.toPrecision(3)} rad</span>)
            </>
          ) : null}
        </li>
      </ul>
    </figure>
  );
}
