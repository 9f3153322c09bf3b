import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import type { z } from 'zod';
import { ROLES, createUserSchema } from '../../../../shared/schemas/api';
import { ApiError } from '../../../lib/api-client';
import { Button } from '../../../components/ui/button';
import { Field, describedBy, inputClass } from '../../../components/ui/field';
import { useCreateUser } from '../api/create-user';

type InviteInput = z.input<typeof createUserSchema>;
type InviteOutput = z.output<typeof createUserSchema>;
const FIELDS = ['email', 'displayName', 'role', 'password'] as const;

/**
 * Creates an account. The server mails the person a welcome with the sign-in address (never the
 * password); the admin passes the first password on another way, and the person must choose their
 * own at the first sign-in.
 */
export function InviteForm() {
  const create = useCreateUser();
  const [status, setStatus] = useState('');
  const [welcome, setWelcome] = useState('');
  const form = useForm<InviteInput, unknown, InviteOutput>({
    resolver: zodResolver(createUserSchema),
    defaultValues: { email: '', displayName: '', role: 'architect', password: '' },
  });
  const { errors } = form.formState;

  const onSubmit = form.handleSubmit(async (values) => {
    setStatus('');
    setWelcome('');
    try {
      const user = await create.mutateAsync(values);
      setStatus(`Account created for ${user.displayName} (${user.email}) as ${user.role}.`);
      setWelcome(
        'A welcome e-mail with the sign-in address is queued (the password is not in it): give the first password to the person yourself. They choose their own at the first sign-in.',
      );
      form.reset();
    } catch (error) {
      if (error instanceof ApiError) {
        for (const issue of error.issues) {
          const field = FIELDS.find((f) => f === issue.path);
          if (field) form.setError(field, { message: issue.message });
        }
      }
    }
  });

  const refused = create.error instanceof ApiError ? create.error : null;
  return (
    <form onSubmit={onSubmit} noValidate aria-label="Create an account" className="grid gap-3 sm:grid-cols-2">
      <Field id="invite-email" label="E-mail" error={errors.email?.message}>
        <input
          id="invite-email"
          type="email"
          autoComplete="off"
          className={inputClass(Boolean(errors.email))}
          {...describedBy('invite-email', errors.email?.message)}
          {...form.register('email')}
        />
      </Field>
      <Field id="invite-name" label="Name" error={errors.displayName?.message}>
        <input
          id="invite-name"
          autoComplete="off"
          className={inputClass(Boolean(errors.displayName))}
          {...describedBy('invite-name', errors.displayName?.message)}
          {...form.register('displayName')}
        />
      </Field>
      <Field id="invite-role" label="Role" error={errors.role?.message}>
        <select
          id="invite-role"
          className={inputClass(Boolean(errors.role))}
          {...describedBy('invite-role', errors.role?.message)}
          {...form.register('role')}
        >
          {ROLES.map((role) => (
            <option key={role} value={role}>
              {role}
            </option>
          ))}
        </select>
      </Field>
      <Field
        id="invite-password"
        label="First password"
        error={errors.password?.message}
        hint="At least 10 characters. It is not e-mailed; the person must replace it at the first sign-in."
      >
        <input
          id="invite-password"
          type="password"
          autoComplete="new-password"
          className={inputClass(Boolean(errors.password))}
          {...describedBy('invite-password', errors.password?.message, true)}
          {...form.register('password')}
        />
      </Field>
      <div className="flex flex-wrap items-center gap-3 sm:col-span-2">
        <Button type="submit" variant="primary" disabled={create.isPending}>
          {create.isPending ? 'Creating…' : 'Create account'}
        </Button>
        <p role="status" aria-live="polite" className="text-sm text-concrete-800">
          <span>{status}</span> {welcome ? <span className="text-concrete-700">{welcome}</span> : null}
        </p>
        {refused && refused.issues.length === 0 && (
          <p role="alert" className="text-sm text-util-over">
            {refused.status === 409
              ? `That e-mail already has an account. ${refused.message}`
              : refused.message}
          </p>
        )}
      </div>
    </form>
  );
}
