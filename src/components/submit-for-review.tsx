import { Send } from 'lucide-react';
import { useState } from 'react';
import { useSubmitRevision } from '../lib/api/revisions/submit-revision';
import { errorText } from '../lib/error-text';

/**
 * Submits a saved draft for review, with an optional note to the reviewer, and then shows the
 * server's notice: who was notified, or why nobody could be.
 */
export function SubmitForReview({
  cantileverId,
  revisionId,
  number,
}: {
  cantileverId: number;
  revisionId: number;
  number: number;
}) {
  const submit = useSubmitRevision(cantileverId);
  const [note, setNote] = useState('');
  const [notice, setNotice] = useState('');
  if (notice)
    return (
      <p role="status" className="text-sm text-concrete-800" data-testid="submit-notice">
        {notice}
      </p>
    );
  return (
    <div className="flex flex-wrap items-center gap-2 text-sm">
      <textarea
        aria-label={`Note to the reviewer (optional), revision ${number}`}
        placeholder="Note to the reviewer (optional)"
        rows={1}
        value={note}
        onChange={(e) => setNote(e.target.value)}
        className="w-64 rounded border border-concrete-300 p-1"
      />
      <button
        type="button"
        disabled={submit.isPending}
        onClick={() =>
          submit.mutate(
            { revisionId, note: note.trim() },
            { onSuccess: (answer) => setNotice(answer.notice) },
          )
        }
        className="inline-flex items-center gap-1 rounded bg-oxide-600 px-3 py-1 font-medium text-white hover:bg-oxide-700 disabled:opacity-60"
      >
        <Send aria-hidden="true" className="h-4 w-4" />
        {submit.isPending ? 'Submitting…' : `Submit revision ${number} for review`}
      </button>
      {submit.isError && (
        <span role="alert" className="text-util-over">
          Not submitted: {errorText(submit.error)}
        </span>
      )}
    </div>
  );
}
