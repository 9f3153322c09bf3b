import { describe, expect, it } from 'vitest';
import { screen, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import HistoryRoute from '../../src/app/routes/history';
import type { CantileverDto, CommentDto, RevisionSummaryDto, UserDto } from '../../shared/schemas/api';
import { renderAt, stubFetch, users } from './history-fixtures';

const cantilever: CantileverDto = {
  id: 7,
  projectId: 3,
  name: 'North deck, typical beam',
  description: '',
  currentRevisionId: 33,
  currentRevisionNumber: 3,
  reviewState: 'draft',
  ok: false,
  updatedAt: '2026-11-03T10:00:00.000Z',
  quantity: 1,
  latestApproved: null,
};

function summary(id: number, number: number, extra: Partial<RevisionSummaryDto>): RevisionSummaryDto {
  return {
    id,
    cantileverId: 7,
    number,
    authorId: 2,
    authorName: 'Arlo Architect',
    message: `message ${number}`,
    engineVersion: '1.0.0',
    baseRevisionNumber: number > 1 ? number - 1 : null,
    createdAt: `2026-11-0${number}T10:00:00.000Z`,
    ok: true,
    reviewState: 'draft',
    ...extra,
  };
}

/** Sent oldest first on purpose: the screen orders newest first itself. */
const revisions = [
  summary(31, 1, { reviewState: 'changes-requested' }),
  summary(32, 2, { reviewState: 'submitted', ok: false }),
  summary(33, 3, { reviewState: 'draft' }),
];

function serve(me: UserDto) {
  let list = revisions;
  const comments: CommentDto[] = [];
  return stubFetch(({ method, path, body }) => {
    if (path === '/api/auth/me') return { body: me };
    if (path === '/api/cantilevers/7') return { body: cantilever };
    if (path === '/api/cantilevers/7/revisions') return { body: list };
    if (path === '/api/revisions/33/submit' && method === 'POST') {
      list = list.map((r) => (r.id === 33 ? { ...r, reviewState: 'submitted' as const } : r));
      const note = (body as { note: string }).note;
      return {
        status: 200,
        body: {
          notice: `Revision 3 was submitted for review. Test Engineer was notified by e-mail.${note ? ` Note: ${note}` : ''}`,
          notified: ['Test Engineer'],
        },
      };
    }
    if (path === '/api/revisions/33/comments' && method === 'GET') return { body: comments };
    if (path === '/api/revisions/33/comments' && method === 'POST') {
      const c: CommentDto = {
        id: comments.length + 1,
        revisionId: 33,
        authorId: me.id,
        authorName: me.displayName,
        body: (body as { body: string }).body,
        createdAt: '2026-11-04T10:00:00.000Z',
      };
      comments.push(c);
      return { status: 201, body: c };
    }
    return undefined;
  });
}

const open = () =>
  renderAt(<HistoryRoute />, { route: '/cantilevers/7/history', path: '/cantilevers/:cantileverId/history' });

describe('History', () => {
  it('lists revisions newest first with state and verdict in words, and submits the latest draft', async () => {
    const user = userEvent.setup();
    const calls = serve(users.architect);
    open();
    const list = await screen.findByRole('list', { name: 'Revisions, newest first' });
    const items = within(list).getAllByRole('listitem');
    expect(items.map((li) => within(li).getByRole('heading').textContent)).toEqual([
      'Revision 3DraftPasses',
      'Revision 2Awaiting reviewDoes not pass',
      'Revision 1Changes requestedPasses',
    ]);
    expect(items[0]).toHaveTextContent('based on revision 2');
    expect(items[2]).toHaveTextContent('first revision');
    // an architect sees no review button, and only the latest draft can be submitted
    expect(screen.queryByRole('link', { name: /Open review/ })).not.toBeInTheDocument();
    expect(screen.getAllByRole('button', { name: 'Submit for review' })).toHaveLength(1);
    expect(within(items[0]).getByRole('button', { name: 'Submit for review' })).toBeInTheDocument();

    await user.type(screen.getByRole('textbox', { name: /Note to the reviewer/ }), 'Check the rods');
    await user.click(screen.getByRole('button', { name: 'Submit for review' }));
    // the notice is the server's: who was notified, or why nobody could be
    expect(
      await screen.findByText(
        'Revision 3 was submitted for review. Test Engineer was notified by e-mail. Note: Check the rods',
      ),
    ).toBeInTheDocument();
    expect(calls.find((c) => c.method === 'POST' && c.path === '/api/revisions/33/submit')?.body).toEqual({
      note: 'Check the rods',
    });
    expect(await within(list).findAllByText('Awaiting review')).toHaveLength(2);
    expect(screen.queryByRole('button', { name: 'Submit for review' })).not.toBeInTheDocument();
  });

  it('offers Compare once two revisions are picked, earlier first', async () => {
    const user = userEvent.setup();
    serve(users.engineer);
    open();
    await user.click(await screen.findByRole('checkbox', { name: 'Pick revision 3 for compare' }));
    expect(screen.queryByRole('link', { name: /Compare revision/ })).not.toBeInTheDocument();
    await user.click(screen.getByRole('checkbox', { name: 'Pick revision 1 for compare' }));
    expect(screen.getByRole('link', { name: 'Compare revision 1 with 3' })).toHaveAttribute(
      'href',
      '/cantilevers/7/compare?a=31&b=33',
    );
    // engineers get a way into the review of the submitted revision
    expect(screen.getByRole('link', { name: 'Open review of revision 2' })).toHaveAttribute(
      'href',
      '/revisions/32/review',
    );
  });

  it('lets any member comment on a revision', async () => {
    const user = userEvent.setup();
    const calls = serve(users.engineer);
    open();
    await user.click(await screen.findByRole('button', { name: 'Comments on revision 3' }));
    expect(await screen.findByText('No comments yet.')).toBeInTheDocument();
    await user.click(screen.getByRole('button', { name: 'Post comment' }));
    expect(await screen.findByText('Comment is required')).toBeInTheDocument();
    await user.type(
      screen.getByRole('textbox', { name: 'Add a comment' }),
      'Tip looks lively, check the frequency.',
    );
    await user.click(screen.getByRole('button', { name: 'Post comment' }));
    expect(await screen.findByText('Tip looks lively, check the frequency.')).toBeInTheDocument();
    expect(calls.find((c) => c.method === 'POST')?.body).toEqual({
      body: 'Tip looks lively, check the frequency.',
    });
  });
});
