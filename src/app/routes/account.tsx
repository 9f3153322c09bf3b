import { ChangePasswordForm } from '../../features/auth/components/change-password-form';
import { useMe } from '../../lib/api/me/get-me';

/** The signed-in person's account: who they are and a new password. */
export default function AccountRoute() {
  const me = useMe();
  return (
    <section className="mx-auto flex max-w-3xl flex-col gap-4 p-4 sm:p-6">
      <div>
        <h1 className="text-xl font-semibold">Your account</h1>
        {me.data ? (
          <p className="text-sm text-concrete-600">
            {me.data.displayName}, {me.data.email} ({me.data.role})
          </p>
        ) : null}
      </div>
      <section
        aria-labelledby="password-title"
        className="rounded-md border border-concrete-300 bg-white p-3"
      >
        <h2 id="password-title" className="mb-2 text-sm font-semibold">
          Change your password
        </h2>
        <ChangePasswordForm />
      </section>
    </section>
  );
}
