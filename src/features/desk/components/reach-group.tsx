import { LateralSupportFields } from './lateral-support-fields';
import { QuantityField } from './quantity-field';
import { Group, NumberField } from './plain-fields';

/** Reach: how far the member reaches, how far apart, how much it may bend and bounce. */
export function ReachGroup({ disabled }: { disabled: boolean }) {
  return (
    <Group title="Reach" disabled={disabled} note="Your role may not change the member.">
      <div className="grid grid-cols-2 gap-2">
        <QuantityField name="member.length" label="Length (root to tip)" />
        <QuantityField name="member.spacing" label="Spacing" hint="tributary width" />
      </div>
      <LateralSupportFields />
      <div className="grid grid-cols-2 gap-2">
        <NumberField
          name="deflectionLimits.live"
          label="Live deflection limit, span /"
          hint="span = 2 × length"
        />
        <NumberField
          name="deflectionLimits.total"
          label="Total deflection limit, span /"
          hint="IBC Table 1604.3"
        />
      </div>
      <QuantityField
        name="frequencyMin"
        label="Lowest natural frequency"
        optional
        hint="blank = 5 Hz, below which EN 1990 Annex A2 asks for a walking-comfort check (footbridges)"
      />
    </Group>
  );
}
