import { describe, expect, it } from 'vitest';
import { screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import ReviewRoute from '../../src/app/routes/review';
import { exampleDesign } from '../../shared/engine/examples';
import { CAUTION } from '../../shared/engine/types';
import type { DesignDocument } from '../../shared/schemas/design';
import type { RevisionDto, ReviewDto, UserDto } from '../../shared/schemas/api';
import { formatDate } from '../../src/lib/format';
import { makeRevision, renderAt, stubFetch, users, type Call } from './history-fixtures';

const revised: DesignDocument = {
  ...exampleDesign,
  member: { ...exampleDesign.member, section: { shape: 'W10X22' } },
};
const submitted: ReviewDto = {
  id: 1,
  revisionId: 21,
  state: 'submitted',
  reviewerId: 2,
  reviewerName: users.architect.displayName,
  comment: '',
  createdAt: '2026-11-02T11:00:00.000Z',
};

/** Serves one revision (and its base, comments and timeline) to `me`; a review POST changes the state. */
function serve(me: UserDto, revision: RevisionDto): Call[] {
  const base = makeRevision(20, 1, exampleDesign);
  let current = revision;
  return stubFetch(({ method, path, body }) => {
    if (path === '/api/auth/me') return { body: me };
    if (path === '/api/revisions/21' && method === 'GET') return { body: current };
    if (path === '/api/revisions/20') return { body: base };
    if (path === '/api/cantilevers/7/revisions') return { body: [base, current] };
    if (path === '/api/revisions/21/comments' && method === 'GET') return { body: [] };
    if (path === '/api/revisions/21/reviews' && method === 'POST') {
      const { decision, comment } = body as { decision: string; comment: string };
      const review: ReviewDto = {
        id: 2,
        revisionId: 21,
        state: decision === 'approve' ? 'approved' : 'changes-requested',
        reviewerId: me.id,
        reviewerName: me.displayName,
        comment,
        createdAt: '2026-11-03T09:00:00.000Z',
      };
      current = { ...current, reviewState: review.state, reviews: [...current.reviews, review] };
      return { status: 201, body: review };
    }
    return undefined;
  });
}

function open() {
  renderAt(<ReviewRoute />, { route: '/revisions/21/review', path: '/revisions/:revisionId/review' });
}

describe('Review: who may decide', () => {
  it('hides the decision form from the engineer who wrote the revision, and says why', async () => {
    serve(
      users.engineer,
      makeRevision(21, 2, revised, {
        reviewState: 'submitted',
        authorId: users.engineer.id,
        authorName: users.engineer.displayName,
        reviews: [submitted],
      }),
    );
    open();
    expect(
      await screen.findByText(/You wrote this revision\. An engineer never approves their own work/),
    ).toBeInTheDocument();
    expect(screen.queryByRole('form', { name: 'Review decision' })).not.toBeInTheDocument();
    expect(screen.queryByRole('radio')).not.toBeInTheDocument();
    // Once per view: the layout's footer steps aside for it.
    expect(screen.getAllByText(CAUTION)).toHaveLength(1);
  });

  it('hides it from an architect', async () => {
    serve(users.architect, makeRevision(21, 2, revised, { reviewState: 'submitted', reviews: [submitted] }));
    open();
    expect(
      await screen.findByText(
        /Only an engineer may approve or request changes; you are signed in as an architect\. You may still comment\./,
      ),
    ).toBeInTheDocument();
    expect(screen.queryByRole('radio')).not.toBeInTheDocument();
  });

  it('lets another engineer request changes, with errors next to the fields, then shows the new state', async () => {
    const user = userEvent.setup();
    const calls = serve(
      users.engineer2,
      makeRevision(21, 2, revised, { reviewState: 'submitted', reviews: [submitted] }),
    );
    open();
    const form = await screen.findByRole('form', { name: 'Review decision' });
    // the checks, key results and the changes from revision 1 are all on the page
    expect(screen.getByRole('table', { name: /Checks of this revision/ })).toBeInTheDocument();
    expect(await screen.findByRole('row', { name: /Section: shape.*W8X18 W10X22/ })).toBeInTheDocument();

    await user.click(within(form).getByRole('button', { name: 'Record decision' }));
    expect(
      await within(form).findByText('Decision must be chosen: approve or request changes'),
    ).toBeInTheDocument();

    await user.click(within(form).getByRole('radio', { name: 'Request changes' }));
    await user.click(within(form).getByRole('button', { name: 'Record decision' }));
    const comment = within(form).getByRole('textbox', { name: 'Comment' });
    expect(await within(form).findByText(/Comment is required when you request changes/)).toBeInTheDocument();
    expect(comment).toHaveAttribute('aria-invalid', 'true');
    expect(comment.getAttribute('aria-describedby')).toBe('review-comment-error');
    expect(calls.some((c) => c.method === 'POST')).toBe(false);

    await user.type(comment, 'Check the plate thickness against the new moment.');
    await user.click(within(form).getByRole('button', { name: 'Record decision' }));

    expect(await screen.findByText('You requested changes on revision 2.')).toBeInTheDocument();
    expect(calls.find((c) => c.method === 'POST')?.body).toEqual({
      decision: 'request-changes',
      comment: 'Check the plate thickness against the new moment.',
    });
    expect(
      await screen.findByText(
        `Changes requested by ${users.engineer2.displayName} on ${formatDate('2026-11-03T09:00:00.000Z')}`,
      ),
    ).toBeInTheDocument();
    await waitFor(() =>
      expect(screen.queryByRole('form', { name: 'Review decision' })).not.toBeInTheDocument(),
    );
  });

  it('shows an approved revision as approved by whom and when, with no way to change it', async () => {
    const approved: ReviewDto = {
      ...submitted,
      id: 3,
      state: 'approved',
      reviewerId: 4,
      reviewerName: users.engineer.displayName,
      createdAt: '2026-11-04T08:30:00.000Z',
    };
    serve(
      users.engineer2,
      makeRevision(21, 2, revised, { reviewState: 'approved', reviews: [submitted, approved] }),
    );
    open();
    expect(
      await screen.findByText(
        `Approved by ${users.engineer.displayName} on ${formatDate(approved.createdAt)}`,
      ),
    ).toBeInTheDocument();
    expect(screen.getByText(/An approval is final/)).toBeInTheDocument();
    expect(screen.queryByRole('radio')).not.toBeInTheDocument();
    expect(screen.queryByRole('button', { name: 'Record decision' })).not.toBeInTheDocument();
  });
});
