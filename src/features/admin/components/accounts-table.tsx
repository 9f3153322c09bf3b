import { useState } from 'react';
import { UserCheck, UserX } from 'lucide-react';
import { ROLES, type Role, type UserDto } from '../../../../shared/schemas/api';
import { Button } from '../../../components/ui/button';
import { useUpdateUser, type UpdateUserBody } from '../api/update-user';
import { ScrollBox } from '../../../components/ui/scroll-box';
import { errorText } from '../../../lib/error-text';
import { ColumnHeads } from '../../../components/ui/column-heads';

const TEMP_ALPHABET = 'abcdefghjkmnpqrstuvwxyz23456789';

/** A random temporary password (four groups of four, about 79 bits) for an admin's reset. */
export function temporaryPassword(): string {
  const bytes = crypto.getRandomValues(new Uint8Array(16));
  const chars = [...bytes].map((b) => TEMP_ALPHABET[b % TEMP_ALPHABET.length]).join('');
  return chars.match(/.{4}/g)!.join('-');
}

/**
 * Every account with its role and whether it may sign in; change role, deactivate, reactivate,
 * reset a password (a temporary one shown once; the person must change it at the next sign-in).
 */
export function AccountsTable({ users, meId }: { users: UserDto[]; meId: number | undefined }) {
  const update = useUpdateUser();
  const [status, setStatus] = useState('');

  function change(user: UserDto, body: UpdateUserBody, done: string) {
    setStatus('');
    update.mutate({ userId: user.id, body }, { onSuccess: () => setStatus(done) });
  }

  return (
    <div className="space-y-2">
      <p role="status" aria-live="polite" className="text-sm text-concrete-800">
        {status}
      </p>
      {update.isError && (
        <p role="alert" className="text-sm text-util-over">
          The change was not saved: {errorText(update.error)}
        </p>
      )}
      <ScrollBox label="Accounts">
        <table className="w-full border-collapse text-sm">
          <caption className="sr-only">Accounts</caption>
          <ColumnHeads
            names={['Name', 'E-mail', 'Role', 'Status', <span className="sr-only">Actions</span>]}
          />
          <tbody>
            {users.map((user) => (
              <tr key={user.id} className="border-b border-concrete-100">
                <th scope="row" className="py-1 pr-3 text-left font-medium text-concrete-900">
                  {user.displayName}
                  {user.id === meId ? ' (you)' : ''}
                </th>
                <td className="py-1 pr-3 text-concrete-800">{user.email}</td>
                <td className="py-1 pr-3">
                  <label htmlFor={`role-${user.id}`} className="sr-only">
                    Role of {user.displayName}
                  </label>
                  <select
                    id={`role-${user.id}`}
                    value={user.role}
                    disabled={update.isPending || user.id === meId}
                    onChange={(e) =>
                      change(
                        user,
                        { role: e.target.value as Role },
                        `${user.displayName} is now ${e.target.value}.`,
                      )
                    }
                    className="rounded border border-concrete-300 bg-white px-2 py-0.5 focus-visible:ring-2 focus-visible:ring-oxide-500"
                  >
                    {ROLES.map((role) => (
                      <option key={role} value={role}>
                        {role}
                      </option>
                    ))}
                  </select>
                </td>
                <td className="py-1 pr-3">
                  {user.active ? (
                    <span className="inline-flex items-center gap-1 text-concrete-800 [&_svg]:text-util-calm">
                      <UserCheck aria-hidden="true" className="h-4 w-4" />
                      active
                    </span>
                  ) : (
                    <span className="inline-flex items-center gap-1 text-concrete-600">
                      <UserX aria-hidden="true" className="h-4 w-4" />
                      deactivated
                    </span>
                  )}
                  {user.mustChangePassword ? (
                    <span className="block text-xs text-concrete-600">first password not yet changed</span>
                  ) : null}
                </td>
                <td className="flex gap-1 py-1">
                  {user.id !== meId && (
                    <Button
                      size="sm"
                      variant="ghost"
                      disabled={update.isPending}
                      aria-label={`Reset password of ${user.displayName}`}
                      onClick={() => {
                        const password = temporaryPassword();
                        change(
                          user,
                          { password },
                          `Temporary password for ${user.displayName}: ${password} (shown once; they must choose a new one when they sign in).`,
                        );
                      }}
                    >
                      Reset password
                    </Button>
                  )}
                  {user.id !== meId && (
                    <Button
                      size="sm"
                      variant={user.active ? 'secondary' : 'ghost'}
                      disabled={update.isPending}
                      aria-label={`${user.active ? 'Deactivate' : 'Reactivate'} ${user.displayName}`}
                      onClick={() =>
                        change(
                          user,
                          { active: !user.active },
                          `${user.displayName} was ${user.active ? 'deactivated and can no longer sign in' : 'reactivated'}.`,
                        )
                      }
                    >
                      {user.active ? 'Deactivate' : 'Reactivate'}
                    </Button>
                  )}
                </td>
              </tr>
            ))}
          </tbody>
        </table>
      </ScrollBox>
    </div>
  );
}
