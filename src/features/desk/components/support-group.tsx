import { BookOpen } from 'lucide-react';
import { useRef } from 'react';
import { useController, useFormContext, useWatch } from 'react-hook-form';
import { ANCHOR_GRADES } from '../../../../shared/schemas/connection';
import type { DesignDocument } from '../../../../shared/schemas/design';
import { Button } from '../../../components/ui/button';
import { Field, describedBy, inputClass } from '../../../components/ui/field';
import { DEFAULT_CONNECTION } from '../lib/default-connection';
import { switchUnits } from '../lib/switch-units';
import { fieldId } from './field-context';
import { QuantityField } from './quantity-field';
import { RootFields } from './root-fields';
import { CheckField, Group, NumberField, SelectField, useFieldError } from './plain-fields';

type Arrangement = 'post-base' | 'face-plate' | 'none';

/** The footprint is optional as a whole: blank means "the member's own section at the root". */
function FootprintField({ onBrowse }: { onBrowse: () => void }) {
  const { control } = useFormContext<DesignDocument>();
  const {
    field: { value: footprint, onChange, onBlur, ref },
  } = useController({ control, name: 'connection.footprint' });
  const shapeError = useFieldError('connection.footprint.shape');
  const objectError = useFieldError('connection.footprint');
  const error = shapeError ?? objectError;
  const id = fieldId('connection.footprint.shape');
  const value = (footprint as { shape?: string } | undefined)?.shape ?? '';
  return (
    <div className="flex items-end gap-2">
      <Field
        id={id}
        label="Footprint on the plate"
        error={error}
        hint="blank = the member at the root"
        className="flex-1"
      >
        <input
          id={id}
          value={value}
          ref={ref}
          onBlur={onBlur}
          autoComplete="off"
          spellCheck={false}
          onChange={(e) => onChange(e.target.value.trim() ? { shape: e.target.value } : undefined)}
          className={inputClass(Boolean(error), 'font-mono uppercase')}
          {...describedBy(id, error, true)}
        />
      </Field>
      <Button onClick={onBrowse} aria-label="Browse shapes for the post footprint" className="mb-4">
        <BookOpen size={14} aria-hidden="true" /> Browse
      </Button>
    </div>
  );
}

/** Support: how the member is held at the pier: plate, rods, concrete and pier, or no connection. */
export function SupportGroup({ disabled, onBrowse }: { disabled: boolean; onBrowse: () => void }) {
  const { control, setValue, getValues } = useFormContext<DesignDocument>();
  const arrangement = useWatch({ control, name: 'connection.arrangement' });
  const hasConnection = useWatch({ control, name: 'connection' }) !== undefined;
  const current: Arrangement = hasConnection ? (arrangement ?? 'post-base') : 'none';
  // The connection as it was before "no connection" was chosen, so switching back loses nothing typed.
  const lastConnection = useRef<DesignDocument['connection']>(undefined);

  function choose(next: Arrangement) {
    const opts = { shouldDirty: true, shouldValidate: true } as const;
    if (next === 'none') {
      lastConnection.current = getValues('connection');
      return setValue('connection', undefined, opts);
    }
    const existing = getValues('connection');
    if (existing) return setValue('connection.arrangement', next, opts);
    if (lastConnection.current)
      return setValue('connection', { ...lastConnection.current, arrangement: next }, opts);
    const system = getValues('units') === 'SI' ? 'SI' : 'US';
    const base = { ...DEFAULT_CONNECTION, arrangement: next };
    const converted = switchUnits(
      { member: { length: '1 ft', spacing: '1 ft', section: { shape: 'W12X26' } }, connection: base },
      system,
    ).doc;
    setValue('connection', converted.connection, opts);
  }

  return (
    <Group title="Support" disabled={disabled} note="Your role may not change the connection.">
      <Field id="support-arrangement" label="Held at the pier by">
        <select
          id="support-arrangement"
          value={current}
          onChange={(e) => choose(e.target.value as Arrangement)}
          className={inputClass(false)}
        >
          <option value="post-base">A post on a base plate on top of the pier</option>
          <option value="face-plate">An end plate on the face of the pier or wall</option>
          <option value="none">No connection (check the member only)</option>
        </select>
      </Field>
      {hasConnection ? (
        <>
          <FootprintField onBrowse={onBrowse} />
          <h3 className="text-xs font-semibold uppercase tracking-wide text-concrete-600">Base plate</h3>
          <div className="grid grid-cols-2 gap-2">
            <QuantityField name="connection.plate.N" label="N, along the moment" />
            <QuantityField name="connection.plate.B" label="B, across" />
            <QuantityField name="connection.plate.thickness" label="Thickness" />
            <QuantityField name="connection.plate.Fy" label="Plate Fy" />
          </div>
          <h3 className="text-xs font-semibold uppercase tracking-wide text-concrete-600">Anchor rods</h3>
          <div className="grid grid-cols-2 gap-2">
            <NumberField name="connection.anchors.perSide" label="Rods in each row" />
            <QuantityField name="connection.anchors.diameter" label="Rod diameter" />
            <SelectField name="connection.anchors.grade" label="Grade (ASTM F1554)">
              {ANCHOR_GRADES.map((g) => (
                <option key={g} value={g}>
                  {g.replace('F1554-', 'Grade ')}
                </option>
              ))}
            </SelectField>
            <QuantityField name="connection.anchors.embedment" label="Embedment hef" />
            <QuantityField name="connection.anchors.offset" label="Offset f, centre to row" />
            <QuantityField name="connection.anchors.gauge" label="Gauge, rod to rod" />
          </div>
          <h3 className="text-xs font-semibold uppercase tracking-wide text-concrete-600">Concrete pier</h3>
          <div className="grid grid-cols-2 gap-2">
            <QuantityField name="connection.concrete.fc" label="f'c" />
            <div className="flex items-end pb-1">
              <CheckField name="connection.concrete.cracked" label="Cracked concrete" />
            </div>
            <QuantityField name="connection.pier.length" label="Pier length, along N" />
            <QuantityField name="connection.pier.width" label="Pier width, along B" />
          </div>
          <RootFields />
        </>
      ) : null}
    </Group>
  );
}
