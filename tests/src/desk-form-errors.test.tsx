import { act, fireEvent, render, screen } from '@testing-library/react';
import type { ReactNode } from 'react';
import { describe, expect, it } from 'vitest';
import { QuantityField } from '../../src/features/desk/components/quantity-field';
import { ReachGroup } from '../../src/features/desk/components/reach-group';
import { issuesByField } from '../../src/features/desk/lib/issue-paths';
import { DeskFormHarness } from './desk-harness';

function Harness({ children, issues }: { children: ReactNode; issues?: Map<string, string> }) {
  return <DeskFormHarness issues={issues}>{children}</DeskFormHarness>;
}

async function type(label: string, value: string) {
  await act(async () => {
    fireEvent.change(screen.getByRole('combobox', { name: label }), { target: { value } });
  });
}

describe('desk fields: errors in plain words next to the field', () => {
  it('says a length needs a unit, and that it must be positive', async () => {
    render(
      <Harness>
        <ReachGroup disabled={false} />
      </Harness>,
    );
    await type('Length (root to tip)', '9');
    expect(
      await screen.findByText('Length (root to tip) needs a unit, got "9" (for example "10 ft")'),
    ).toBeInTheDocument();
    expect(screen.getByRole('combobox', { name: 'Length (root to tip)' })).toHaveAttribute(
      'aria-invalid',
      'true',
    );
    await type('Length (root to tip)', '-3 ft');
    expect(
      await screen.findByText('Length (root to tip) must be a positive length, got "-3 ft"'),
    ).toBeInTheDocument();
    await type('Length (root to tip)', '10 kip');
    expect(
      await screen.findByText('Length (root to tip) must be a length, got "10 kip"'),
    ).toBeInTheDocument();
    expect(document.body.textContent).not.toContain('NaN');
  });

  it('says a ratio must be a number, never showing NaN', async () => {
    render(
      <Harness>
        <ReachGroup disabled={false} />
      </Harness>,
    );
    await act(async () => {
      fireEvent.change(screen.getByRole('spinbutton', { name: 'Live deflection limit, span /' }), {
        target: { value: '' },
      });
    });
    expect(await screen.findByText(/Live deflection limit, span \/ must be a number/)).toBeInTheDocument();
    expect(document.body.textContent).not.toContain('NaN');
  });

  it('shows an engine issue (written with array brackets) at its field', () => {
    const issues = issuesByField([
      { path: 'loads.point[0].at', message: 'is beyond the tip (the member is 9 ft long)' },
    ]);
    render(
      <Harness issues={issues}>
        <QuantityField name="loads.point.0.at" label="At, from the root" />
      </Harness>,
    );
    expect(screen.getByRole('alert')).toHaveTextContent(
      'At, from the root is beyond the tip (the member is 9 ft long)',
    );
  });

  it('rewrites the value in the unit chosen from the list in the field', async () => {
    render(
      <Harness>
        <QuantityField name="member.length" label="Length" />
      </Harness>,
    );
    const length = screen.getByRole('combobox', { name: 'Length' });
    const choose = async (option: string) => {
      await act(async () => {
        fireEvent.click(screen.getByRole('button', { name: 'Length: other units' }));
      });
      await act(async () => {
        fireEvent.click(screen.getByRole('option', { name: option }));
      });
    };
    // 9 ft = 2.7432 m (1 ft = 0.3048 m exactly), 4 significant digits
    await choose('2.743 m');
    expect(length).toHaveValue('2.743 m');
    await choose('108 in');
    expect(length).toHaveValue('108 in');
  });
});
