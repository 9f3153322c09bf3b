import { useEffect } from 'react';
import { useQueryClient } from '@tanstack/react-query';
import { Navigate, Outlet, useLocation } from 'react-router-dom';
import { paths } from '../../../config/paths';
import { Button } from '../../../components/ui/button';
import { Loading, ErrorNote } from '../../../components/ui/status';
import { ApiError } from '../../../lib/api-client';
import { authKeys } from '../../../lib/api/me/auth-keys';
import { useMe } from '../../../lib/api/me/get-me';
import { useLogout } from '../../../lib/api/me/logout';
import { ChangePasswordForm } from './change-password-form';

/** The API's answer to an account that must choose its own password first. */
export const PASSWORD_CHANGE_REQUIRED = 'password_change_required';

/**
 * Whenever a request is refused with `password_change_required`, reads who is signed in again, so
 * the change-password form below takes over the page.
 */
function useRecheckOnPasswordGate(): void {
  const queryClient = useQueryClient();
  useEffect(() => {
    const recheck = (error: unknown) => {
      if (error instanceof ApiError && error.code === PASSWORD_CHANGE_REQUIRED)
        void queryClient.invalidateQueries({ queryKey: authKeys.me() });
    };
    const stopQueries = queryClient.getQueryCache().subscribe((event) => {
      if (event.type === 'updated' && event.action.type === 'error') recheck(event.action.error);
    });
    const stopMutations = queryClient.getMutationCache().subscribe((event) => {
      if (event.type === 'updated' && event.action.type === 'error') recheck(event.action.error);
    });
    return () => {
      stopQueries();
      stopMutations();
    };
  }, [queryClient]);
}

/** The first-password change: why it is asked, the form, and a way out. */
function FirstPasswordChange({ email }: { email: string }) {
  const logout = useLogout();
  return (
    <main id="main" className="mx-auto flex max-w-md flex-col gap-3 p-6">
      <h1 className="text-xl font-semibold">Choose a new password</h1>
      <p className="text-sm text-concrete-700">
        The password of {email} was set by an admin, for a new account or after a reset. Type it once more as
        the current password, then choose one that only you know; the rest of Reachline opens once it is
        changed.
      </p>
      <ChangePasswordForm />
      <Button
        variant="ghost"
        className="self-start"
        onClick={() => logout.mutate()}
        disabled={logout.isPending}
      >
        Sign out instead
      </Button>
    </main>
  );
}

/**
 * Sends signed-out people to the sign-in page, remembering where they were going; an account whose
 * password an admin set (a new account, a reset) is asked for a new one before anything else (the
 * API refuses everything else with `password_change_required`).
 */
export function RequireAuth() {
  const me = useMe();
  const location = useLocation();
  useRecheckOnPasswordGate();
  if (me.isPending) return <Loading label="Checking who is signed in…" />;
  if (me.isError) return <ErrorNote error={me.error}>Could not check the sign-in.</ErrorNote>;
  if (!me.data) {
    const next = `${location.pathname}${location.search}`;
    return <Navigate to={`${paths.signIn}?next=${encodeURIComponent(next)}`} replace />;
  }
  if (me.data.mustChangePassword) return <FirstPasswordChange email={me.data.email} />;
  return <Outlet />;
}
