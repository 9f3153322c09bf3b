import type { ShapeFamily, ShapeRecord } from '../../../../shared/engine/shapes/types';
import type { UnitSystem } from '../../../../shared/engine/units';
import {
  AXIS_WORDS,
  MAX_STEPS,
  axisUnit,
  shapesByWeight,
  type AxisKey,
  type AxisSpec,
} from '../../../../shared/study/axes';
import { Field, inputClass } from '../../../components/ui/field';

const KEYS: AxisKey[] = ['length', 'tipDepth', 'taperRatio', 'spacing', 'section'];
const FAMILIES: ShapeFamily[] = ['W', 'HSS', 'PIPE', 'C'];

export interface AxisDraft {
  key: AxisKey;
  from: string;
  to: string;
  steps: string;
  family: ShapeFamily;
  /** Section axis: the lightest and heaviest shape of the list (labels). */
  fromShape: string;
  toShape: string;
}

export function draftOf(spec: AxisSpec): AxisDraft {
  if (spec.key === 'section')
    return {
      key: 'section',
      from: '',
      to: '',
      steps: String(spec.shapes.length),
      family: 'W',
      fromShape: spec.shapes[0] ?? '',
      toShape: spec.shapes.at(-1) ?? '',
    };
  return {
    key: spec.key,
    from: String(spec.from),
    to: String(spec.to),
    steps: String(spec.steps),
    family: 'W',
    fromShape: '',
    toShape: '',
  };
}

/** The axis a draft describes; a section axis takes the shapes between the two chosen, by weight. */
export function specOf(d: AxisDraft, catalog: readonly ShapeRecord[]): AxisSpec {
  if (d.key !== 'section')
    return { key: d.key, from: Number(d.from), to: Number(d.to), steps: Number(d.steps) };
  const list = shapesByWeight(catalog, [d.family]).map((s) => s.label);
  const a = Math.max(0, list.indexOf(d.fromShape));
  const b = list.indexOf(d.toShape) >= 0 ? list.indexOf(d.toShape) : Math.min(list.length - 1, a + 19);
  return { key: 'section', shapes: list.slice(Math.min(a, b), Math.max(a, b) + 1) };
}

/** One axis: what varies, and its range and number of points (or the shapes, by weight). */
export function AxisFields({
  name,
  draft,
  onChange,
  units,
  catalog,
  errors,
}: {
  name: 'x' | 'y';
  draft: AxisDraft;
  onChange: (d: AxisDraft) => void;
  units: UnitSystem;
  catalog: readonly ShapeRecord[];
  errors: Record<string, string>;
}) {
  const id = (f: string) => `study-${name}-${f}`;
  const set = (patch: Partial<AxisDraft>) => onChange({ ...draft, ...patch });
  const unit = axisUnit(draft.key, units);
  const list = shapesByWeight(catalog, [draft.family]);
  return (
    <fieldset className="flex flex-col gap-2 rounded border border-concrete-300 bg-white p-3">
      <legend className="px-1 text-sm font-semibold">
        {name === 'x' ? 'Across (first axis)' : 'Up (second axis)'}
      </legend>
      <Field id={id('key')} label="Varies">
        <select
          id={id('key')}
          className={inputClass(Boolean(errors[`${name}.key`]))}
          value={draft.key}
          onChange={(e) => set({ key: e.target.value as AxisKey })}
        >
          {KEYS.map((k) => (
            <option key={k} value={k}>
              {AXIS_WORDS[k]}
            </option>
          ))}
        </select>
      </Field>
      {errors[`${name}.key`] ? (
        <p className="text-xs text-util-over" role="alert">
          {errors[`${name}.key`]}
        </p>
      ) : null}
      {draft.key === 'section' ? (
        <div className="grid grid-cols-3 gap-2">
          <Field id={id('family')} label="Family">
            <select
              id={id('family')}
              className={inputClass(false)}
              value={draft.family}
              onChange={(e) => set({ family: e.target.value as ShapeFamily, fromShape: '', toShape: '' })}
            >
              {FAMILIES.map((f) => (
                <option key={f}>{f}</option>
              ))}
            </select>
          </Field>
          <Field id={id('fromShape')} label="Lightest">
            <select
              id={id('fromShape')}
              className={inputClass(false)}
              value={draft.fromShape || list[0]?.label}
              onChange={(e) => set({ fromShape: e.target.value })}
            >
              {list.map((s) => (
                <option key={s.label} value={s.label}>{`${s.label} (${s.W} lb/ft)`}</option>
              ))}
            </select>
          </Field>
          <Field id={id('toShape')} label="Heaviest" error={errors[`${name}.shapes`]}>
            <select
              id={id('toShape')}
              className={inputClass(Boolean(errors[`${name}.shapes`]))}
              value={draft.toShape || list[Math.min(list.length - 1, 19)]?.label}
              onChange={(e) => set({ toShape: e.target.value })}
            >
              {list.map((s) => (
                <option key={s.label} value={s.label}>{`${s.label} (${s.W} lb/ft)`}</option>
              ))}
            </select>
          </Field>
        </div>
      ) : (
        <div className="grid grid-cols-3 gap-2">
          {(['from', 'to', 'steps'] as const).map((f) => (
            <Field
              key={f}
              id={id(f)}
              label={
                f === 'steps'
                  ? `Points (up to ${MAX_STEPS})`
                  : `${f === 'from' ? 'From' : 'To'}${unit ? ` (${unit})` : ''}`
              }
              error={errors[`${name}.${f}`]}
            >
              <input
                id={id(f)}
                inputMode="decimal"
                className={inputClass(Boolean(errors[`${name}.${f}`]))}
                value={draft[f]}
                onChange={(e) => set({ [f]: e.target.value })}
                aria-invalid={Boolean(errors[`${name}.${f}`])}
              />
            </Field>
          ))}
        </div>
      )}
    </fieldset>
  );
}
