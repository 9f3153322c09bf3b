import { RefreshCw } from 'lucide-react';
import { Button } from '../../components/ui/button';
import { useOutbox } from '../../features/admin/api/get-outbox';
import { AdminOnly } from '../../features/admin/components/admin-only';
import { OutboxTable } from '../../features/admin/components/outbox-table';
import { errorText } from '../../lib/error-text';

function OutboxScreen() {
  const outbox = useOutbox();
  return (
    <section
      aria-labelledby="outbox-list"
      className="space-y-2 rounded border border-concrete-200 bg-white p-4"
    >
      <div className="flex items-center justify-between">
        <h2 id="outbox-list" className="text-lg font-semibold text-concrete-900">
          E-mails
        </h2>
        <Button size="sm" onClick={() => outbox.refetch()} disabled={outbox.isFetching}>
          <RefreshCw aria-hidden="true" className="h-4 w-4" />
          {outbox.isFetching ? 'Refreshing…' : 'Refresh'}
        </Button>
      </div>
      {outbox.isPending && (
        <p role="status" className="text-sm text-concrete-600">
          Loading e-mails…
        </p>
      )}
      {outbox.isError && (
        <p role="alert" className="text-sm text-util-over">
          The outbox could not be loaded: {errorText(outbox.error)}
        </p>
      )}
      {outbox.data && <OutboxTable mails={outbox.data} />}
    </section>
  );
}

/** Outbox (admin): every e-mail the product sent, as the local fake captured it. */
export default function OutboxRoute() {
  return (
    <div className="mx-auto max-w-5xl space-y-4 p-4 sm:p-6">
      <h1 className="text-xl font-semibold text-concrete-900">Outbox</h1>
      <AdminOnly>
        <OutboxScreen />
      </AdminOnly>
    </div>
  );
}
