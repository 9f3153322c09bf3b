import { useController, useFormContext, useWatch } from 'react-hook-form';
import type { DesignDocument } from '../../../../shared/schemas/design';
import { QuantityInput } from './quantity-field';
import { SelectField, SwitchField, useFieldError } from './plain-fields';

/**
 * A quantity that is the only required key of an optional object (`connection.post.height`,
 * `connection.weld.size`): blank leaves the whole object out, so the engine's default applies.
 */
function ObjectQuantityField({
  object,
  keyName,
  label,
  hint,
}: {
  object: 'connection.post' | 'connection.weld';
  keyName: 'height' | 'size';
  label: string;
  hint: string;
}) {
  const { control } = useFormContext<DesignDocument>();
  const {
    field: { value, onChange, onBlur, ref },
  } = useController({ control, name: object });
  const name = `${object}.${keyName}`;
  const keyError = useFieldError(name);
  const objectError = useFieldError(object);
  const current = value as Record<string, unknown> | undefined;
  const text = typeof current?.[keyName] === 'string' ? (current[keyName] as string) : '';
  return (
    <QuantityInput
      name={name}
      label={label}
      hint={hint}
      optional
      text={text}
      error={keyError ?? objectError}
      onBlur={onBlur}
      inputRef={ref}
      onText={(next) => onChange(next === undefined ? undefined : { ...current, [keyName]: next })}
    />
  );
}

/** The post, the weld at the plate and whether the root rotates with the connection. */
export function RootFields() {
  const { control } = useFormContext<DesignDocument>();
  const arrangement = useWatch({ control, name: 'connection.arrangement' });
  const post = useWatch({ control, name: 'connection.post' });
  const weld = useWatch({ control, name: 'connection.weld' });
  return (
    <>
      <h3 className="text-xs font-semibold uppercase tracking-wide text-concrete-600">Post, weld and root</h3>
      <div className="grid grid-cols-2 gap-2">
        {arrangement !== 'face-plate' || post ? (
          <ObjectQuantityField
            object="connection.post"
            keyName="height"
            label="Post height"
            hint="post base only: top of plate to the beam's centreline; needs the footprint (the post's section); blank = no post"
          />
        ) : null}
        <ObjectQuantityField
          object="connection.weld"
          keyName="size"
          label="Fillet weld size"
          hint="all around the member (or post) at the plate; blank = welds not checked"
        />
        {weld ? (
          <SelectField name="connection.weld.electrode" label="Electrode">
            <option value="E70">E70 (70 ksi)</option>
            <option value="E80">E80 (80 ksi)</option>
          </SelectField>
        ) : null}
      </div>
      <SwitchField
        name="connection.flexibleRoot"
        label="Root rotates with the connection (rod stretch, plate, post)"
        fallback
      />
      <p className="-mt-1 text-[11px] text-concrete-500">
        Ticked (the default), the tip deflection and the frequency include the root's rotation; unticked, the
        root is taken as rigid.
      </p>
    </>
  );
}
