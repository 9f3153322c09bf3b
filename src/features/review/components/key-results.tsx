import type { DesignResult } from '../../../../shared/engine/types';
import type { DesignDocument } from '../../../../shared/schemas/design';
import { formatQuantity, type Quantity } from '../../../../shared/engine/units';
import { displayCheck } from '../../../../shared/words/check-display';

function largest<T>(items: T[], value: (item: T) => number): T | undefined {
  return items.reduce<T | undefined>(
    (best, item) => (best === undefined || value(item) > value(best) ? item : best),
    undefined,
  );
}

function Item({
  term,
  value,
  detail,
}: {
  term: string;
  value: Quantity | string | null | undefined;
  detail?: string;
}) {
  return (
    <div className="rounded border border-concrete-200 bg-concrete-50 p-2">
      <dt className="text-xs text-concrete-600">{term}</dt>
      <dd className="font-mono text-base tabular-nums text-concrete-900">
        {value === null || value === undefined
          ? 'not available'
          : typeof value === 'string'
            ? value
            : formatQuantity(value)}
      </dd>
      {detail && <dd className="text-xs text-concrete-600">{detail}</dd>}
    </div>
  );
}

function serviceDetail(
  combination: string | null | undefined,
  limit: Quantity | null | undefined,
): string | undefined {
  if (!combination) return undefined;
  return limit ? `${combination}, unfactored; limit ${formatQuantity(limit)}` : `${combination}, unfactored`;
}

/** Root moment, tip deflection, frequency and the connection at the pier, as stored with the revision. */
export function KeyResults({ result, input }: { result: DesignResult; input: DesignDocument }) {
  const combos = result.member.combinations;
  const moment = largest(combos, (c) => c.rootMoment.value);
  // Deflection is a serviceability value: show the engine's own service checks (unfactored
  // ASD combinations), never the deflection under a factored strength combination.
  const total = result.checks.find((c) => c.id === 'member.deflection.total');
  const live = result.checks.find((c) => c.id === 'member.deflection.live');
  const connection = result.connection;
  const bearingCheck = result.checks.find((c) => c.id === 'plate.bearing');
  // In stress units, as the check list shows it (never as moments).
  const bearing = bearingCheck ? displayCheck(bearingCheck, connection) : undefined;
  return (
    <dl className="grid gap-2 sm:grid-cols-2 lg:grid-cols-4">
      <Item term="Root moment (largest combination)" value={moment?.rootMoment} detail={moment?.name} />
      <Item
        term="Tip deflection, live load (service)"
        value={live?.demand}
        detail={serviceDetail(live?.combination, live?.capacity)}
      />
      <Item
        term="Tip deflection, total load (service)"
        value={total?.demand}
        detail={serviceDetail(total?.combination, total?.capacity)}
      />
      <Item term="First natural frequency" value={result.member.frequency} />
      <Item
        term="Section"
        value={result.member.section.label}
        detail={`steel weight ${formatQuantity(result.member.steelWeight)}`}
      />
      {connection ? (
        <>
          <Item
            term="Connection"
            value={connection.arrangement === 'post-base' ? 'post on a base plate' : 'plate on the pier face'}
            detail={connection.combination}
          />
          <Item
            term="Anchor tension per rod"
            value={connection.anchorTensionPerRod}
            detail={`bearing length ${formatQuantity(connection.bearingLength)}`}
          />
          {bearing ? (
            <Item
              term="Concrete bearing under the plate"
              value={bearing.demand}
              detail={bearing.capacity ? `available ${formatQuantity(bearing.capacity)}` : undefined}
            />
          ) : null}
          <Item
            term="Plate thickness required"
            value={connection.requiredThickness}
            detail={`provided ${input.connection?.plate.thickness ?? 'not given'}`}
          />
        </>
      ) : (
        <Item term="Connection" value="not designed in this revision" />
      )}
    </dl>
  );
}
