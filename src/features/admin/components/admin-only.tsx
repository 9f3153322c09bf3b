import type { ReactNode } from 'react';
import { Lock } from 'lucide-react';
import { useMe } from '../../../lib/api/me/get-me';

/** Renders its children for admins only; others read why the page is closed to them. */
export function AdminOnly({ children }: { children: ReactNode }) {
  const me = useMe();
  if (me.isPending)
    return (
      <p role="status" className="text-sm text-concrete-600">
        Checking your role…
      </p>
    );
  if (me.data?.role !== 'admin') {
    return (
      <p className="flex items-center gap-2 text-sm text-concrete-700">
        <Lock aria-hidden="true" className="h-4 w-4" />
        Only an admin manages accounts, members and the outbox.
      </p>
    );
  }
  return <>{children}</>;
}
