import { useState } from 'react';
import { Button } from '../../../components/ui/button';
import { Dialog } from '../../../components/ui/dialog';
import { Field, describedBy, inputClass } from '../../../components/ui/field';

/** Asks what changed before a revision is saved; the message is required. */
export function SaveDialog({
  open,
  onClose,
  onSave,
  saving,
  error,
  initialMessage = '',
  baseLabel,
}: {
  open: boolean;
  onClose: () => void;
  onSave: (message: string) => void;
  saving: boolean;
  error: string | null;
  initialMessage?: string;
  baseLabel: string;
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
  return (
    <Dialog open={open} title="Save revision" onClose={onClose}>
      <form
        className="flex flex-col gap-3"
        onSubmit={(e) => {
          e.preventDefault();
          setTouched(true);
          if (!empty && message.length <= 500) onSave(message.trim());
        }}
      >
        <p className="text-sm text-concrete-600">{baseLabel}</p>
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
