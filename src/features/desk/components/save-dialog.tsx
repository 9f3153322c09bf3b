import { useState } from 'react';
import { Button } from '../../../components/ui/button';
import { Dialog } from '../../../components/ui/dialog';
import { Field, describedBy, inputClass } from '../../../components/ui/field';
import type { Issue } from '../lib/issue-paths';
import { FieldProblemList } from './field-problem-list';

/** The id of the message form, so that Ctrl/Cmd+S in the dialog saves. */
export const SAVE_FORM_ID = 'save-revision-form';

/**
 * Saving a revision. A design with invalid inputs cannot be saved: the dialog then lists those
 * inputs in words, each a button to the field, and asks for no message. Otherwise it asks what
 * changed (the message is required).
 */
export function SaveDialog({
  open,
  onClose,
  onSave,
  saving,
  error,
  initialMessage = '',
  nextLabel,
  problems,
  onPickProblem,
}: {
  open: boolean;
  onClose: () => void;
  onSave: (message: string) => void;
  saving: boolean;
  error: string | null;
  initialMessage?: string;
  /** What the save makes, in the future tense: "Saves as revision 3, on top of revision 2." */
  nextLabel: string;
  problems: readonly Issue[];
  onPickProblem: (path: string) => void;
}) {
  const [message, setMessage] = useState(initialMessage);
  const [touched, setTouched] = useState(false);
  const empty = message.trim().length === 0;
  const fieldError =
    touched && empty
      ? 'is required: describe what changed'
      : message.length > 500
        ? 'is too long (500 characters at most)'
        : undefined;
  if (problems.length > 0) {
    const count = problems.length === 1 ? '1 input needs' : `${problems.length} inputs need`;
    return (
      <Dialog open={open} title="This design cannot be saved yet" onClose={onClose}>
        <div className="flex flex-col gap-3" data-testid="save-blocked">
          <p className="text-sm text-concrete-800" id="save-blocked-text">
            {count} attention first. Choose one to go to its field; nothing has been saved.
          </p>
          <FieldProblemList issues={problems} onPick={onPickProblem} className="text-sm text-util-over" />
          <div className="flex justify-end">
            <Button onClick={onClose} data-autofocus>
              Back to the inputs
            </Button>
          </div>
        </div>
      </Dialog>
    );
  }
  return (
    <Dialog open={open} title="Save revision" onClose={onClose}>
      <form
        id={SAVE_FORM_ID}
        className="flex flex-col gap-3"
        onSubmit={(e) => {
          e.preventDefault();
          setTouched(true);
          if (!empty && message.length <= 500 && !saving) onSave(message.trim());
        }}
      >
        <p className="text-sm text-concrete-700">{nextLabel}</p>
        <Field id="revision-message" label="Message" error={fieldError}>
          <textarea
            id="revision-message"
            data-autofocus
            rows={3}
            value={message}
            onChange={(e) => setMessage(e.target.value)}
            className={inputClass(Boolean(fieldError))}
            {...describedBy('revision-message', fieldError)}
          />
        </Field>
        {error ? (
          <p role="alert" className="text-sm text-util-over">
            {error}
          </p>
        ) : null}
        <div className="flex justify-end gap-2">
          <Button onClick={onClose}>Cancel</Button>
          <Button type="submit" variant="primary" disabled={saving}>
            {saving ? 'Saving…' : 'Save revision'}
          </Button>
        </div>
      </form>
    </Dialog>
  );
}
