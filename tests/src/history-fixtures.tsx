/**
 * Shared fixtures for the history, compare, review, admin and attachments client tests: revisions
 * whose results come from the real shared engine, a fetch stub at the network boundary, and a
 * render helper with a fresh QueryClient (no retries) and a memory router.
 */
import type { ReactElement } from 'react';
import { render } from '@testing-library/react';
import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { MemoryRouter, Route, Routes } from 'react-router-dom';
import { vi } from 'vitest';
import { evaluateDesign } from '../../shared/engine/design';
import type { DesignDocument } from '../../shared/schemas/design';
import type { RevisionDto, UserDto } from '../../shared/schemas/api';
import { parsedDesignSchema } from '../../shared/schemas/parsed-design';

export const users: Record<'admin' | 'architect' | 'engineer' | 'engineer2', UserDto> = {
  admin: {
    id: 1,
    email: 'admin@reachline.test',
    displayName: 'Ada Admin',
    role: 'admin',
    units: 'US',
    active: true,
  },
  architect: {
    id: 2,
    email: 'architect@reachline.test',
    displayName: 'Arlo Architect',
    role: 'architect',
    units: 'US',
    active: true,
  },
  engineer: {
    id: 4,
    email: 'engineer@reachline.test',
    displayName: 'Enid Engineer',
    role: 'engineer',
    units: 'US',
    active: true,
  },
  engineer2: {
    id: 5,
    email: 'second@reachline.test',
    displayName: 'Eli Second',
    role: 'engineer',
    units: 'US',
    active: true,
  },
};

/** A stored revision as the server would send it, with the engine's real result. */
export function makeRevision(
  id: number,
  number: number,
  input: DesignDocument,
  extra: Partial<Omit<RevisionDto, 'input' | 'result'>> = {},
): RevisionDto {
  const result = evaluateDesign(parsedDesignSchema.parse(input), { stations: true });
  return {
    id,
    cantileverId: 7,
    number,
    authorId: users.architect.id,
    authorName: users.architect.displayName,
    message: `change ${number}`,
    engineVersion: result.engineVersion,
    baseRevisionNumber: number > 1 ? number - 1 : null,
    createdAt: `2026-11-0${number}T10:00:00.000Z`,
    ok: result.ok,
    reviewState: 'draft',
    reviews: [],
    ...extra,
    input,
    result,
  };
}

export interface Call {
  method: string;
  path: string;
  body: unknown;
}

type Handler = (call: Call) => { status?: number; body?: unknown } | undefined;

/**
 * Replaces fetch: each request goes to `handler`; an unhandled request fails the test loudly.
 * Returns the list of calls made, for assertions on what was sent.
 */
export function stubFetch(handler: Handler): Call[] {
  const calls: Call[] = [];
  vi.stubGlobal(
    'fetch',
    vi.fn(async (input: RequestInfo | URL, init?: RequestInit) => {
      const url = new URL(String(input), 'http://localhost');
      const call: Call = {
        method: init?.method ?? 'GET',
        path: `${url.pathname}${url.search}`,
        body: typeof init?.body === 'string' ? (JSON.parse(init.body) as unknown) : null,
      };
      calls.push(call);
      const answer = handler(call);
      if (!answer) throw new Error(`unexpected request ${call.method} ${call.path}`);
      const status = answer.status ?? 200;
      return new Response(answer.body === undefined ? null : JSON.stringify(answer.body), {
        status,
        headers: { 'Content-Type': 'application/json' },
      });
    }),
  );
  return calls;
}

export function renderAt(ui: ReactElement, { route, path }: { route: string; path: string }) {
  const queryClient = new QueryClient({
    defaultOptions: { queries: { retry: false }, mutations: { retry: false } },
  });
  return render(
    <QueryClientProvider client={queryClient}>
      <MemoryRouter initialEntries={[route]}>
        <Routes>
          <Route path={path} element={ui} />
        </Routes>
      </MemoryRouter>
    </QueryClientProvider>,
  );
}
