import { describe, expect, it } from 'vitest';
import { screen, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { useQuery } from '@tanstack/react-query';
import { Route, Routes } from 'react-router-dom';
import { apiGet } from '../../src/lib/api-client';
import AccountRoute from '../../src/app/routes/account';
import { RequireAuth } from '../../src/features/auth/components/require-auth';
import { renderAt, stubFetch, users } from './history-fixtures';

describe('changing a password', () => {
  it('shows the server’s strength error next to the new password, then changes it', async () => {
    const user = userEvent.setup();
    let weak = true;
    const calls = stubFetch(({ path, method }) => {
      if (path === '/api/auth/me') return { body: users.architect };
      if (path === '/api/auth/password' && method === 'POST') {
        if (weak) {
          weak = false;
          return {
            status: 400,
            body: {
              error: {
                code: 'invalid_input',
                message: 'The new password is too easy to guess.',
                issues: [{ path: 'newPassword', message: 'is too easy to guess' }],
              },
            },
          };
        }
        return { body: { ...users.architect, mustChangePassword: false } };
      }
      return undefined;
    });
    renderAt(<AccountRoute />, { route: '/account', path: '/account' });
    const form = await screen.findByRole('form', { name: 'Change password' });
    await user.type(within(form).getByLabelText('Current password'), 'the old one');
    await user.type(within(form).getByLabelText('New password'), 'aaaaaaaaaa');
    await user.type(within(form).getByLabelText('New password again'), 'aaaaaaaaaa');
    await user.click(within(form).getByRole('button', { name: 'Change password' }));
    expect(await within(form).findByText(/is too easy to guess/)).toBeInTheDocument();
    expect(calls.find((c) => c.path === '/api/auth/password')?.body).toEqual({
      currentPassword: 'the old one',
      newPassword: 'aaaaaaaaaa',
    });

    await user.clear(within(form).getByLabelText('New password'));
    await user.type(within(form).getByLabelText('New password'), 'quiet lantern over the harbor');
    await user.clear(within(form).getByLabelText('New password again'));
    await user.type(within(form).getByLabelText('New password again'), 'quiet lantern over the harbor');
    await user.click(within(form).getByRole('button', { name: 'Change password' }));
    expect(await screen.findByText(/other sessions were signed out/)).toBeInTheDocument();
  });

  it('refuses two different new passwords without asking the server', async () => {
    const user = userEvent.setup();
    const calls = stubFetch(({ path }) => (path === '/api/auth/me' ? { body: users.architect } : undefined));
    renderAt(<AccountRoute />, { route: '/account', path: '/account' });
    const form = await screen.findByRole('form', { name: 'Change password' });
    await user.type(within(form).getByLabelText('Current password'), 'the old one');
    await user.type(within(form).getByLabelText('New password'), 'quiet lantern over the harbor');
    await user.type(within(form).getByLabelText('New password again'), 'quiet lantern over the bay');
    await user.click(within(form).getByRole('button', { name: 'Change password' }));
    expect(await within(form).findByText(/does not match the new password/)).toBeInTheDocument();
    expect(calls.filter((c) => c.method === 'POST')).toHaveLength(0);
  });

  it('asks for a new password before anything else after an admin reset', async () => {
    stubFetch(({ path }) =>
      path === '/api/auth/me' ? { body: { ...users.engineer, mustChangePassword: true } } : undefined,
    );
    renderAt(<RequireAuth />, { route: '/projects', path: '/projects' });
    expect(await screen.findByRole('heading', { name: 'Choose a new password' })).toBeInTheDocument();
    expect(screen.getByRole('form', { name: 'Change password' })).toBeInTheDocument();
  });

  it('says why for a new account, and lets the person in once the first password is changed', async () => {
    const user = userEvent.setup();
    const calls = stubFetch(({ path, method }) => {
      if (path === '/api/auth/me') return { body: { ...users.engineer, mustChangePassword: true } };
      if (path === '/api/auth/password' && method === 'POST')
        return { body: { ...users.engineer, mustChangePassword: false } };
      return undefined;
    });
    renderAt(
      <Routes>
        <Route element={<RequireAuth />}>
          <Route path="*" element={<p>the projects page</p>} />
        </Route>
      </Routes>,
      { route: '/projects', path: '/*' },
    );
    expect(
      await screen.findByText(/The password of .* was set by an admin, for a new account or after a reset/),
    ).toBeInTheDocument();
    expect(screen.queryByText('the projects page')).not.toBeInTheDocument();
    const form = screen.getByRole('form', { name: 'Change password' });
    await user.type(within(form).getByLabelText('Current password'), 'granite ladder under 9 gulls');
    await user.type(within(form).getByLabelText('New password'), 'copper kettle on the north pier');
    await user.type(within(form).getByLabelText('New password again'), 'copper kettle on the north pier');
    await user.click(within(form).getByRole('button', { name: 'Change password' }));
    expect(await screen.findByText('the projects page')).toBeInTheDocument();
    expect(calls.find((c) => c.method === 'POST')?.body).toEqual({
      currentPassword: 'granite ladder under 9 gulls',
      newPassword: 'copper kettle on the north pier',
    });
  });

  it('turns to the change-password form when any request is refused with password_change_required', async () => {
    let gated = false;
    stubFetch(({ path }) => {
      if (path === '/api/auth/me') return { body: { ...users.engineer, mustChangePassword: gated } };
      if (path === '/api/projects') {
        gated = true;
        return {
          status: 403,
          body: {
            error: {
              code: 'password_change_required',
              message: 'Choose a new password first: the one you signed in with was set by an admin.',
              issues: [],
            },
          },
        };
      }
      return undefined;
    });
    function Projects() {
      const projects = useQuery({ queryKey: ['projects'], queryFn: () => apiGet('/api/projects') });
      return <p>{projects.isError ? 'refused' : 'loading projects'}</p>;
    }
    renderAt(
      <Routes>
        <Route element={<RequireAuth />}>
          <Route path="*" element={<Projects />} />
        </Route>
      </Routes>,
      { route: '/projects', path: '/*' },
    );
    expect(await screen.findByRole('heading', { name: 'Choose a new password' })).toBeInTheDocument();
  });
});
