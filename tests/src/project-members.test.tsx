/** The project page's team: one list for everyone; for an admin the list that adds and removes. */
import { describe, expect, it } from 'vitest';
import { screen } from '@testing-library/react';
import ProjectRoute from '../../src/app/routes/project';
import type { ProjectDetailDto, UserDto } from '../../shared/schemas/api';
import { renderAt, stubFetch, users } from './history-fixtures';

const project: ProjectDetailDto = {
  id: 3,
  name: 'Harbour terrace',
  site: 'Pier 4',
  codeBasis: 'IBC 2021',
  units: 'US',
  createdAt: '2026-11-01T10:00:00.000Z',
  cantileverCount: 0,
  cantilevers: [],
  members: [
    {
      userId: users.architect.id,
      email: users.architect.email,
      displayName: users.architect.displayName,
      role: 'architect',
    },
    {
      userId: users.engineer.id,
      email: users.engineer.email,
      displayName: users.engineer.displayName,
      role: 'engineer',
    },
  ],
};

function show(me: UserDto) {
  stubFetch(({ path }) =>
    path === '/api/auth/me'
      ? { body: me }
      : path === '/api/projects/3'
        ? { body: project }
        : path === '/api/admin/users'
          ? { body: Object.values(users) }
          : undefined,
  );
  renderAt(<ProjectRoute />, { route: '/projects/3', path: '/projects/:projectId' });
}

describe('the project page team', () => {
  it('lists each member once for an admin, in the panel that adds and removes', async () => {
    show(users.admin);
    await screen.findByRole('button', { name: `Remove ${users.engineer.displayName}` });
    expect(screen.getAllByText(users.engineer.displayName)).toHaveLength(1);
    expect(screen.getAllByText(users.architect.displayName)).toHaveLength(1);
  });

  it('lists each member once for everyone else, without the admin panel', async () => {
    show(users.architect);
    expect(await screen.findByText(users.engineer.displayName)).toBeInTheDocument();
    expect(screen.getAllByText(users.engineer.displayName)).toHaveLength(1);
    expect(screen.queryByRole('region', { name: 'Project members' })).not.toBeInTheDocument();
  });
});
