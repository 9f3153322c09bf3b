import { zodResolver } from '@hookform/resolvers/zod';
import { useForm } from 'react-hook-form';
import { createProjectSchema, DEFAULT_CODE_BASIS } from '../../../../shared/schemas/api';
import { Button } from '../../../components/ui/button';
import { Field, describedBy, inputClass } from '../../../components/ui/field';
import { useCreateProject, type CreateProjectBody } from '../api/create-project';

/** Name, site, code basis and units of a new project. */
export function CreateProjectForm({ onDone }: { onDone: (projectId: number) => void }) {
  const create = useCreateProject();
  const form = useForm<CreateProjectBody>({
    resolver: zodResolver(createProjectSchema),
    defaultValues: { name: '', site: '', codeBasis: DEFAULT_CODE_BASIS, units: 'US' },
  });
  const { errors } = form.formState;
  const submit = form.handleSubmit((values) => create.mutate(values, { onSuccess: (p) => onDone(p.id) }));
  return (
    <form onSubmit={submit} noValidate className="flex flex-col gap-3">
      <Field id="project-name" label="Name" error={errors.name?.message}>
        <input
          id="project-name"
          data-autofocus
          className={inputClass(Boolean(errors.name))}
          {...describedBy('project-name', errors.name?.message)}
          {...form.register('name')}
        />
      </Field>
      <Field id="project-site" label="Site" error={errors.site?.message}>
        <input id="project-site" className={inputClass(Boolean(errors.site))} {...form.register('site')} />
      </Field>
      <Field id="project-code" label="Code basis" error={errors.codeBasis?.message}>
        <input
          id="project-code"
          className={inputClass(Boolean(errors.codeBasis))}
          {...form.register('codeBasis')}
        />
      </Field>
      <Field id="project-units" label="Units">
        <select id="project-units" className={inputClass(false)} {...form.register('units')}>
          <option value="US">US customary</option>
          <option value="SI">SI (metric)</option>
        </select>
      </Field>
      {create.isError ? (
        <p role="alert" className="text-sm text-util-over">
          {create.error.message}
        </p>
      ) : null}
      <Button type="submit" variant="primary" disabled={create.isPending}>
        Create project
      </Button>
    </form>
  );
}
