import { Navigate, Outlet, useLocation } from 'react-router-dom';
import { paths } from '../../../config/paths';
import { Loading, ErrorNote } from '../../../components/ui/status';
import { useMe } from '../../../lib/api/me/get-me';

/** Sends signed-out people to the sign-in page, remembering where they were going. */
export function RequireAuth() {
  const me = useMe();
  const location = useLocation();
  if (me.isPending) return <Loading label="Checking who is signed in…" />;
  if (me.isError) return <ErrorNote error={me.error}>Could not check the sign-in.</ErrorNote>;
  if (!me.data) {
    const next = `${location.pathname}${location.search}`;
    return <Navigate to={`${paths.signIn}?next=${encodeURIComponent(next)}`} replace />;
  }
  return <Outlet />;
}
