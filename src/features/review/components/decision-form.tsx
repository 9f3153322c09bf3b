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
  onDecided: (message: string) => void;
}

/** Approve or request changes, with a comment; errors next to the fields. */
export function DecisionForm({ revisionId, revisionNumber, cantileverId, onDecided }: DecisionFormProps) {
  const review = useCreateReview(revisionId, cantileverId);
  const form = useForm<DecisionInput, unknown, DecisionOutput>({
    resolver: zodResolver(decisionSchema),
    defaultValues: { decision: undefined, comment: '' },
  });
  const { errors } = form.formState;

  const onSubmit = form.handleSubmit(async (values) => {
    await review.mutateAsync(values);
    onDecided(
      values.decision === 'approve'
        ? `You approved revision ${revisionNumber}.`
        : `You requested changes on revision ${revisionNumber}.`,
    );
  });

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
