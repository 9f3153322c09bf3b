import { Save } from 'lucide-react';
import { useState } from 'react';
import { useFormContext } from 'react-hook-form';
import type { RevisionDto } from '../../../../shared/schemas/api';
import type { DesignDocument, DesignInput } from '../../../../shared/schemas/design';
import { Button } from '../../../components/ui/button';
import { ApiError } from '../../../lib/api-client';
import { staleLatest, useSaveRevision } from '../../../lib/api/revisions/save-revision';
import { replaceKeepingDirty } from '../hooks/use-units-switch';
import { ConflictDialog } from './conflict-dialog';
import { LeaveGuard } from './leave-guard';
import { SaveDialog } from './save-dialog';

/**
 * "Save revision": asks for a message, posts against the base revision; a stale base opens the
 * conflict dialog (keep mine on top of the latest, or load the latest with mine kept to restore).
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

  async function onSave(text: string) {
    setMessage(text);
    setError(null);
    if (!(await form.trigger())) {
      setError('Some inputs have problems. Fix the fields marked in red, then save.');
      return;
    }
    const input = form.getValues();
    save.mutate(
      { baseRevision: base, message: text, input },
      {
        onSuccess: (revision) => {
          setBase(revision);
          form.reset(input);
          setOpen(false);
          setMessage('');
          setDraft(null);
        },
        onError: (err) => {
          const latest = staleLatest(err);
          if (latest) {
            setOpen(false);
            setConflict(latest);
            return;
          }
          if (err instanceof ApiError && err.issues.length > 0) {
            for (const issue of err.issues) {
              const name = issue.path.replace(/^input\./, '').replace(/\[(\d+)\]/g, '.$1');
              form.setError(name as 'member.length', { type: 'server', message: issue.message });
            }
          }
          setError(err.message);
        },
      },
    );
  }

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
      <Button
        variant={dirty || base === null ? 'primary' : 'secondary'}
        disabled={!dirty && base !== null}
        onClick={() => setOpen(true)}
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
          baseLabel={base ? `Saved as the next revision after revision ${base}.` : 'Saved as revision 1.'}
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
