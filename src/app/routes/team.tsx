import { useMe } from '../../lib/api/me/get-me';
import { useUsers } from '../../features/admin/api/get-users';
import { AdminOnly } from '../../features/admin/components/admin-only';
import { AccountsTable } from '../../features/admin/components/accounts-table';
import { InviteForm } from '../../features/admin/components/invite-form';
import { errorText } from '../../lib/error-text';

function TeamScreen() {
  const users = useUsers();
  const me = useMe();
  return (
    <>
      <section aria-labelledby="team-accounts" className="rounded border border-concrete-200 bg-white p-4">
        <h2 id="team-accounts" className="mb-2 text-lg font-semibold text-concrete-900">
          Accounts
        </h2>
        {users.isPending && (
          <p role="status" className="text-sm text-concrete-600">
            Loading accounts…
          </p>
        )}
        {users.isError && (
          <p role="alert" className="text-sm text-util-over">
            Accounts could not be loaded: {errorText(users.error)}
          </p>
        )}
        {users.data && <AccountsTable users={users.data} meId={me.data?.id} />}
      </section>
      <section aria-labelledby="team-invite" className="rounded border border-concrete-200 bg-white p-4">
        <h2 id="team-invite" className="mb-2 text-lg font-semibold text-concrete-900">
          Create an account
        </h2>
        <InviteForm />
      </section>
    </>
  );
}

/** Team (admin): accounts, roles and who may sign in. */
export default function TeamRoute() {
  return (
    <div className="mx-auto max-w-5xl space-y-4 p-4 sm:p-6">
      <h1 className="text-xl font-semibold text-concrete-900">Team</h1>
      <AdminOnly>
        <TeamScreen />
      </AdminOnly>
    </div>
  );
}
