import { useFormContext } from 'react-hook-form';
import { parseQuantity, convert, type UnitSystem } from '../../../../shared/engine/units';
import type { DesignDocument } from '../../../../shared/schemas/design';
import { Button } from '../../../components/ui/button';
import { customaryUnit } from '../lib/field-units';
import { LOAD_PRESETS, presetValueText, type LoadPreset } from '../lib/load-presets';
import { plainNumber, rewriteQuantity } from '../lib/quantity-text';
import { CheckField, Group, SelectField } from './plain-fields';
import { LoadList } from './load-list';
import { SeismicFields } from './seismic-fields';

/** Loads: self-weight, loads by case (area, line, point), presets with their source, the method. */
export function LoadsGroup({ disabled }: { disabled: boolean }) {
  const { getValues, setValue, watch } = useFormContext<DesignDocument>();
  const system: UnitSystem = watch('units') === 'SI' ? 'SI' : 'US';

  function addPreset(preset: LoadPreset) {
    const system = getValues('units') === 'SI' ? 'SI' : 'US';
    const length = getValues('member.length');
    const opts = { shouldDirty: true, shouldValidate: true } as const;
    if (preset.kind === 'area') {
      const unit = customaryUnit('loads.area.0.value', system) ?? 'psf';
      const value = rewriteQuantity(preset.value, 'areaLoad', unit) ?? preset.value;
      setValue('loads.area', [...(getValues('loads.area') ?? []), { case: preset.case, value }], opts);
      return;
    }
    const unit = customaryUnit('loads.point.0.value', system) ?? 'lbf';
    let value = rewriteQuantity(preset.value, 'force', unit) ?? preset.value;
    if (preset.perLength) {
      const spacing = parseQuantity(getValues('member.spacing') ?? '', 'length');
      const perLength = parseQuantity(preset.value, 'lineLoad');
      if (!spacing.ok || !perLength.ok) return;
      value = `${plainNumber(convert(perLength.value * spacing.value, 'kip', unit))} ${unit}`;
    }
    setValue(
      'loads.point',
      [...(getValues('loads.point') ?? []), { case: preset.case, value, at: length }],
      opts,
    );
  }

  return (
    <Group title="Loads" disabled={disabled} note="Your role may not change the loads.">
      <div className="grid grid-cols-2 items-end gap-2">
        <CheckField name="loads.selfWeight" label="Include self-weight of the steel" />
        <SelectField name="method" label="Combinations">
          <option value="LRFD">LRFD (ASCE 7 §2.3)</option>
          <option value="ASD">ASD (ASCE 7 §2.4)</option>
        </SelectField>
      </div>
      <LoadList kind="area" />
      <LoadList kind="line" />
      <LoadList kind="point" />
      <div className="mt-1 border-t border-concrete-200 pt-2">
        <h3 className="mb-1 text-xs font-semibold uppercase tracking-wide text-concrete-600">Seismic</h3>
        <SeismicFields />
      </div>
      <div className="mt-1 border-t border-concrete-200 pt-2">
        <h3 className="mb-1 text-xs font-semibold uppercase tracking-wide text-concrete-600">
          Common deck loads
        </h3>
        <ul className="flex flex-col gap-1">
          {LOAD_PRESETS.map((p) => (
            <li key={p.id} className="flex items-start justify-between gap-2 text-xs">
              <span>
                <span className="font-medium">
                  {p.label}, {presetValueText(p, system)}
                </span>{' '}
                <span className="text-concrete-500">({p.case})</span>
                <br />
                <span className="text-concrete-500">{p.source}</span>
              </span>
              <Button
                size="sm"
                onClick={() => addPreset(p)}
                aria-label={`Add preset: ${p.label}, ${presetValueText(p, system)}`}
              >
                Add
              </Button>
            </li>
          ))}
        </ul>
      </div>
    </Group>
  );
}
