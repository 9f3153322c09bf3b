import { useId } from 'react';
import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { commentSchema } from '../../shared/schemas/api';
import { useComments } from '../lib/api/comments/get-comments';
import { useCreateComment } from '../lib/api/comments/create-comment';
import { formatDateTime } from '../lib/format';
import { errorText } from '../lib/error-text';

interface CommentFields {
  body: string;
}

/** The comment thread of one revision; every project member may comment. */
export function CommentsThread({ revisionId }: { revisionId: number }) {
  const comments = useComments(revisionId);
  const create = useCreateComment(revisionId);
  const fieldId = useId();
  const form = useForm<CommentFields>({ resolver: zodResolver(commentSchema), defaultValues: { body: '' } });
  const error = form.formState.errors.body?.message;

  const onSubmit = form.handleSubmit(async ({ body }) => {
    await create.mutateAsync(body);
    form.reset({ body: '' });
  });

  return (
    <section aria-label={`Comments on this revision`} className="space-y-3">
      {comments.isPending && <p className="text-sm text-concrete-600">Loading comments…</p>}
      {comments.isError && (
        <p role="alert" className="text-sm text-util-over">
          Comments could not be loaded: {errorText(comments.error)}
        </p>
      )}
      {comments.data && comments.data.length === 0 && (
        <p className="text-sm text-concrete-600">No comments yet.</p>
      )}
      {comments.data && comments.data.length > 0 && (
        <ol className="space-y-2" aria-live="polite">
          {comments.data.map((c) => (
            <li key={c.id} className="rounded border border-concrete-200 bg-white p-2 text-sm">
              <p className="text-xs text-concrete-600">
                <span className="font-medium text-concrete-800">{c.authorName}</span> ·{' '}
                <time dateTime={c.createdAt}>{formatDateTime(c.createdAt)}</time>
              </p>
              <p className="whitespace-pre-wrap text-concrete-900">{c.body}</p>
            </li>
          ))}
        </ol>
      )}
      <form onSubmit={onSubmit} noValidate className="space-y-1">
        <label htmlFor={fieldId} className="block text-sm font-medium text-concrete-800">
          Add a comment
        </label>
        <textarea
          id={fieldId}
          rows={2}
          aria-invalid={error ? true : undefined}
          aria-describedby={error ? `${fieldId}-error` : undefined}
          className="w-full rounded border border-concrete-300 p-2 text-sm focus:outline-2 focus:outline-oxide-500"
          {...form.register('body')}
        />
        {error && (
          <p id={`${fieldId}-error`} className="text-sm text-util-over">
            Comment {error}
          </p>
        )}
        {create.isError && (
          <p role="alert" className="text-sm text-util-over">
            The comment was not saved: {errorText(create.error)}
          </p>
        )}
        <button
          type="submit"
          disabled={create.isPending}
          className="rounded bg-concrete-800 px-3 py-1 text-sm font-medium text-white hover:bg-concrete-900 disabled:opacity-60"
        >
          {create.isPending ? 'Posting…' : 'Post comment'}
        </button>
      </form>
    </section>
  );
}
