import { Save } from 'lucide-react';
import { useEffect, useRef, useState } from 'react';
import { useFormContext } from 'react-hook-form';
import type { RevisionDto } from '../../../../shared/schemas/api';
import type { DesignDocument } from '../../../../shared/schemas/design';
import { Button } from '../../../components/ui/button';
import { ApiError } from '../../../lib/api-client';
import { errorText } from '../../../lib/error-text';
import { focusField } from '../lib/focus-field';
import type { Issue } from '../lib/issue-paths';
import { staleLatest, useSaveRevision } from '../../../lib/api/revisions/save-revision';
import { replaceKeepingDirty } from '../hooks/use-units-switch';
import { ConflictDialog } from './conflict-dialog';
import { LeaveGuard } from './leave-guard';
import { SAVE_FORM_ID, SaveDialog } from './save-dialog';

/** Where focus goes once the dialog has closed: the status line, or a field by its path. */
const STATUS = '(status)';

/** Ctrl+S (Cmd+S on a Mac), the browser's "save page" keys. */
function isSaveKey(e: KeyboardEvent): boolean {
  return (e.ctrlKey || e.metaKey) && !e.altKey && !e.shiftKey && e.key.toLowerCase() === 's';
}

/**
 * "Save revision" (also Ctrl/Cmd+S): a design with invalid inputs gets the list of those inputs (the
 * worker's answer for the document on screen, awaited if it is still computing), not a message box; otherwise it asks for a message and posts against the base revision. A stale
 * base opens the conflict dialog (keep mine on top of the latest, or load the latest with mine kept
 * to restore). After a save, focus goes to the line that says which revision was saved.
 */
