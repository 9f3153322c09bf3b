/**
 * The whole desk behind its route loader: it opens on the cantilever's current revision (read by
 * the loader into the query cache, shown at the desk's first commit), a save moves the desk's base
 * (and the next save is made on top of it) while a newer pointer from elsewhere does not, and the
 * unit switch changes the display only. The network is faked at fetch; the engine is the real one.
 */
import { act, fireEvent, render, screen, waitFor, within } from '@testing-library/react';
import { QueryClientProvider } from '@tanstack/react-query';
import { Profiler } from 'react';
import { Link, RouterProvider, createMemoryRouter, useLocation } from 'react-router-dom';
import { describe, expect, it, vi } from 'vitest';
import { exampleDesign } from '../../shared/engine/examples';
import type { CantileverDto, RevisionDto } from '../../shared/schemas/api';
import type { DesignDocument } from '../../shared/schemas/design';
import DesignDeskRoute from '../../src/app/routes/design-desk';
import { deskLoader } from '../../src/app/routes/design-desk-loader';
import { AppLayout } from '../../src/components/layouts/app-layout';
import { RequireAuth } from '../../src/features/auth/components/require-auth';
import { cantileverKeys } from '../../src/lib/api/cantilevers/cantilever-keys';
import { createQueryClient } from '../../src/lib/query-client';
import { makeRevision, stubFetch, users, type Call } from './history-fixtures';

function cantileverAt(revision: RevisionDto): CantileverDto {
  return {
    id: 7,
    projectId: 2,
    name: 'North deck, beam B',
    description: '',
    currentRevisionId: revision.id,
    currentRevisionNumber: revision.number,
    reviewState: revision.reviewState,
    ok: revision.ok,
    updatedAt: revision.createdAt,
    quantity: 4,
    latestApproved: null,
  };
}

/** A server of one cantilever: `pointer` is its current revision (a test may move it, as another person would). */
function fakeServer(opened: RevisionDto, saves: RevisionDto[] = []) {
  const state = { pointer: opened, revisions: new Map([[opened.id, opened]]) };
  const calls: Call[] = stubFetch((call) => {
    const { method, path } = call;
    if (path === '/api/auth/me')
      return method === 'PATCH'
        ? { body: { ...users.architect, ...(call.body as object) } }
        : { body: users.architect };
    if (method === 'GET' && path === '/api/cantilevers/7') return { body: cantileverAt(state.pointer) };
    if (method === 'GET' && path.startsWith('/api/revisions/')) {
      const revision = state.revisions.get(Number(path.split('/')[3]));
      return revision ? { body: revision } : { status: 404, body: { error: 'not found' } };
    }
    if (method === 'GET' && path === '/api/cantilevers/7/revisions') return { body: [] };
    if (method === 'GET' && path === '/api/cantilevers/7/attachments') return { body: [] };
    if (method === 'GET' && path.startsWith('/api/shapes')) return { body: { source: 'test', shapes: [] } };
    if (method === 'POST' && path === '/api/cantilevers/7/revisions') {
      const saved = saves.shift();
      if (!saved) return undefined;
      state.revisions.set(saved.id, saved);
      state.pointer = saved;
      return { status: 201, body: saved };
    }
    return undefined;
  });
  return { state, calls };
}

/** Renders the desk route as the app's router does; `commits` records what each commit of the route showed. */
function openDesk() {
  const queryClient = createQueryClient();
  const commits: { phase: string; base: string | null; routeLoading: boolean }[] = [];
  const router = createMemoryRouter(
    [
      {
        path: '/cantilevers/:cantileverId',
        loader: deskLoader(queryClient),
        hydrateFallbackElement: <p>loader running</p>,
        element: (
          <Profiler
            id="desk"
            onRender={(_id, phase) =>
              commits.push({
                phase,
                base: document.querySelector('[data-testid="base-revision"]')?.textContent ?? null,
                routeLoading: document.body.textContent?.includes('Opening the design desk') ?? false,
              })
            }
          >
            <DesignDeskRoute />
          </Profiler>
        ),
      },
    ],
    { initialEntries: ['/cantilevers/7'] },
  );
  render(
    <QueryClientProvider client={queryClient}>
      <RouterProvider router={router} />
    </QueryClientProvider>,
  );
  return { commits, queryClient };
}

