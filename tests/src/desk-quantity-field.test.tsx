/** A quantity field is one Tab stop; its unit list opens from the keyboard and converts what is typed. */
import { render, screen } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import type { ReactNode } from 'react';
import type { UseFormGetValues } from 'react-hook-form';
import { describe, expect, it } from 'vitest';
import type { DesignDocument } from '../../shared/schemas/design';
import { QuantityField } from '../../src/features/desk/components/quantity-field';
import { ReachGroup } from '../../src/features/desk/components/reach-group';
import { unitOptions } from '../../src/features/desk/components/unit-menu';
import { DeskFormHarness } from './desk-harness';

let read: UseFormGetValues<DesignDocument> = () => {
  throw new Error('no form');
};

function Harness({ children }: { children: ReactNode }) {
  return <DeskFormHarness onForm={(form) => (read = form.getValues)}>{children}</DeskFormHarness>;
}

const box = (name: string) => screen.getByRole('combobox', { name });

describe('quantity field: one Tab stop with its units folded in', () => {
  it('visits each field of the Reach group once with Tab, never a unit button', async () => {
    const user = userEvent.setup();
    render(
      <Harness>
        <ReachGroup disabled={false} />
      </Harness>,
    );
    const length = box('Length (root to tip)');
    const spacing = box('Spacing');
    // hertz alone: no list to offer, a plain text box
    const frequency = screen.getByRole('textbox', { name: 'Lowest natural frequency' });
    await user.click(length);
    const visited: Element[] = [length];
    for (let i = 0; i < 10 && document.activeElement !== frequency; i++) {
      await user.tab();
      visited.push(document.activeElement as Element);
    }
    expect(visited[1]).toBe(spacing);
    expect(visited).toContain(frequency);
    expect(visited.every((el) => el.tagName !== 'BUTTON')).toBe(true);
    expect(new Set(visited).size).toBe(visited.length);
    // The button inside the box is there for the mouse only.
    expect(screen.getByRole('button', { name: 'Length (root to tip): other units' })).toHaveAttribute(
      'tabindex',
      '-1',
    );
  });

  it('opens the list with Alt+ArrowDown, moves with the arrows, converts with Enter', async () => {
    const user = userEvent.setup();
    render(
      <Harness>
        <QuantityField name="member.length" label="Length" />
      </Harness>,
    );
    const length = box('Length');
    expect(length).toHaveValue('9 ft');
    expect(length).toHaveAttribute('aria-expanded', 'false');
    expect(length).toHaveAttribute('aria-haspopup', 'listbox');
    await user.click(length);
    await user.keyboard('{Alt>}{ArrowDown}{/Alt}');
    expect(length).toHaveAttribute('aria-expanded', 'true');
    const list = screen.getByRole('listbox', { name: 'Length: convert to' });
    expect(length).toHaveAttribute('aria-controls', list.id);
    const options = screen.getAllByRole('option');
    // 9 ft = 108 in = 2.7432 m (1 ft = 0.3048 m exactly, NIST SP 811 B.8), shown to 4 digits
    expect(options.map((o) => o.textContent)).toEqual(['9 ft as typed', '108 in', '2.743 m', '2743 mm']);
    // the active option starts on the unit typed, and is the input's active descendant
    expect(length).toHaveAttribute('aria-activedescendant', options[0]!.id);
    expect(options[0]).toHaveAttribute('aria-selected', 'true');
    await user.keyboard('{ArrowDown}{ArrowDown}');
    expect(length).toHaveAttribute('aria-activedescendant', options[2]!.id);
    await user.keyboard('{Enter}');
    expect(length).toHaveValue('2.743 m');
    expect(read('member.length')).toBe('2.743 m');
    expect(length).toHaveAttribute('aria-expanded', 'false');
    expect(length).not.toHaveAttribute('aria-activedescendant');
    expect(document.activeElement).toBe(length);
    // ArrowDown alone opens it too, on the unit typed (m); ArrowUp goes back to inches
    await user.keyboard('{ArrowDown}{ArrowUp}{Enter}');
    expect(length).toHaveValue('108 in');
  });

  it('closes with Escape, leaving the value and the focus in the box', async () => {
    const user = userEvent.setup();
    render(
      <Harness>
        <QuantityField name="member.length" label="Length" />
      </Harness>,
    );
    const length = box('Length');
    await user.click(length);
    await user.keyboard('{Alt>}{ArrowDown}{/Alt}{ArrowDown}');
    expect(screen.getByRole('listbox', { hidden: true })).toBeVisible();
    await user.keyboard('{Escape}');
    expect(length).toHaveAttribute('aria-expanded', 'false');
    expect(screen.getByRole('listbox', { hidden: true })).not.toBeVisible();
    expect(length).toHaveValue('9 ft');
    expect(document.activeElement).toBe(length);
  });

  it('keeps the unit typed in the box: 200 mm in a US design stays 200 mm and is valid', async () => {
    const user = userEvent.setup();
    render(
      <Harness>
        <QuantityField name="connection.plate.thickness" label="Plate thickness" />
      </Harness>,
    );
    const thickness = box('Plate thickness');
    await user.clear(thickness);
    await user.type(thickness, '20 mm');
    expect(thickness).toHaveValue('20 mm');
    expect(read('connection.plate.thickness')).toBe('20 mm');
    expect(thickness).toHaveAttribute('aria-invalid', 'false');
    // the list marks mm as typed and offers inches: 20 mm = 0.7874 in (1 in = 25.4 mm exactly, NIST SP 811 B.8)
    await user.keyboard('{Alt>}{ArrowDown}{/Alt}');
    const typed = screen.getByRole('option', { selected: true });
    expect(typed).toHaveTextContent('20 mm as typed');
    expect(screen.getByRole('option', { name: '0.7874 in' })).toBeInTheDocument();
  });

  it('converts with a click on the button and an option, as a mouse user would', async () => {
    const user = userEvent.setup();
    render(
      <Harness>
        <QuantityField name="member.length" label="Length" />
      </Harness>,
    );
    await user.click(screen.getByRole('button', { name: 'Length: other units' }));
    expect(box('Length')).toHaveAttribute('aria-expanded', 'true');
    await user.click(screen.getByRole('option', { name: '108 in' }));
    expect(box('Length')).toHaveValue('108 in');
    expect(document.activeElement).toBe(box('Length'));
  });

  it('gives a bare number the chosen unit, and offers nothing to convert when the text does not read', () => {
    expect(unitOptions('200', 'length').map((o) => o.text)).toEqual(['200 ft', '200 in', '200 m', '200 mm']);
    expect(unitOptions('1-1/2', 'length')[1]?.text).toBe('1-1/2 in');
    const unreadable = unitOptions('abc', 'length');
    expect(unreadable.map((o) => o.text)).toEqual([null, null, null, null]);
    expect(unreadable.some((o) => o.current)).toBe(false);
    // 1 ksi = 1000 psi (the kip is 1000 lbf); 1 psi = 6894.757 Pa (NIST SP 811 B.8): 50 ksi = 344.7 MPa
    expect(unitOptions('50 ksi', 'stress').map((o) => [o.text, o.current])).toEqual([
      ['50 ksi', true],
      ['50000 psi', false],
      ['344.7 MPa', false],
    ]);
  });
});
