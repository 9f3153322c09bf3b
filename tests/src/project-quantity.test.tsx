import { describe, expect, it } from 'vitest';
import { screen } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { QuantityCell } from '../../src/features/projects/components/quantity-cell';
import type { CantileverDto } from '../../shared/schemas/api';
import { renderAt, stubFetch } from './history-fixtures';

const beam = { id: 7, projectId: 3, name: 'North deck beam', quantity: 1 } as CantileverDto;

describe('number of beams on the project page', () => {
  it('sets the quantity through PATCH, and refuses a value that is not a whole number of beams', async () => {
    const user = userEvent.setup();
    const calls = stubFetch(({ path, method, body }) => {
      if (path === '/api/cantilevers/7' && method === 'PATCH')
        return { body: { ...beam, ...(body as object) } };
      if (path.startsWith('/api/projects/3')) return { body: {} };
      return undefined;
    });
    renderAt(<QuantityCell cantilever={beam} editable />, { route: '/p', path: '/p' });
    const field = screen.getByLabelText('Number of beams for North deck beam');
    await user.clear(field);
    await user.type(field, '0');
    expect(screen.getByRole('alert')).toHaveTextContent('a whole number of beams, 1 or more');
    expect(field).toHaveAttribute('aria-invalid', 'true');
    expect(screen.getByRole('button', { name: 'Set' })).toBeDisabled();
    await user.clear(field);
    await user.type(field, '6');
    await user.click(screen.getByRole('button', { name: 'Set' }));
    expect(calls.filter((c) => c.method === 'PATCH')).toEqual([
      { method: 'PATCH', path: '/api/cantilevers/7', body: { quantity: 6 } },
    ]);
  });

  it('only shows the number to a role that may not change it', () => {
    renderAt(<QuantityCell cantilever={{ ...beam, quantity: 4 }} editable={false} />, {
      route: '/p',
      path: '/p',
    });
    expect(screen.queryByRole('textbox')).not.toBeInTheDocument();
    expect(screen.getByText('4')).toBeInTheDocument();
  });
});
