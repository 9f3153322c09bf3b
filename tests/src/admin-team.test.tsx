import { describe, expect, it } from 'vitest';
import { render, screen, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import TeamRoute from '../../src/app/routes/team';
import OutboxRoute from '../../src/app/routes/outbox';
import { ProjectMembersPanel } from '../../src/features/admin/components/project-members-panel';
import type { OutboxDto, UserDto } from '../../shared/schemas/api';
import { renderAt, stubFetch, users } from './history-fixtures';

const everyone: UserDto[] = [
  users.admin,
  users.architect,
  { ...users.engineer, mustChangePassword: true },
  { ...users.engineer2, active: false },
];

describe('Team', () => {
  it('shows field errors next to the fields and sends nothing while the form is invalid', async () => {
    const user = userEvent.setup();
    const calls = stubFetch(({ path, method }) => {
      if (path === '/api/auth/me') return { body: users.admin };
      if (path === '/api/admin/users' && method === 'GET') return { body: everyone };
      return undefined;
    });
    renderAt(<TeamRoute />, { route: '/admin/team', path: '/admin/team' });
    const accounts = await screen.findByRole('table', { name: 'Accounts' });
    expect(within(accounts).getAllByRole('row')).toHaveLength(everyone.length + 1);
    expect(within(accounts).getByRole('row', { name: /Eli Second/ })).toHaveTextContent('deactivated');
    expect(within(accounts).getByRole('row', { name: /Enid Engineer/ })).toHaveTextContent(
      'first password not yet changed',
    );
    expect(within(accounts).getAllByText('first password not yet changed')).toHaveLength(1);

    const form = screen.getByRole('form', { name: 'Create an account' });
    await user.type(within(form).getByLabelText('E-mail'), 'not-an-address');
    await user.type(within(form).getByLabelText('First password'), 'short');
    await user.click(within(form).getByRole('button', { name: 'Create account' }));

    const email = within(form).getByLabelText('E-mail');
    expect(await within(form).findByText('E-mail must be an e-mail address')).toHaveAttribute(
      'id',
      'invite-email-error',
    );
    expect(email).toHaveAttribute('aria-describedby', 'invite-email-error');
    expect(within(form).getByText('Name is required')).toHaveAttribute('id', 'invite-name-error');
    expect(within(form).getByText('First password must be at least 10 characters')).toHaveAttribute(
      'id',
      'invite-password-error',
    );
    expect(calls.filter((c) => c.method === 'POST')).toHaveLength(0);
  });

  it('puts the server’s field issue next to the field it names, and creates a valid account', async () => {
    const user = userEvent.setup();
    let taken = true;
    const calls = stubFetch(({ path, method, body }) => {
      if (path === '/api/auth/me') return { body: users.admin };
      if (path === '/api/admin/users' && method === 'GET') return { body: everyone };
      if (path === '/api/admin/users' && method === 'POST') {
        if (taken) {
          taken = false;
          return {
            status: 409,
            body: {
              error: {
                code: 'email_taken',
                message: 'That e-mail is in use.',
                issues: [{ path: 'email', message: 'already has an account' }],
              },
            },
          };
        }
        const b = body as { email: string; displayName: string; role: UserDto['role'] };
        return {
          status: 201,
          body: {
            id: 9,
            email: b.email,
            displayName: b.displayName,
            role: b.role,
            units: 'US',
            active: true,
          },
        };
      }
      return undefined;
    });
    renderAt(<TeamRoute />, { route: '/admin/team', path: '/admin/team' });
    const form = await screen.findByRole('form', { name: 'Create an account' });
    await user.type(within(form).getByLabelText('E-mail'), 'architect@reachline.test');
    await user.type(within(form).getByLabelText('Name'), 'Fay Fabricator');
    await user.selectOptions(within(form).getByLabelText('Role'), 'fabricator');
    await user.type(within(form).getByLabelText('First password'), 'long-enough-1');
    await user.click(within(form).getByRole('button', { name: 'Create account' }));
    expect(await within(form).findByText('E-mail already has an account')).toBeInTheDocument();

    await user.clear(within(form).getByLabelText('E-mail'));
    await user.type(within(form).getByLabelText('E-mail'), 'fay@reachline.test');
    await user.click(within(form).getByRole('button', { name: 'Create account' }));
    expect(
      await screen.findByText('Account created for Fay Fabricator (fay@reachline.test) as fabricator.'),
    ).toBeInTheDocument();
    expect(calls.filter((c) => c.method === 'POST').at(-1)?.body).toEqual({
      email: 'fay@reachline.test',
      displayName: 'Fay Fabricator',
      role: 'fabricator',
      password: 'long-enough-1',
    });
  });

  it('changes a role and reactivates an account through PATCH', async () => {
    const user = userEvent.setup();
    const calls = stubFetch(({ path, method, body }) => {
      if (path === '/api/auth/me') return { body: users.admin };
      if (path === '/api/admin/users' && method === 'GET') return { body: everyone };
      if (method === 'PATCH' && path.startsWith('/api/admin/users/'))
        return { body: { ...users.engineer2, ...(body as object) } };
      return undefined;
    });
    renderAt(<TeamRoute />, { route: '/admin/team', path: '/admin/team' });
    await user.selectOptions(await screen.findByLabelText('Role of Arlo Architect'), 'engineer');
    expect(await screen.findByText('Arlo Architect is now engineer.')).toBeInTheDocument();
    await user.click(screen.getByRole('button', { name: 'Reactivate Eli Second' }));
    expect(await screen.findByText('Eli Second was reactivated.')).toBeInTheDocument();
    expect(calls.filter((c) => c.method === 'PATCH').map((c) => [c.path, c.body])).toEqual([
      ['/api/admin/users/2', { role: 'engineer' }],
      ['/api/admin/users/5', { active: true }],
    ]);
  });

  it('is closed to anyone but an admin', async () => {
    stubFetch(({ path }) => (path === '/api/auth/me' ? { body: users.architect } : undefined));
    renderAt(<TeamRoute />, { route: '/admin/team', path: '/admin/team' });
    expect(
      await screen.findByText('Only an admin manages accounts, members and the outbox.'),
    ).toBeInTheDocument();
    expect(screen.queryByRole('form')).not.toBeInTheDocument();
  });
});

describe('Project members and outbox', () => {
  it('adds an active account that is not yet a member, and removes one', async () => {
    const user = userEvent.setup();
    const members = [
      {
        userId: 2,
        email: users.architect.email,
        displayName: users.architect.displayName,
        role: 'architect' as const,
      },
    ];
    const calls = stubFetch(({ path, method }) => {
      if (path === '/api/auth/me') return { body: users.admin };
      if (path === '/api/admin/users') return { body: everyone };
      if (path === '/api/projects/3' && method === 'GET')
        return { body: { id: 3, name: 'P', members, cantilevers: [] } };
      if (path === '/api/projects/3/members' && method === 'POST') return { status: 201, body: {} };
      if (path === '/api/projects/3/members/2' && method === 'DELETE') return { status: 204 };
      return undefined;
    });
    const client = new QueryClient({ defaultOptions: { queries: { retry: false } } });
    render(
      <QueryClientProvider client={client}>
        <ProjectMembersPanel projectId={3} />
      </QueryClientProvider>,
    );
    const select = await screen.findByLabelText('Add an account');
    await screen.findByRole('option', { name: /Enid Engineer/ });
    // members and deactivated accounts are not offered
    expect(within(select).queryByRole('option', { name: /Arlo Architect/ })).not.toBeInTheDocument();
    expect(within(select).queryByRole('option', { name: /Eli Second/ })).not.toBeInTheDocument();
    await user.selectOptions(select, '4');
    await user.click(screen.getByRole('button', { name: 'Add member' }));
    expect(await screen.findByText('Enid Engineer was added to the project.')).toBeInTheDocument();
    await user.click(screen.getByRole('button', { name: 'Remove Arlo Architect' }));
    expect(await screen.findByText('Arlo Architect was removed from the project.')).toBeInTheDocument();
    expect(calls.filter((c) => c.method !== 'GET').map((c) => [c.method, c.path, c.body])).toEqual([
      ['POST', '/api/projects/3/members', { userId: 4 }],
      ['DELETE', '/api/projects/3/members/2', null],
    ]);
  });

  it('lists the captured e-mails with a status word and opens the text', async () => {
    const user = userEvent.setup();
    const mails: OutboxDto[] = [
      {
        id: 1,
        to: ['engineer@reachline.test'],
        subject: 'Revision 2 needs review',
        text: 'Please review revision 2.',
        status: 'sent',
        attempts: 1,
        lastError: null,
        createdAt: '2026-11-02T10:00:00.000Z',
        sentAt: '2026-11-02T10:00:01.000Z',
      },
      {
        id: 2,
        to: ['architect@reachline.test'],
        subject: 'Changes requested',
        text: 'See the comment.',
        status: 'failed',
        attempts: 3,
        lastError: 'connection refused',
        createdAt: '2026-11-03T10:00:00.000Z',
        sentAt: null,
      },
    ];
    stubFetch(({ path }) =>
      path === '/api/auth/me'
        ? { body: users.admin }
        : path === '/api/admin/outbox'
          ? { body: mails }
          : undefined,
    );
    renderAt(<OutboxRoute />, { route: '/admin/outbox', path: '/admin/outbox' });
    const table = await screen.findByRole('table', { name: /E-mails captured/ });
    const rows = within(table).getAllByRole('row').slice(1);
    expect(rows[0]).toHaveTextContent('Changes requested');
    expect(rows[0]).toHaveTextContent('failed');
    expect(rows[0]).toHaveTextContent('connection refused');
    expect(rows[1]).toHaveTextContent('sent');
    await user.click(screen.getByRole('button', { name: 'Show text of “Revision 2 needs review”' }));
    expect(screen.getByText('Please review revision 2.')).toBeInTheDocument();
  });
});
