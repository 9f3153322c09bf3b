import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import type { z } from 'zod';
import { reviewSchema } from '../../../../shared/schemas/api';
import { Button } from '../../../components/ui/button';
import { useCreateReview } from '../api/create-review';
import { errorText } from '../../../lib/error-text';

/** The shared review schema, plus: asking for changes needs words saying which. */
const decisionSchema = reviewSchema.refine((v) => v.decision !== 'request-changes' || v.comment.length > 0, {
  path: ['comment'],
  message: 'is required when you request changes: say what should change',
});

type DecisionInput = z.input<typeof decisionSchema>;
type DecisionOutput = z.output<typeof decisionSchema>;

interface DecisionFormProps {
  revisionId: number;
  revisionNumber: number;
  cantileverId: number;
  /** The latest revision's number when a newer one exists (said again in the confirmation). */
  newerNumber?: number | null;
  onDecided: (message: string) => void;
}

/**
 * Approve or request changes, with a comment; errors next to the fields. Approving asks once more,
 * naming the revision (and any newer one), before anything is recorded.
 */
export function DecisionForm({
  revisionId,
  revisionNumber,
  cantileverId,
  newerNumber = null,
  onDecided,
}: DecisionFormProps) {
  const [confirming, setConfirming] = useState<DecisionOutput | null>(null);
  const review = useCreateReview(revisionId, cantileverId);
  const form = useForm<DecisionInput, unknown, DecisionOutput>({
    resolver: zodResolver(decisionSchema),
    defaultValues: { decision: undefined, comment: '' },
  });
  const { errors } = form.formState;

  const record = async (values: DecisionOutput) => {
    await review.mutateAsync(values);
    setConfirming(null);
    onDecided(
      values.decision === 'approve'
        ? `You approved revision ${revisionNumber}.`
        : `You requested changes on revision ${revisionNumber}.`,
    );
  };

  const onSubmit = form.handleSubmit(async (values) => {
    if (values.decision === 'approve') setConfirming(values);
    else await record(values);
  });

  if (confirming)
    return (
      <div
        role="alertdialog"
        aria-labelledby="confirm-approval-title"
        aria-describedby="confirm-approval-text"
        className="space-y-3 rounded border border-oxide-300 bg-oxide-50 p-3"
      >
        <h3 id="confirm-approval-title" className="text-base font-semibold text-concrete-900">
          Approve revision {revisionNumber}?
        </h3>
        <p id="confirm-approval-text" className="text-sm text-concrete-800">
          Your name and today's date go on revision {revisionNumber}, its calculation package and the plate
          schedule the shop builds from. An approval cannot be undone.
          {newerNumber !== null
            ? ` Revision ${newerNumber} is newer and stays as it is: you are approving revision ${revisionNumber}.`
            : ''}
        </p>
        {review.isError && (
          <p role="alert" className="text-sm text-util-over">
            The decision was not recorded: {errorText(review.error)}
          </p>
        )}
        <div className="flex flex-wrap gap-2">
          <Button variant="primary" disabled={review.isPending} onClick={() => void record(confirming)}>
            {review.isPending ? 'Recording…' : `Yes, approve revision ${revisionNumber}`}
          </Button>
          <Button disabled={review.isPending} onClick={() => setConfirming(null)}>
            Go back
          </Button>
        </div>
      </div>
    );

  return (
    <form onSubmit={onSubmit} noValidate className="space-y-3" aria-label="Review decision">
      <fieldset
        aria-describedby={errors.decision ? 'decision-error' : undefined}
        aria-invalid={errors.decision ? true : undefined}
      >
        <legend className="text-sm font-medium text-concrete-800">Decision</legend>
        <div className="mt-1 flex flex-wrap gap-4 text-sm">
          <label className="inline-flex items-center gap-2">
            <input type="radio" value="approve" className="accent-oxide-600" {...form.register('decision')} />
            Approve revision {revisionNumber}
          </label>
          <label className="inline-flex items-center gap-2">
            <input
              type="radio"
              value="request-changes"
              className="accent-oxide-600"
              {...form.register('decision')}
            />
            Request changes
          </label>
        </div>
        {errors.decision && (
          <p id="decision-error" className="text-sm text-util-over">
            Decision{' '}
            {errors.decision.message === 'must be "approve" or "request-changes"'
              ? 'must be chosen: approve or request changes'
              : errors.decision.message}
          </p>
        )}
      </fieldset>
      <div className="space-y-1">
        <label htmlFor="review-comment" className="block text-sm font-medium text-concrete-800">
          Comment
        </label>
        <textarea
          id="review-comment"
          rows={3}
          aria-invalid={errors.comment ? true : undefined}
          aria-describedby={errors.comment ? 'review-comment-error' : undefined}
          className="w-full rounded border border-concrete-300 p-2 text-sm focus:outline-2 focus:outline-oxide-500"
          {...form.register('comment')}
        />
        {errors.comment && (
          <p id="review-comment-error" className="text-sm text-util-over">
            Comment {errors.comment.message}
          </p>
        )}
      </div>
      {review.isError && (
        <p role="alert" className="text-sm text-util-over">
          The decision was not recorded: {errorText(review.error)}
        </p>
      )}
      <Button type="submit" variant="primary" disabled={review.isPending}>
        {review.isPending ? 'Recording…' : 'Record decision'}
      </Button>
    </form>
  );
}
