import { zodResolver } from '@hookform/resolvers/zod';
import { useEffect } from 'react';
import { useForm } from 'react-hook-form';
import { z } from 'zod';
import { changePasswordSchema } from '../../../../shared/schemas/auth';
import { Button } from '../../../components/ui/button';
import { Field, describedBy, inputClass } from '../../../components/ui/field';
import { ApiError } from '../../../lib/api-client';
import { useChangePassword } from '../api/change-password';

const formSchema = changePasswordSchema
  .extend({ repeatPassword: z.string() })
  .refine((v) => v.repeatPassword === v.newPassword, {
    path: ['repeatPassword'],
    message: 'does not match the new password',
  });
type FormValues = z.input<typeof formSchema>;
type Name = 'currentPassword' | 'newPassword' | 'repeatPassword';

/**
 * The current password, a new one twice. The server checks the strength (at least 10
 * characters, not easy to guess) and its field errors land next to the field. Other sessions of
 * the account end; this one stays signed in.
 */
export function ChangePasswordForm({ onChanged }: { onChanged?: () => void }) {
  const change = useChangePassword();
  const form = useForm<FormValues>({
    resolver: zodResolver(formSchema),
    defaultValues: { currentPassword: '', newPassword: '', repeatPassword: '' },
  });
  const { errors } = form.formState;

  useEffect(() => {
    if (!(change.error instanceof ApiError)) return;
    for (const issue of change.error.issues) {
      if (issue.path === 'currentPassword' || issue.path === 'newPassword')
        form.setError(issue.path, { message: issue.message });
    }
  }, [change.error, form]);

  const submit = form.handleSubmit(({ currentPassword, newPassword }) => {
    change.mutate(
      { currentPassword, newPassword },
      {
        onSuccess: () => {
          form.reset();
          onChanged?.();
        },
      },
    );
  });

  const field = (name: Name, label: string, autoComplete: string, hint?: string) => (
    <Field id={name} label={label} error={errors[name]?.message} hint={hint}>
      <input
        id={name}
        type="password"
        autoComplete={autoComplete}
        className={inputClass(Boolean(errors[name]))}
        {...describedBy(name, errors[name]?.message)}
        {...form.register(name)}
      />
    </Field>
  );

  const unplaced =
    change.error instanceof ApiError &&
    change.error.issues.some((i) => i.path === 'currentPassword' || i.path === 'newPassword')
      ? null
      : change.error?.message;
  return (
    <form onSubmit={submit} noValidate className="flex max-w-sm flex-col gap-3" aria-label="Change password">
      {field('currentPassword', 'Current password', 'current-password')}
      {field(
        'newPassword',
        'New password',
        'new-password',
        'At least 10 characters; a phrase of unrelated words is easy to remember and hard to guess.',
      )}
      {field('repeatPassword', 'New password again', 'new-password')}
      {unplaced ? (
        <p role="alert" className="text-sm text-util-over">
          {unplaced}
        </p>
      ) : null}
      {change.isSuccess ? (
        <p role="status" className="text-sm">
          Your password is changed; your other sessions were signed out.
        </p>
      ) : null}
      <Button type="submit" variant="primary" disabled={change.isPending}>
        {change.isPending ? 'Changing…' : 'Change password'}
      </Button>
    </form>
  );
}
