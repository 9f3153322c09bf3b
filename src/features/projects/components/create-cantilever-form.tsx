import type { z } from 'zod';
import { zodResolver } from '@hookform/resolvers/zod';
import { useForm } from 'react-hook-form';
import { Button } from '../../../components/ui/button';
import { Field, describedBy, inputClass } from '../../../components/ui/field';
import { createCantileverSchema } from '../../../../shared/schemas/api';
import { useCreateCantilever } from '../api/create-cantilever';

/** The server's own schema, without the optional first design (the desk's example is used). */
const formSchema = createCantileverSchema.pick({ name: true, description: true });

/** A new cantilever; its first design starts from the example on the desk. */
export function CreateCantileverForm({
  projectId,
  onDone,
}: {
  projectId: number;
  onDone: (cantileverId: number) => void;
}) {
  const create = useCreateCantilever(projectId);
  const form = useForm<z.input<typeof formSchema>, unknown, z.output<typeof formSchema>>({
    resolver: zodResolver(formSchema),
    defaultValues: { name: '', description: '' },
  });
  const { errors } = form.formState;
  const submit = form.handleSubmit((values) => create.mutate(values, { onSuccess: (c) => onDone(c.id) }));
  return (
    <form onSubmit={submit} noValidate className="flex flex-col gap-3">
      <Field
        id="cantilever-name"
        label="Name"
        error={errors.name?.message}
        hint='e.g. "north deck, typical beam"'
      >
        <input
          id="cantilever-name"
          data-autofocus
          className={inputClass(Boolean(errors.name))}
          {...describedBy('cantilever-name', errors.name?.message, true)}
          {...form.register('name')}
        />
      </Field>
      <Field id="cantilever-description" label="Description" error={errors.description?.message}>
        <textarea
          id="cantilever-description"
          rows={2}
          className={inputClass(Boolean(errors.description))}
          {...form.register('description')}
        />
      </Field>
      {create.isError ? (
        <p role="alert" className="text-sm text-util-over">
          {create.error.message}
        </p>
      ) : null}
      <Button type="submit" variant="primary" disabled={create.isPending}>
        Create cantilever
      </Button>
    </form>
  );
}
