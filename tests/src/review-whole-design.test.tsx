import { describe, expect, it } from 'vitest';
import { screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import ReviewRoute from '../../src/app/routes/review';
import RevisionRoute from '../../src/app/routes/revision';
import { exampleDesign } from '../../shared/engine/examples';
import type { ReviewDto, RevisionDto, UserDto } from '../../shared/schemas/api';
import { makeRevision, renderAt, stubFetch, users, type Call } from './history-fixtures';

const submitted: ReviewDto = {
  id: 1,
  revisionId: 21,
  state: 'submitted',
  reviewerId: 2,
  reviewerName: users.architect.displayName,
  comment: '',
  createdAt: '2026-11-02T11:00:00.000Z',
};

/** Revision 2 (id 21) is submitted; revision 3 (id 22), a draft, was saved after it. */
function serve(me: UserDto): { calls: Call[]; rev2: RevisionDto } {
  const rev1 = makeRevision(20, 1, exampleDesign);
  let rev2 = makeRevision(21, 2, exampleDesign, { reviewState: 'submitted', reviews: [submitted] });
  const rev3 = makeRevision(22, 3, exampleDesign);
  const calls = stubFetch(({ method, path }) => {
    if (path === '/api/auth/me') return { body: me };
    if (path === '/api/revisions/21' && method === 'GET') return { body: rev2 };
    if (path === '/api/revisions/20') return { body: rev1 };
    if (path === '/api/revisions/22') return { body: rev3 };
    if (path === '/api/cantilevers/7/revisions') return { body: [rev3, rev2, rev1] };
    if (path.endsWith('/comments') && method === 'GET') return { body: [] };
    if (path === '/api/revisions/21/reviews' && method === 'POST') {
      const review: ReviewDto = {
        ...submitted,
        id: 2,
        state: 'approved',
        reviewerId: me.id,
        reviewerName: me.displayName,
        createdAt: '2026-11-04T09:00:00.000Z',
      };
      rev2 = { ...rev2, reviewState: 'approved', reviews: [submitted, review] };
      return { status: 201, body: review };
    }
    return undefined;
  });
  return { calls, rev2 };
}

describe('Review holds the whole design', () => {
  it('shows the evidence before the decision, warns of the newer revision and asks before approving', async () => {
    const { calls } = serve(users.engineer);
    renderAt(<ReviewRoute />, { route: '/revisions/21/review', path: '/revisions/:revisionId/review' });
    const warning = await screen.findByTestId('newer-revisions');
    expect(warning).toHaveTextContent(
      'A newer revision exists: the latest is revision 3. You are reviewing revision 2.',
    );
    // every input grouped as on the desk, the diagrams and the sketches come before the decision form
    const inputs = await screen.findByTestId('inputs-read-only');
    expect(within(inputs).getByRole('region', { name: 'Reach inputs' })).toHaveTextContent('length');
    expect(within(inputs).getByRole('region', { name: 'Support inputs' })).toBeInTheDocument();
    expect(screen.getByRole('region', { name: 'Plate on the pier' })).toBeInTheDocument();
    expect(screen.getByRole('region', { name: 'Member elevation and diagrams' })).toBeInTheDocument();
    const form = screen.getByRole('form', { name: 'Review decision' });
    expect(inputs.compareDocumentPosition(form) & Node.DOCUMENT_POSITION_FOLLOWING).toBeTruthy();
    expect(screen.getByTestId('package-link')).toHaveAttribute('href', '/api/revisions/21/package.pdf');

    const user = userEvent.setup();
    await user.click(within(form).getByRole('radio', { name: 'Approve revision 2' }));
    await user.click(within(form).getByRole('button', { name: 'Record decision' }));
    const confirm = await screen.findByRole('alertdialog', { name: 'Approve revision 2?' });
    expect(confirm).toHaveTextContent(
      'Revision 3 is newer and stays as it is: you are approving revision 2.',
    );
    expect(calls.filter((c) => c.method === 'POST')).toHaveLength(0);
    await user.click(within(confirm).getByRole('button', { name: 'Go back' }));
    await user.click(screen.getByRole('button', { name: 'Record decision' }));
    await user.click(
      within(await screen.findByRole('alertdialog')).getByRole('button', { name: 'Yes, approve revision 2' }),
    );
    await waitFor(() => expect(calls.filter((c) => c.method === 'POST')).toHaveLength(1));
    expect(calls.find((c) => c.method === 'POST')?.body).toMatchObject({ decision: 'approve' });
    expect(await screen.findByText('You approved revision 2.')).toBeInTheDocument();
  });

  it('opens any revision read-only at its own address: "revision N of M" with a link to the latest', async () => {
    serve(users.architect);
    renderAt(<RevisionRoute />, { route: '/revisions/21', path: '/revisions/:revisionId' });
    const of = await screen.findByTestId('revision-of');
    await waitFor(() => expect(of).toHaveTextContent('This is revision 2 of 3.'));
    expect(within(of).getByRole('link', { name: 'Open the latest, revision 3' })).toHaveAttribute(
      'href',
      '/revisions/22',
    );
    expect(screen.getByTestId('inputs-read-only')).toBeInTheDocument();
    expect(screen.queryByRole('textbox')).not.toBeInTheDocument();
    expect(screen.queryByRole('button', { name: /save/i })).not.toBeInTheDocument();
    expect(screen.getByTestId('package-link')).toHaveAttribute('href', '/api/revisions/21/package.pdf');
  });
});
