import { BookOpen } from 'lucide-react';
import { useFormContext, useWatch } from 'react-hook-form';
import type { DesignDocument } from '../../../../shared/schemas/design';
import { Button } from '../../../components/ui/button';
import { Field, inputClass } from '../../../components/ui/field';
import { QuantityField } from './quantity-field';
import { Group, useFieldError } from './plain-fields';
import { ShapeNameField } from './shape-name-field';

type Mode = 'catalog' | 'tapered' | 'plates';
type Section = DesignDocument['member']['section'];

function modeOf(section: Section | undefined): Mode {
  if (section?.plates) return 'plates';
  return section?.tipDepth !== undefined ? 'tapered' : 'catalog';
}

/** Starting values when the kind of section changes, in the document's unit system. */
function sectionFor(mode: Mode, from: Section | undefined, si: boolean): Section {
  const shape = from?.shape ?? 'W12X26';
  if (mode === 'catalog') return { shape };
  if (mode === 'tapered') return { shape, tipDepth: si ? '180 mm' : '7 in' };
  return {
    plates: si
      ? {
          rootDepth: '400 mm',
          tipDepth: '200 mm',
          flangeWidth: '150 mm',
          flangeThickness: '12 mm',
          webThickness: '6 mm',
        }
      : {
          rootDepth: '16 in',
          tipDepth: '8 in',
          flangeWidth: '6 in',
          flangeThickness: '0.5 in',
          webThickness: '0.25 in',
        },
  };
}

/** Section: a catalog shape, a rolled W with its web cut to a taper, or a built-up I from plates; the steel. */
export function SectionGroup({ disabled, onBrowse }: { disabled: boolean; onBrowse: () => void }) {
  const { control, setValue, getValues } = useFormContext<DesignDocument>();
  const section = useWatch({ control, name: 'member.section' });
  const mode = modeOf(section);
  const sectionError = useFieldError('member.section');

  function changeMode(next: Mode) {
    setValue('member.section', sectionFor(next, getValues('member.section'), getValues('units') === 'SI'), {
      shouldDirty: true,
      shouldValidate: true,
    });
  }

  return (
    <Group title="Section" disabled={disabled} note="Your role may not change the member.">
      <Field id="section-kind" label="Kind of section">
        <select
          id="section-kind"
          value={mode}
          onChange={(e) => changeMode(e.target.value as Mode)}
          className={inputClass(false)}
        >
          <option value="catalog">Catalog shape, same along the member</option>
          <option value="tapered">Rolled W, web cut to a taper</option>
          <option value="plates">Built-up I from plates, tapered</option>
        </select>
      </Field>
      {sectionError ? (
        <p role="alert" className="text-xs text-util-over">
          Section {sectionError}
        </p>
      ) : null}
      {mode !== 'plates' ? (
        <div className="flex items-end gap-2">
          <ShapeNameField name="member.section.shape" label="Shape" className="flex-1" />
          <Button onClick={onBrowse} aria-label="Browse shapes for the member">
            <BookOpen size={14} aria-hidden="true" /> Browse
          </Button>
        </div>
      ) : null}
      {mode === 'tapered' ? (
        <QuantityField
          name="member.section.tipDepth"
          label="Depth at the tip"
          hint="full depth at the root"
        />
      ) : null}
      {mode === 'plates' ? (
        <div className="grid grid-cols-2 gap-2">
          <QuantityField name="member.section.plates.rootDepth" label="Depth at the root" />
          <QuantityField name="member.section.plates.tipDepth" label="Depth at the tip" />
          <QuantityField name="member.section.plates.flangeWidth" label="Flange width" />
          <QuantityField name="member.section.plates.flangeThickness" label="Flange thickness" />
          <QuantityField name="member.section.plates.webThickness" label="Web thickness" />
        </div>
      ) : null}
      <div className="grid grid-cols-2 gap-2">
        <QuantityField
          name="member.steel.Fy"
          label="Steel Fy"
          optional
          hint="blank = A992 (W) / A500 Gr C (HSS)"
        />
        <QuantityField name="member.steel.E" label="Steel E" optional hint="blank = 29000 ksi" />
      </div>
    </Group>
  );
}