export function DeskSave({
  cantileverId,
  base,
  setBase,
  dirty,
  mayEdit,
  toUserUnits,
  problems: checkProblems,
  onRefused,
}: {
  cantileverId: number;
  /** The revision the desk stands on (null: nothing saved yet); a save is made on top of it. */
  base: RevisionDto | null;
  /** Moves the desk onto a revision (one just saved, or the latest from a conflict). */
  setBase: (revision: RevisionDto) => void;
  dirty: boolean;
  mayEdit: boolean;
  toUserUnits: (doc: DesignDocument) => DesignDocument;
  /** Every problem of the document on screen, once the worker has answered for it. */
  problems: () => Promise<Issue[]>;
  /** Shows at their fields the problems the server found in a refused save (until the next edit). */
  onRefused: (issues: Issue[]) => void;
}) {
  const form = useFormContext<DesignDocument>();
  const baseNumber = base?.number ?? null;
  const save = useSaveRevision(cantileverId);
  const [open, setOpen] = useState(false);
  const [message, setMessage] = useState('');
  const [error, setError] = useState<string | null>(null);
  const [conflict, setConflict] = useState<RevisionDto | null>(null);
  const [draft, setDraft] = useState<DesignDocument | null>(null);
  const [problems, setProblems] = useState<Issue[]>([]);
  const [status, setStatus] = useState<string | null>(null);
  const statusRef = useRef<HTMLParagraphElement>(null);
  const focusAfter = useRef<string | null>(null);

  /** Validates first: invalid inputs open the list of them instead of the message box. */
  async function openSave() {
    setStatus(null);
    setError(null);
    setProblems(await checkProblems());
    setOpen(true);
  }

  function pickProblem(path: string) {
    focusAfter.current = path;
    setOpen(false);
  }

  // Runs after the dialog has closed (and put focus back on the button it came from).
  useEffect(() => {
    if (open || focusAfter.current === null) return;
    const target = focusAfter.current;
    focusAfter.current = null;
    if (target === STATUS) statusRef.current?.focus();
    else focusField(target);
  }, [open]);

  function onSave(text: string) {
    setMessage(text);
    setError(null);
    const input = form.getValues();
    save.mutate(
      { baseRevision: baseNumber, message: text, input },
      {
        onSuccess: (revision) => {
          setBase(revision);
          form.reset(input);
          setMessage('');
          setDraft(null);
          setStatus(`Saved as revision ${revision.number}.`);
          focusAfter.current = STATUS;
          setOpen(false);
        },
        onError: (err) => {
          const latest = staleLatest(err);
          if (latest) {
            setOpen(false);
            setConflict(latest);
            return;
          }
          if (err instanceof ApiError && err.issues.length > 0) {
            const issues = err.issues.map((i) => ({
              path: i.path.replace(/^input\./, ''),
              message: i.message,
            }));
            onRefused(issues);
            setProblems(issues);
            return;
          }
          setError(errorText(err));
        },
      },
    );
  }

  const nothingToSave = !dirty && baseNumber !== null;
  const onKey = useRef<(e: KeyboardEvent) => void>(() => undefined);
  useEffect(() => {
    onKey.current = (e: KeyboardEvent) => {
      if (!isSaveKey(e)) return;
      // The desk never hands these keys to the browser's "save page".
      e.preventDefault();
      if (!mayEdit || conflict || save.isPending) return;
      const dialogForm = document.getElementById(SAVE_FORM_ID);
      if (dialogForm instanceof HTMLFormElement) dialogForm.requestSubmit();
      else if (open) return;
      else if (nothingToSave) setStatus(`Nothing to save: the inputs are those of revision ${baseNumber}.`);
      else void openSave();
    };
  });
  useEffect(() => {
    const listener = (e: KeyboardEvent) => onKey.current(e);
    window.addEventListener('keydown', listener);
    return () => window.removeEventListener('keydown', listener);
  }, []);

  function keepMine() {
    if (!conflict) return;
    const mine = form.getValues();
    replaceKeepingDirty(form, toUserUnits(conflict.input), mine);
    setBase(conflict);
    setConflict(null);
    setOpen(true);
  }

  function loadLatest() {
    if (!conflict) return;
    setDraft(form.getValues());
    form.reset(toUserUnits(conflict.input));
    setBase(conflict);
    setConflict(null);
  }

  function restoreDraft() {
    if (!draft) return;
    replaceKeepingDirty(form, form.formState.defaultValues as DesignDocument, draft);
    setDraft(null);
  }

  if (!mayEdit) return <span className="text-xs text-concrete-500">Read only for your role</span>;
  return (
    <>
      {draft ? (
        <span className="flex items-center gap-1 text-xs">
          Your unsaved version is kept.
          <Button size="sm" onClick={restoreDraft}>
            Restore my version
          </Button>
        </span>
      ) : null}
      <p
        ref={statusRef}
        tabIndex={-1}
        role="status"
        data-testid="save-status"
        className="text-xs text-concrete-700 empty:hidden focus:outline-none focus-visible:outline-2"
      >
        {dirty ? null : status}
      </p>
      <Button
        variant={dirty || baseNumber === null ? 'primary' : 'secondary'}
        disabled={nothingToSave}
        aria-keyshortcuts="Control+S Meta+S"
        title="Save revision (Ctrl+S)"
        onClick={() => void openSave()}
      >
        <Save size={14} aria-hidden="true" /> Save revision
      </Button>
      {open ? (
        <SaveDialog
          open
          onClose={() => setOpen(false)}
          onSave={onSave}
          saving={save.isPending}
          error={error}
          initialMessage={message}
          nextLabel={
            baseNumber
              ? `Saves as revision ${baseNumber + 1}, on top of revision ${baseNumber}.`
              : 'Saves as revision 1, the first of this cantilever.'
          }
          problems={problems}
          onPickProblem={pickProblem}
        />
      ) : null}
      <ConflictDialog
        latest={conflict}
        mine={form.getValues()}
        onKeepMine={keepMine}
        onLoadLatest={loadLatest}
        onClose={() => setConflict(null)}
      />
      <LeaveGuard dirty={dirty && !save.isPending} />
    </>
  );
}
