import { Navigate, Outlet, useLocation } from 'react-router-dom';
import { paths } from '../../../config/paths';
import { Loading, ErrorNote } from '../../../components/ui/status';
import { useMe } from '../../../lib/api/me/get-me';
import { ChangePasswordForm } from './change-password-form';

/**
 * Sends signed-out people to the sign-in page, remembering where they were going; after an admin
 * reset a password, asks for a new one before anything else (the API refuses everything else).
 */
export function RequireAuth() {
  const me = useMe();
  const location = useLocation();
  if (me.isPending) return <Loading label="Checking who is signed in…" />;
  if (me.isError) return <ErrorNote error={me.error}>Could not check the sign-in.</ErrorNote>;
  if (!me.data) {
    const next = `${location.pathname}${location.search}`;
    return <Navigate to={`${paths.signIn}?next=${encodeURIComponent(next)}`} replace />;
  }
  if (me.data.mustChangePassword) {
    return (
      <main id="main" className="mx-auto flex max-w-md flex-col gap-3 p-6">
        <h1 className="text-xl font-semibold">Choose a new password</h1>
        <p className="text-sm text-concrete-600">
          An admin reset the password of {me.data.email}. Type the password you were given, then one only you
          know.
        </p>
        <ChangePasswordForm />
      </main>
    );
  }
  return <Outlet />;
}