const length = () => screen.getByRole('combobox', { name: 'Length (root to tip)' });
const withLength = (text: string): DesignDocument => ({
  ...exampleDesign,
  member: { ...exampleDesign.member, length: text },
});

async function type(el: HTMLElement, value: string) {
  await act(async () => {
    fireEvent.change(el, { target: { value } });
  });
}

async function saveWithMessage(message: string) {
  await act(async () => {
    fireEvent.click(screen.getByRole('button', { name: /Save revision/ }));
  });
  const dialog = await screen.findByRole('dialog', { name: 'Save revision' });
  await type(within(dialog).getByRole('textbox', { name: 'Message' }), message);
  await act(async () => {
    fireEvent.click(within(dialog).getByRole('button', { name: 'Save revision' }));
  });
  await waitFor(() => expect(screen.queryByRole('dialog')).toBeNull());
}

describe('desk route: one source for the revision it stands on', () => {
  it('opens on the current revision at its first commit: the loader read it, the route never waited in render', async () => {
    const opened = makeRevision(23, 3, exampleDesign);
    const { calls } = fakeServer(opened);
    const { commits } = openDesk();
    expect(await screen.findByTestId('base-revision')).toHaveTextContent('rev 3');
    expect(commits[0]).toEqual({ phase: 'mount', base: 'rev 3', routeLoading: false });
    expect(commits.some((c) => c.routeLoading)).toBe(false);
    expect(length()).toHaveValue('9 ft');
    // the cantilever and its revision were each read once, by the loader
    expect(calls.filter((c) => c.path === '/api/cantilevers/7')).toHaveLength(1);
    expect(calls.filter((c) => c.path === '/api/revisions/23')).toHaveLength(1);
  });

  it('opens on the pointer as it is now, even when an older one is in the cache', async () => {
    const cached = makeRevision(23, 3, exampleDesign);
    const moved = makeRevision(24, 4, withLength('10 ft'));
    const { state } = fakeServer(cached);
    state.revisions.set(moved.id, moved);
    state.pointer = moved;
    const queryClient = createQueryClient();
    queryClient.setQueryData(cantileverKeys.detail(7), cantileverAt(cached));
    const load = deskLoader(queryClient);
    const opening = await load({ params: { cantileverId: '7' } } as unknown as Parameters<typeof load>[0]);
    expect(opening.revisionId).toBe(24);
  });

  it('moves the base to each saved revision, with its plate schedule and package; a pointer moved elsewhere does not', async () => {
    const opened = makeRevision(23, 3, exampleDesign);
    const four = makeRevision(24, 4, withLength('10 ft'));
    const five = makeRevision(25, 5, withLength('11 ft'));
    const { state, calls } = fakeServer(opened, [four, five]);
    const { queryClient } = openDesk();
    await screen.findByTestId('base-revision');
    expect(screen.getByTestId('plate-schedule-link')).toHaveAttribute(
      'href',
      '/api/revisions/23/plate-schedule.csv',
    );

    await type(length(), '10 ft');
    await screen.findByTestId('unsaved');
    await saveWithMessage('Longer reach');
    expect(screen.getByTestId('save-status')).toHaveTextContent('Saved as revision 4.');
    expect(screen.getByTestId('base-revision')).toHaveTextContent('rev 4');
    expect(screen.queryByTestId('unsaved')).toBeNull();
    expect(screen.getByTestId('plate-schedule-link')).toHaveAttribute(
      'href',
      '/api/revisions/24/plate-schedule.csv',
    );
    expect(screen.getByTestId('package-link')).toHaveTextContent('Calculation package of revision 4 (PDF)');

    // the next save is made on top of revision 4
    await type(length(), '11 ft');
    await saveWithMessage('Longer still');
    expect(screen.getByTestId('base-revision')).toHaveTextContent('rev 5');
    const posts = calls.filter((c) => c.method === 'POST');
    expect(posts.map((p) => (p.body as { baseRevision: number | null }).baseRevision)).toEqual([3, 4]);

    // Someone else's save moves the cantilever's pointer; the desk still stands on its own revision 5.
    state.pointer = makeRevision(40, 9, withLength('12 ft'));
    const reads = calls.filter((c) => c.path === '/api/cantilevers/7').length;
    await act(() => queryClient.invalidateQueries({ queryKey: cantileverKeys.detail(7) }));
    expect(calls.filter((c) => c.path === '/api/cantilevers/7').length).toBe(reads + 1);
    expect(screen.getByTestId('base-revision')).toHaveTextContent('rev 5');
    expect(screen.getByTestId('plate-schedule-link')).toHaveAttribute(
      'href',
      '/api/revisions/25/plate-schedule.csv',
    );
  });

  it('switches US/SI as a change of display only: nothing becomes unsaved, the schedule link stays', async () => {
    const opened = makeRevision(23, 3, exampleDesign);
    const { calls } = fakeServer(opened);
    openDesk();
    await screen.findByTestId('base-revision');
    const units = screen.getByRole('radiogroup', { name: 'Units' });
    await act(async () => {
      fireEvent.click(within(units).getByRole('radio', { name: 'SI' }));
    });
    // 9 ft = 2.7432 m (1 ft = 0.3048 m exactly), shown to 4 significant digits
    await waitFor(() => expect(length()).toHaveValue('2.743 m'));
    expect(within(units).getByRole('radio', { name: 'SI' })).toHaveAttribute('aria-checked', 'true');
    expect(screen.queryByTestId('unsaved')).toBeNull();
    expect(screen.getByRole('button', { name: /Save revision/ })).toBeDisabled();
    expect(screen.getByTestId('plate-schedule-link')).toHaveAttribute(
      'href',
      '/api/revisions/23/plate-schedule.csv',
    );
    expect(calls.filter((c) => c.method === 'PATCH')).toHaveLength(1);
    await act(async () => {
      fireEvent.click(within(units).getByRole('radio', { name: 'US' }));
    });
    await waitFor(() => expect(length()).toHaveValue('9 ft'));
    expect(screen.queryByTestId('unsaved')).toBeNull();
  });

  it('a cantilever that cannot be read is said in words on the desk, not as a broken route', async () => {
    stubFetch(({ path }) =>
      path === '/api/auth/me' ? { body: users.architect } : { status: 404, body: { error: 'not found' } },
    );
    openDesk();
    expect(await screen.findByText(/This cantilever could not be loaded/)).toBeInTheDocument();
  });

  it('a signed-out visit still goes to the sign-in page: the loader never throws', async () => {
    stubFetch(() => ({ status: 401, body: { error: 'sign in first' } }));
    const queryClient = createQueryClient();
    function SignIn() {
      return <p>sign in at {useLocation().search}</p>;
    }
    const router = createMemoryRouter(
      [
        { path: '/sign-in', element: <SignIn /> },
        {
          element: <RequireAuth />,
          children: [
            {
              path: '/cantilevers/:cantileverId',
              loader: deskLoader(queryClient),
              hydrateFallbackElement: <p>loader running</p>,
              element: <DesignDeskRoute />,
            },
          ],
        },
      ],
      { initialEntries: ['/cantilevers/7'] },
    );
    render(
      <QueryClientProvider client={queryClient}>
        <RouterProvider router={router} />
      </QueryClientProvider>,
    );
    expect(
      await screen.findByText(`sign in at ?next=${encodeURIComponent('/cantilevers/7')}`),
    ).toBeInTheDocument();
  });

  it('going to the desk from another page says it is opening while the loader reads', async () => {
    fakeServer(makeRevision(23, 3, exampleDesign));
    // the cantilever's answer is held back until the test lets it go
    let release = () => undefined as void;
    const held = new Promise<void>((resolve) => (release = resolve));
    const answer = globalThis.fetch;
    vi.stubGlobal('fetch', async (input: RequestInfo | URL, init?: RequestInit) => {
      if (String(input).endsWith('/api/cantilevers/7')) await held;
      return answer(input, init);
    });
    const queryClient = createQueryClient();
    const router = createMemoryRouter([
      {
        element: <AppLayout />,
        children: [
          { path: '/', element: <Link to="/cantilevers/7">North deck</Link> },
          {
            path: '/cantilevers/:cantileverId',
            loader: deskLoader(queryClient),
            element: <DesignDeskRoute />,
          },
        ],
      },
    ]);
    render(
      <QueryClientProvider client={queryClient}>
        <RouterProvider router={router} />
      </QueryClientProvider>,
    );
    await act(async () => {
      fireEvent.click(await screen.findByRole('link', { name: 'North deck' }));
    });
    expect(await screen.findByText('Opening…')).toBeInTheDocument();
    await act(async () => release());
    expect(await screen.findByTestId('base-revision')).toHaveTextContent('rev 3');
    expect(screen.queryByText('Opening…')).toBeNull();
  });
});
