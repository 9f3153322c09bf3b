import { Trash2, Plus } from 'lucide-react';
import { useFieldArray, useFormContext } from 'react-hook-form';
import { LOAD_CASES } from '../../../../shared/schemas/member';
import type { DesignDocument } from '../../../../shared/schemas/design';
import { Button } from '../../../components/ui/button';
import { customaryUnit } from '../lib/field-units';
import { QuantityField } from './quantity-field';
import { SelectField } from './plain-fields';

type Kind = 'area' | 'line' | 'point';

const TITLES: Record<Kind, string> = { area: 'Area loads', line: 'Line loads', point: 'Point loads' };
/** What each case letter stands for, in the choices. */
const CASE_WORDS: Record<(typeof LOAD_CASES)[number], string> = {
  D: 'D, dead',
  L: 'L, live',
  Lr: 'Lr, roof live',
  S: 'S, snow',
  W: 'W, wind (− lifts)',
};

const NOUN: Record<Kind, string> = { area: 'area load', line: 'line load', point: 'point load' };

/** One kind of load by case, each row with its own remove button. */
export function LoadList({ kind }: { kind: Kind }) {
  const { control, getValues } = useFormContext<DesignDocument>();
  const { fields, append, remove } = useFieldArray({ control, name: `loads.${kind}` as 'loads.area' });
  const system = getValues('units') === 'SI' ? 'SI' : 'US';

  function add() {
    const value = `0 ${customaryUnit(`loads.${kind}.0.value`, system)}`;
    const row =
      kind === 'point' ? { case: 'L', value, at: getValues('member.length') } : { case: 'L', value };
    append(row as never);
  }

  return (
    <div className="flex flex-col gap-1.5">
      <div className="flex items-center justify-between">
        <h3 className="text-xs font-semibold uppercase tracking-wide text-concrete-600">{TITLES[kind]}</h3>
        <Button size="sm" variant="ghost" onClick={add}>
          <Plus size={12} aria-hidden="true" /> Add {NOUN[kind]}
        </Button>
      </div>
      {fields.length === 0 ? <p className="text-xs text-concrete-500">none</p> : null}
      {fields.length > 0 && kind === 'area' ? (
        <p className="text-[11px] text-concrete-500">
          Case W is wind on the deck: a negative value is net uplift (the tip is lifted); other cases are
          downward and not negative.
        </p>
      ) : null}
      {fields.map((row, i) => (
        <div
          key={row.id}
          className="grid grid-cols-[6.5rem_1fr_auto] items-end gap-1.5 rounded bg-concrete-50 p-1.5"
        >
          <SelectField name={`loads.${kind}.${i}.case`} label="Case" deps={[`loads.${kind}.${i}.value`]}>
            {LOAD_CASES.map((c) => (
              <option key={c} value={c}>
                {CASE_WORDS[c]}
              </option>
            ))}
          </SelectField>
          <QuantityField name={`loads.${kind}.${i}.value`} label={kind === 'point' ? 'Force' : 'Value'} />
          <Button
            size="sm"
            variant="ghost"
            onClick={() => remove(i)}
            aria-label={`Remove ${NOUN[kind]} ${i + 1}`}
            className="mb-1"
          >
            <Trash2 size={14} aria-hidden="true" />
          </Button>
          {kind === 'point' ? (
            <QuantityField name={`loads.point.${i}.at`} label="At, from the root" className="col-start-2" />
          ) : null}
        </div>
      ))}
    </div>
  );
}
