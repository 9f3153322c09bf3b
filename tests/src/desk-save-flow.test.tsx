/**
 * The desk's save flow: a design with invalid inputs gets the list of those inputs in words (no
 * message box), Ctrl/Cmd+S saves, the sentence is in the future tense, and focus lands on the
 * status line after saving. The network is faked at fetch.
 */
import { act, fireEvent, render, screen, waitFor, within } from '@testing-library/react';
import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { useState } from 'react';
import { FormProvider, useFormState } from 'react-hook-form';
import { RouterProvider, createMemoryRouter } from 'react-router-dom';
import { describe, expect, it } from 'vitest';
import { exampleDesign } from '../../shared/engine/examples';
import type { ShapeRecord } from '../../shared/engine/shapes/types';
import type { FieldIssue } from '../../shared/schemas/quantity';
import { DeskSave } from '../../src/features/desk/components/desk-save';
import { DeskIssuesContext } from '../../src/features/desk/components/field-context';
import { useDeskForm } from '../../src/features/desk/hooks/use-desk-form';
import { ReachGroup } from '../../src/features/desk/components/reach-group';
import { IssueSummary } from '../../src/features/desk/components/desk-inputs';
import { makeRevision, stubFetch } from './history-fixtures';

const NO_SHAPES: ShapeRecord[] = [];

function Desk({ startBase, issues = [] }: { startBase: number | null; issues?: FieldIssue[] }) {
  const desk = useDeskForm(exampleDesign, NO_SHAPES);
  const { isDirty } = useFormState({ control: desk.form.control });
  const [base, setBase] = useState(
    startBase === null ? null : makeRevision(20 + startBase, startBase, exampleDesign),
  );
  return (
    <FormProvider {...desk.form}>
      <DeskIssuesContext.Provider value={desk.issues}>
        <DeskSave
          cantileverId={7}
          base={base}
          setBase={setBase}
          dirty={isDirty}
          mayEdit
          toUserUnits={(d) => d}
          problems={desk.problems}
          onRefused={desk.refuse}
        />
        <IssueSummary issues={issues} failure={null} />
        <ReachGroup disabled={false} />
      </DeskIssuesContext.Provider>
    </FormProvider>
  );
}

function renderDesk(startBase: number | null = 2, issues: FieldIssue[] = []) {
  const queryClient = new QueryClient({
    defaultOptions: { queries: { retry: false }, mutations: { retry: false } },
  });
  const router = createMemoryRouter([{ path: '/', element: <Desk startBase={startBase} issues={issues} /> }]);
  return render(
    <QueryClientProvider client={queryClient}>
      <RouterProvider router={router} />
    </QueryClientProvider>,
  );
}

const length = () => screen.getByRole('combobox', { name: 'Length (root to tip)' });

async function type(el: HTMLElement, value: string) {
  await act(async () => {
    fireEvent.change(el, { target: { value } });
  });
}

/** Presses Ctrl+S (or Cmd+S) and says whether the browser's own action was prevented. */
function pressSave(meta = false): boolean {
  const event = new KeyboardEvent('keydown', {
    key: 's',
    ctrlKey: !meta,
    metaKey: meta,
    bubbles: true,
    cancelable: true,
  });
  act(() => {
    window.dispatchEvent(event);
  });
  return event.defaultPrevented;
}

describe('desk: saving a revision', () => {
  it('lists the invalid inputs in words instead of asking for a message, and takes you to the field', async () => {
    stubFetch(() => undefined);
    renderDesk();
    await type(length(), '9');
    await act(async () => {
      fireEvent.click(screen.getByRole('button', { name: /Save revision/ }));
    });
    const dialog = await screen.findByRole('dialog', { name: 'This design cannot be saved yet' });
    expect(within(dialog).queryByRole('textbox', { name: 'Message' })).toBeNull();
    expect(within(dialog).getByText(/1 input needs attention/)).toBeInTheDocument();
    const link = within(dialog).getByRole('button', { name: 'Reach: length, root to tip' });
    expect(dialog.textContent).toContain('needs a unit');
    expect(dialog.textContent).not.toContain('member.length');
    await act(async () => {
      fireEvent.click(link);
    });
    expect(screen.queryByRole('dialog')).toBeNull();
    expect(document.activeElement).toBe(length());
  });

  it('waits for the worker to answer for what was just typed before it lists the problems', async () => {
    stubFetch(() => undefined);
    renderDesk();
    await act(async () => {
      // typed and saved in one go: the worker has not answered for "9" when the save is asked for
      fireEvent.change(length(), { target: { value: '9' } });
      fireEvent.click(screen.getByRole('button', { name: /Save revision/ }));
    });
    const dialog = await screen.findByRole('dialog', { name: 'This design cannot be saved yet' });
    expect(within(dialog).getByRole('button', { name: 'Reach: length, root to tip' })).toBeInTheDocument();
    expect(dialog.textContent).toContain('needs a unit');
  });

  it('Ctrl+S opens the save, says which revision it makes, saves on a second Ctrl+S and focuses the result', async () => {
    const saved = makeRevision(31, 3, {
      ...exampleDesign,
      member: { ...exampleDesign.member, length: '10 ft' },
    });
    const calls = stubFetch(({ method, path }) =>
      method === 'POST' && path === '/api/cantilevers/7/revisions' ? { status: 201, body: saved } : undefined,
    );
    renderDesk(2);
    await type(length(), '10 ft');
    let prevented = false;
    await act(async () => {
      prevented = pressSave();
    });
    expect(prevented).toBe(true);
    const dialog = await screen.findByRole('dialog', { name: 'Save revision' });
    expect(within(dialog).getByText('Saves as revision 3, on top of revision 2.')).toBeInTheDocument();
    await type(within(dialog).getByRole('textbox', { name: 'Message' }), 'Longer reach');
    await act(async () => {
      expect(pressSave(true)).toBe(true);
    });
    await waitFor(() => expect(screen.queryByRole('dialog')).toBeNull());
    const status = screen.getByTestId('save-status');
    expect(status).toHaveTextContent('Saved as revision 3.');
    expect(document.activeElement).toBe(status);
    const posts = calls.filter((c) => c.method === 'POST');
    expect(posts).toHaveLength(1);
    expect(posts[0].body).toMatchObject({ baseRevision: 2, message: 'Longer reach' });
  });

  it('Ctrl+S with nothing changed keeps the browser from saving the page and says there is nothing to save', async () => {
    stubFetch(() => undefined);
    renderDesk(2);
    expect(pressSave()).toBe(true);
    expect(screen.queryByRole('dialog')).toBeNull();
    expect(screen.getByTestId('save-status')).toHaveTextContent(
      'Nothing to save: the inputs are those of revision 2.',
    );
  });

  it('words the first save in the future tense too', async () => {
    stubFetch(() => undefined);
    renderDesk(null);
    await act(async () => {
      fireEvent.click(screen.getByRole('button', { name: /Save revision/ }));
    });
    const dialog = await screen.findByRole('dialog', { name: 'Save revision' });
    expect(
      within(dialog).getByText('Saves as revision 1, the first of this cantilever.'),
    ).toBeInTheDocument();
  });

  it("names the desk's problems in words, each a way to its field", async () => {
    stubFetch(() => undefined);
    renderDesk(2, [{ path: 'member.length', message: 'is longer than the engine allows' }]);
    const summary = screen.getByTestId('issue-summary');
    expect(summary.textContent).not.toContain('member.length');
    await act(async () => {
      fireEvent.click(within(summary).getByRole('button', { name: 'Reach: length, root to tip' }));
    });
    expect(document.activeElement).toBe(length());
  });
});
