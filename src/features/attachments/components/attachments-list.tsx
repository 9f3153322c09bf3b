import { useId, useState } from 'react';
import { Download, Eye, Pencil, Trash2 } from 'lucide-react';
import { ATTACHMENT_DESCRIPTION_MAX, type AttachmentDto, type UserDto } from '../../../../shared/schemas/api';
import { Button } from '../../../components/ui/button';
import { Dialog } from '../../../components/ui/dialog';
import { inputClass } from '../../../components/ui/field';
import { errorText } from '../../../lib/error-text';
import { formatDate } from '../../../lib/format';
import { useDeleteAttachment, useUpdateAttachment } from '../api/change-attachment';
import { attachmentUrl } from '../api/get-attachments';
import { formatBytes } from '../utils/upload-messages';

const TYPE_WORDS: Record<string, string> = {
  'application/pdf': 'PDF',
  'image/png': 'PNG image',
  'image/jpeg': 'JPEG image',
  'image/vnd.dxf': 'DXF drawing',
  'text/csv': 'CSV table',
};

const isImage = (a: AttachmentDto) => a.mimeType === 'image/png' || a.mimeType === 'image/jpeg';

/** The uploader edits the description in place. */
function DescriptionEditor({
  attachment,
  cantileverId,
  onDone,
}: {
  attachment: AttachmentDto;
  cantileverId: number;
  onDone: (message: string) => void;
}) {
  const id = useId();
  const [text, setText] = useState(attachment.description);
  const update = useUpdateAttachment(cantileverId);
  return (
    <form
      className="mt-1 flex flex-wrap items-end gap-2"
      onSubmit={(e) => {
        e.preventDefault();
        update.mutate(
          { id: attachment.id, body: { description: text } },
          { onSuccess: () => onDone(`The description of “${attachment.originalName}” was saved.`) },
        );
      }}
    >
      <div className="flex min-w-48 flex-1 flex-col gap-0.5">
        <label htmlFor={id} className="text-xs font-medium text-concrete-700">
          Description of {attachment.originalName}
        </label>
        <input
          id={id}
          type="text"
          value={text}
          maxLength={ATTACHMENT_DESCRIPTION_MAX}
          onChange={(e) => setText(e.target.value)}
          className={inputClass(update.isError)}
          data-autofocus
        />
      </div>
      <Button type="submit" size="sm" disabled={update.isPending}>
        Save
      </Button>
      <Button type="button" size="sm" variant="ghost" onClick={() => onDone('')}>
        Cancel
      </Button>
      {update.isError ? (
        <p role="alert" className="w-full text-xs text-util-over">
          {errorText(update.error)}
        </p>
      ) : null}
    </form>
  );
}

/**
 * The cantilever's files: name, description, the revision it belongs to, type, size, uploader,
 * date and a short checksum; preview and download; the uploader edits the description; the
 * uploader or an admin deletes a file after a confirmation.
 */
