import { zodResolver } from '@hookform/resolvers/zod';
import { useForm } from 'react-hook-form';
import { loginSchema } from '../../../../shared/schemas/auth';
import { ApiError } from '../../../lib/api-client';
import { Button } from '../../../components/ui/button';
import { Field, describedBy, inputClass } from '../../../components/ui/field';
import type { LoginBody } from '../../../../shared/schemas/auth';
import { useLogin } from '../api/login';

/** E-mail and password, with plain errors next to each field and one for a refused sign-in. */
export function SignInForm({ onSignedIn }: { onSignedIn: () => void }) {
  const login = useLogin();
  const form = useForm<LoginBody>({
    resolver: zodResolver(loginSchema),
    defaultValues: { email: '', password: '' },
  });
  const { errors } = form.formState;

  const submit = form.handleSubmit((values) => {
    login.mutate(values, { onSuccess: onSignedIn });
  });

  const refused = login.error instanceof ApiError && login.error.status === 401;
  return (
    <form onSubmit={submit} noValidate className="flex flex-col gap-3" aria-label="Sign in">
      <Field id="email" label="E-mail" error={errors.email?.message}>
        <input
          id="email"
          type="email"
          autoComplete="username"
          className={inputClass(Boolean(errors.email))}
          {...describedBy('email', errors.email?.message)}
          {...form.register('email')}
        />
      </Field>
      <Field id="password" label="Password" error={errors.password?.message}>
        <input
          id="password"
          type="password"
          autoComplete="current-password"
          className={inputClass(Boolean(errors.password))}
          {...describedBy('password', errors.password?.message)}
          {...form.register('password')}
        />
      </Field>
      {login.isError ? (
        <p role="alert" className="text-sm text-util-over">
          {refused ? 'That e-mail and password do not match an active account.' : login.error.message}
        </p>
      ) : null}
      <Button type="submit" variant="primary" disabled={login.isPending}>
        {login.isPending ? 'Signing in…' : 'Sign in'}
      </Button>
    </form>
  );
}
