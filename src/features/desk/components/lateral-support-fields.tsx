import { Plus, Trash2 } from 'lucide-react';
import { useRef } from 'react';
import { useFormContext, useWatch } from 'react-hook-form';
import { parseQuantity } from '../../../../shared/engine/units';
import type { DesignDocument } from '../../../../shared/schemas/design';
import { Button } from '../../../components/ui/button';
import { Field, inputClass } from '../../../components/ui/field';
import { customaryUnit } from '../lib/field-units';
import { ChoiceField, NumberField } from './plain-fields';
import { QuantityField } from './quantity-field';

type LateralSupport = NonNullable<DesignDocument['member']['lateralSupport']>;

/**
 * The single unbraced length becomes braces when the person asks for detailed lateral support (the
 * engine refuses both at once): a length shorter than the member is taken as one bottom-flange brace
 * at that distance from the root. Going back gives the first brace back as the unbraced length.
 */
export function toDetailed(unbracedLength: string | undefined, length: string | undefined): LateralSupport {
  if (!unbracedLength) return {};
  const lb = parseQuantity(unbracedLength, 'length');
  const L = parseQuantity(length ?? '', 'length');
  if (lb.ok && L.ok && lb.value >= L.value) return {};
  return { braces: [unbracedLength] };
}

function BraceList() {
  const { control, getValues, setValue } = useFormContext<DesignDocument>();
  const braces = useWatch({ control, name: 'member.lateralSupport.braces' }) ?? [];
  const opts = { shouldDirty: true, shouldValidate: true } as const;

  function add() {
    const system = getValues('units') === 'SI' ? 'SI' : 'US';
    const unit = customaryUnit('member.lateralSupport.braces.0', system) ?? 'ft';
    setValue('member.lateralSupport.braces', [...braces, `0 ${unit}`], opts);
  }
  function remove(i: number) {
    const next = braces.filter((_, j) => j !== i);
    setValue('member.lateralSupport.braces', next.length ? next : undefined, opts);
  }

  return (
    <div className="flex flex-col gap-1">
      <div className="flex items-center justify-between">
        <h3 className="text-xs font-semibold uppercase tracking-wide text-concrete-600">
          Bottom-flange braces
        </h3>
        <Button size="sm" variant="ghost" onClick={add}>
          <Plus size={12} aria-hidden="true" /> Add brace
        </Button>
      </div>
      {braces.length === 0 ? (
        <p className="text-xs text-concrete-500">none: the bottom flange is unbraced from root to tip</p>
      ) : null}
      {braces.map((_, i) => (
        <div key={i} className="grid grid-cols-[1fr_auto] items-end gap-1.5">
          <QuantityField name={`member.lateralSupport.braces.${i}`} label={`Brace ${i + 1}, from the root`} />
          <Button
            size="sm"
            variant="ghost"
            onClick={() => remove(i)}
            aria-label={`Remove brace ${i + 1}`}
            className="mb-1"
          >
            <Trash2 size={14} aria-hidden="true" />
          </Button>
        </div>
      ))}
    </div>
  );
}

/**
 * How the member is held against lateral-torsional buckling: either one unbraced length (older
 * documents) or the detailed lateral support of the Version 2 keys; never both.
 */
export function LateralSupportFields() {
  const { control, getValues, setValue } = useFormContext<DesignDocument>();
  const detailed = useWatch({ control, name: 'member.lateralSupport' }) !== undefined;
  // The unbraced length as it was before the detailed form, for a length that gave no brace.
  const lastUnbraced = useRef<string | undefined>(undefined);

  function choose(next: boolean) {
    const opts = { shouldDirty: true, shouldValidate: true } as const;
    if (next === detailed) return;
    if (next) {
      lastUnbraced.current = getValues('member.unbracedLength');
      const ls = toDetailed(lastUnbraced.current, getValues('member.length'));
      setValue('member.unbracedLength', undefined, opts);
      setValue('member.lateralSupport', ls, opts);
    } else {
      const first = getValues('member.lateralSupport.braces')?.[0];
      const gaveNoBrace = !toDetailed(lastUnbraced.current, getValues('member.length')).braces;
      setValue('member.lateralSupport', undefined, opts);
      setValue('member.unbracedLength', first ?? (gaveNoBrace ? lastUnbraced.current : undefined), opts);
    }
  }

  return (
    <div className="flex flex-col gap-2 rounded bg-concrete-50 p-1.5">
      <Field
        id="lateral-support-kind"
        label="Lateral support"
        hint={
          detailed
            ? 'The single unbraced length is replaced by braces: a length given there is now a brace at that distance from the root.'
            : 'Detailed support adds the deck, the root, the tip and braces by distance from the root.'
        }
      >
        <select
          id="lateral-support-kind"
          value={detailed ? 'detailed' : 'simple'}
          onChange={(e) => choose(e.target.value === 'detailed')}
          className={inputClass(false)}
          aria-describedby="lateral-support-kind-hint"
        >
          <option value="simple">One unbraced length of the bottom flange</option>
          <option value="detailed">Deck, root, tip and braces</option>
        </select>
      </Field>
      {detailed ? (
        <>
          <div className="grid grid-cols-2 gap-2">
            <ChoiceField
              name="member.lateralSupport.topFlange"
              label="Top flange"
              fallback="braced"
              choices={[
                ['braced', 'Held by the deck'],
                ['free', 'Free (erection, open grating)'],
              ]}
            />
            <ChoiceField
              name="member.lateralSupport.loadAt"
              label="Gravity load applied at"
              fallback="top-flange"
              choices={[
                ['top-flange', 'The top flange'],
                ['shear-centre', 'The shear centre'],
              ]}
            />
            <ChoiceField
              name="member.lateralSupport.root"
              label="Root restraint"
              fallback="fixed"
              choices={[
                ['fixed', 'Built in (lateral, twist, warping)'],
                ['twist-only', 'Twist prevented only'],
              ]}
            />
            <ChoiceField
              name="member.lateralSupport.tip"
              label="Tip"
              fallback="free"
              choices={[
                ['free', 'Free'],
                ['braced', 'Braced (tip brace or edge member)'],
              ]}
            />
          </div>
          <BraceList />
          <NumberField
            name="member.lateralSupport.effectiveLengthFactor"
            label="Effective-length factor K, free-tip segment"
            optional
            step={0.05}
            hint="blank = the published cantilever factor (free top flange); 1.0 with the deck holding it"
          />
        </>
      ) : (
        <QuantityField
          name="member.unbracedLength"
          label="Unbraced length, bottom flange"
          optional
          hint="blank = the whole length (unbraced)"
        />
      )}
    </div>
  );
}