export function AttachmentsList({
  attachments,
  cantileverId,
  me,
}: {
  attachments: AttachmentDto[];
  cantileverId: number;
  me?: Pick<UserDto, 'id' | 'role'>;
}) {
  const [editing, setEditing] = useState<number | null>(null);
  const [confirming, setConfirming] = useState<AttachmentDto | null>(null);
  const [status, setStatus] = useState('');
  const remove = useDeleteAttachment(cantileverId);
  const mayDelete = (a: AttachmentDto) => Boolean(me && (me.id === a.uploaderId || me.role === 'admin'));

  return (
    <div>
      {attachments.length === 0 ? (
        <p className="text-sm text-concrete-600">No files yet.</p>
      ) : (
        <ul className="divide-y divide-concrete-100">
          {attachments.map((a) => (
            <li key={a.id} className="flex flex-wrap items-start gap-x-3 gap-y-1 py-2 text-sm">
              {isImage(a) && (
                <img
                  src={attachmentUrl(a.id, true)}
                  alt={`Preview of ${a.originalName}`}
                  loading="lazy"
                  className="h-12 w-16 rounded border border-concrete-200 object-cover"
                />
              )}
              <div className="min-w-0 flex-1 basis-40">
                <p className="truncate font-medium text-concrete-900">
                  {a.originalName}
                  {a.revisionNumber !== null ? (
                    <span className="ml-2 rounded border border-concrete-300 px-1 text-xs font-normal text-concrete-700">
                      revision {a.revisionNumber}
                    </span>
                  ) : null}
                </p>
                {a.description && editing !== a.id ? (
                  <p className="break-words text-concrete-800">{a.description}</p>
                ) : null}
                <p className="text-xs text-concrete-600">
                  {TYPE_WORDS[a.mimeType] ?? a.mimeType} · {formatBytes(a.size)} · {a.uploaderName} ·{' '}
                  <time dateTime={a.createdAt}>{formatDate(a.createdAt)}</time> ·{' '}
                  <abbr title={`SHA-256 ${a.sha256}`} className="font-mono no-underline">
                    sha256 {a.sha256.slice(0, 10)}
                  </abbr>
                </p>
                {editing === a.id ? (
                  <DescriptionEditor
                    attachment={a}
                    cantileverId={cantileverId}
                    onDone={(message) => {
                      setEditing(null);
                      setStatus(message);
                    }}
                  />
                ) : null}
              </div>
              {/* The actions on their own line, so a narrow panel keeps the name and words readable. */}
              <div className="flex basis-full flex-wrap items-center gap-x-3 gap-y-1">
                {(a.mimeType === 'application/pdf' || isImage(a)) && (
                  <a
                    href={attachmentUrl(a.id, true)}
                    target="_blank"
                    rel="noopener noreferrer"
                    aria-label={`Open ${a.originalName} in a new tab`}
                    className="inline-flex items-center gap-1 text-oxide-700 underline"
                  >
                    <Eye aria-hidden="true" className="h-4 w-4" />
                    Open
                  </a>
                )}
                <a
                  href={attachmentUrl(a.id)}
                  download={a.originalName}
                  aria-label={`Download ${a.originalName}`}
                  className="inline-flex items-center gap-1 text-oxide-700 underline"
                >
                  <Download aria-hidden="true" className="h-4 w-4" />
                  Download
                </a>
                {me?.id === a.uploaderId && editing !== a.id ? (
                  <Button
                    size="sm"
                    variant="ghost"
                    aria-label={`Edit the description of ${a.originalName}`}
                    onClick={() => {
                      setEditing(a.id);
                      setStatus('');
                    }}
                  >
                    <Pencil aria-hidden="true" className="h-4 w-4" />
                    Describe
                  </Button>
                ) : null}
                {mayDelete(a) ? (
                  <Button
                    size="sm"
                    variant="ghost"
                    aria-label={`Delete ${a.originalName}`}
                    onClick={() => {
                      remove.reset();
                      setConfirming(a);
                    }}
                  >
                    <Trash2 aria-hidden="true" className="h-4 w-4" />
                    Delete
                  </Button>
                ) : null}
              </div>
            </li>
          ))}
        </ul>
      )}
      <p role="status" aria-live="polite" className="text-sm text-concrete-800">
        {status}
      </p>
      <Dialog open={confirming !== null} title="Delete this file?" onClose={() => setConfirming(null)}>
        {confirming ? (
          <div className="space-y-3 text-sm">
            <p>
              “{confirming.originalName}” and its record are removed for everyone on the project. This cannot
              be undone.
            </p>
            {remove.isError ? (
              <p role="alert" className="text-util-over">
                The file was not deleted: {errorText(remove.error)}
              </p>
            ) : null}
            <div className="flex justify-end gap-2">
              <Button onClick={() => setConfirming(null)} data-autofocus>
                Keep the file
              </Button>
              <Button
                variant="danger"
                disabled={remove.isPending}
                onClick={() =>
                  remove.mutate(confirming.id, {
                    onSuccess: () => {
                      setStatus(`Deleted “${confirming.originalName}”.`);
                      setConfirming(null);
                    },
                  })
                }
              >
                {remove.isPending ? 'Deleting…' : 'Delete the file'}
              </Button>
            </div>
          </div>
        ) : null}
      </Dialog>
    </div>
  );
}
