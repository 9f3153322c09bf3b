import { useId, useState } from 'react';
import { UserPlus } from 'lucide-react';
import { Button } from '../../../components/ui/button';
import { useMe } from '../../../lib/api/me/get-me';
import { useUsers } from '../api/get-users';
import { useProjectMembers } from '../api/get-project-members';
import { useAddMember, useRemoveMember } from '../api/change-members';
import { errorText } from '../../../lib/error-text';

/** The project's members, with adding (from the active accounts) and removing, for admins. */
export function ProjectMembersPanel({ projectId }: { projectId: number }) {
  const me = useMe();
  const isAdmin = me.data?.role === 'admin';
  const members = useProjectMembers(projectId);
  const users = useUsers(isAdmin);
  const add = useAddMember(projectId);
  const remove = useRemoveMember(projectId);
  const [pick, setPick] = useState('');
  const [status, setStatus] = useState('');
  const selectId = useId();

  if (!isAdmin) return null;
  if (members.isPending)
    return (
      <p role="status" className="text-sm text-concrete-600">
        Loading members…
      </p>
    );
  if (members.isError)
    return (
      <p role="alert" className="text-sm text-util-over">
        Members could not be loaded: {errorText(members.error)}
      </p>
    );

  const memberIds = new Set(members.data.map((m) => m.userId));
  const candidates = (users.data ?? []).filter((u) => u.active && !memberIds.has(u.id));
  const failure = add.error ?? remove.error;

  return (
    <section aria-label="Project members" className="space-y-2">
      <ul className="divide-y divide-concrete-100 text-sm">
        {members.data.map((m) => (
          <li key={m.userId} className="flex items-center justify-between gap-2 py-1">
            <span>
              <span className="font-medium text-concrete-900">{m.displayName}</span>{' '}
              <span className="text-concrete-600">
                {m.email} · {m.role}
              </span>
            </span>
            <Button
              size="sm"
              variant="ghost"
              disabled={remove.isPending}
              aria-label={`Remove ${m.displayName}`}
              onClick={() =>
                remove.mutate(m.userId, {
                  onSuccess: () => setStatus(`${m.displayName} was removed from the project.`),
                })
              }
            >
              Remove
            </Button>
          </li>
        ))}
        {members.data.length === 0 && <li className="py-1 text-concrete-600">No members yet.</li>}
      </ul>
      <form
        className="flex flex-wrap items-end gap-2"
        onSubmit={(e) => {
          e.preventDefault();
          const user = candidates.find((u) => String(u.id) === pick);
          if (!user) return;
          add.mutate(user.id, {
            onSuccess: () => {
              setPick('');
              setStatus(`${user.displayName} was added to the project.`);
            },
          });
        }}
      >
        <div className="flex flex-col gap-0.5">
          <label htmlFor={selectId} className="text-xs font-medium text-concrete-700">
            Add an account
          </label>
          <select
            id={selectId}
            value={pick}
            onChange={(e) => setPick(e.target.value)}
            className="rounded border border-concrete-300 bg-white px-2 py-1 text-sm"
          >
            <option value="">
              {candidates.length ? 'Choose an account…' : 'Every active account is a member'}
            </option>
            {candidates.map((u) => (
              <option key={u.id} value={u.id}>
                {u.displayName} ({u.role}, {u.email})
              </option>
            ))}
          </select>
        </div>
        <Button type="submit" size="sm" disabled={!pick || add.isPending}>
          <UserPlus aria-hidden="true" className="h-4 w-4" />
          Add member
        </Button>
      </form>
      <p role="status" aria-live="polite" className="text-sm text-concrete-800">
        {status}
      </p>
      {failure && (
        <p role="alert" className="text-sm text-util-over">
          The change was not saved: {errorText(failure)}
        </p>
      )}
    </section>
  );
}
