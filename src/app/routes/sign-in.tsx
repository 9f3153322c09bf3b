import { Navigate, useNavigate, useSearchParams } from 'react-router-dom';
import { paths } from '../../config/paths';
import { useMe } from '../../lib/api/me/get-me';
import { SignInForm } from '../../features/auth/components/sign-in-form';
import { CAUTION_SHORT } from '../../components/layouts/brand';
import { Brand } from '../../components/layouts/brand';

/** Only same-site paths are followed after sign-in. */
function safeNext(next: string | null): string {
  return next && next.startsWith('/') && !next.startsWith('//') ? next : paths.projects;
}

export default function SignInRoute() {
  const [params] = useSearchParams();
  const navigate = useNavigate();
  const me = useMe();
  const next = safeNext(params.get('next'));
  if (me.data) return <Navigate to={next} replace />;
  return (
    <main className="grid min-h-screen place-items-center bg-concrete-100 p-4">
      <div className="w-full max-w-sm rounded-md border border-concrete-300 bg-concrete-50 p-6 shadow-sm">
        <Brand />
        <h1 className="mt-4 mb-1 text-lg font-semibold">Sign in</h1>
        <p className="mb-4 text-sm text-concrete-600">
          Reach, plate and pier in one place for the whole team.
        </p>
        <SignInForm onSignedIn={() => navigate(next, { replace: true })} />
        <p className="mt-6 border-t border-concrete-200 pt-3 text-[11px] text-concrete-500">
          {CAUTION_SHORT}
        </p>
      </div>
    </main>
  );
}
