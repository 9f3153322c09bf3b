import { Save } from 'lucide-react';
import { useContext, useEffect, useRef, useState } from 'react';
import { useFormContext } from 'react-hook-form';
import type { RevisionDto } from '../../../../shared/schemas/api';
import { designSchema, type DesignDocument, type DesignInput } from '../../../../shared/schemas/design';
import { toFieldIssues } from '../../../../shared/schemas/quantity';
import { Button } from '../../../components/ui/button';
import { ApiError } from '../../../lib/api-client';
import { errorText } from '../../../lib/error-text';
import { focusField } from '../lib/focus-field';
import { mergeIssues, toFieldName, type Issue } from '../lib/issue-paths';
import { EngineIssuesContext } from './field-context';
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
 * "Save revision" (also Ctrl/Cmd+S): a design with invalid inputs gets the list of those inputs,
 * not a message box; otherwise it asks for a message and posts against the base revision. A stale
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
}: {
  cantileverId: number;
  base: number | null;
  /** The revision the desk now stands on (its number is shown; its id names the plate schedule). */
  setBase: (revision: { id: number; number: number }) => void;
  dirty: boolean;
  mayEdit: boolean;
  toUserUnits: (doc: DesignDocument) => DesignDocument;
}) {
  const form = useFormContext<DesignDocument, unknown, DesignInput>();
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
  const engineIssues = useContext(EngineIssuesContext);

  /** Validates first: invalid inputs open the list of them instead of the message box. */
  async function openSave() {
    setStatus(null);
    setError(null);
    // trigger() marks the fields in red; the list comes from the same schema the form resolves with.
    const valid = await form.trigger();
    const parsed = designSchema.safeParse(form.getValues());
    const list = mergeIssues(parsed.success ? [] : toFieldIssues(parsed.error), engineIssues);
    if (!valid && list.length === 0)
      list.push({ path: '(document)', message: 'has a problem the form could not place on a field' });
    setProblems(list);
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
      { baseRevision: base, message: text, input },
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
            for (const issue of issues) {
              const name = toFieldName(issue.path);
              form.setError(name as 'member.length', { type: 'server', message: issue.message });
            }
            setProblems(issues);
            return;
          }
          setError(errorText(err));
        },
      },
    );
  }

  const nothingToSave = !dirty && base !== null;
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
      else if (nothingToSave) setStatus(`Nothing to save: the inputs are those of revision ${base}.`);
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
        variant={dirty || base === null ? 'primary' : 'secondary'}
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
            base
              ? `Saves as revision ${base + 1}, on top of revision ${base}.`
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
