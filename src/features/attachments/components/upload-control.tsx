import { useId, useRef, useState } from 'react';
import { Upload } from 'lucide-react';
import { ATTACHMENT_DESCRIPTION_MAX } from '../../../../shared/schemas/api';
import { Button } from '../../../components/ui/button';
import { inputClass } from '../../../components/ui/field';
import { ApiError } from '../../../lib/api-client';
import { useRevisions } from '../../../lib/api/revisions/get-revisions';
import { useUploadAttachment } from '../api/upload-attachment';
import { ACCEPTED, uploadErrorText, uploadHint } from '../utils/upload-messages';

/** The server's word on one of the text fields, if it named it. */
function issueFor(error: unknown, path: string): string | undefined {
  return error instanceof ApiError ? error.issues.find((i) => i.path === path)?.message : undefined;
}

/**
 * Choose a file, say what it shows and which revision it belongs to (both optional), and upload
 * it with a progress bar; the outcome is announced.
 */
export function UploadControl({ cantileverId }: { cantileverId: number }) {
  const inputId = useId();
  const descriptionId = useId();
  const revisionId = useId();
  const inputRef = useRef<HTMLInputElement>(null);
  const [file, setFile] = useState<File | null>(null);
  const [description, setDescription] = useState('');
  const [revision, setRevision] = useState('');
  const [progress, setProgress] = useState<number | null>(null);
  const [status, setStatus] = useState('');
  const upload = useUploadAttachment(cantileverId);
  const revisions = useRevisions(cantileverId);
  const hint = file ? uploadHint(file) : null;
  const descriptionError = issueFor(upload.error, 'description');
  const revisionError = issueFor(upload.error, 'revisionId');
  const placed = Boolean(descriptionError || revisionError);

  function start() {
    if (!file) return;
    setStatus('');
    setProgress(0);
    upload.mutate(
      {
        file,
        onProgress: setProgress,
        details: { description, revisionId: revision ? Number(revision) : null },
      },
      {
        onSuccess: (saved) => {
          setStatus(`Uploaded “${saved.originalName}”.`);
          setFile(null);
          setDescription('');
          setRevision('');
          if (inputRef.current) inputRef.current.value = '';
        },
        onSettled: () => setProgress(null),
      },
    );
  }

  return (
    <div className="space-y-2">
      <div className="flex flex-wrap items-end gap-2">
        <div className="flex flex-col gap-0.5">
          <label htmlFor={inputId} className="text-xs font-medium text-concrete-700">
            Add a file (PDF, PNG, JPEG, DXF or CSV, up to about 10 MiB)
          </label>
          <input
            id={inputId}
            ref={inputRef}
            type="file"
            accept={ACCEPTED}
            onChange={(e) => {
              setFile(e.target.files?.[0] ?? null);
              upload.reset();
              setStatus('');
            }}
            className="max-w-full text-sm file:mr-2 file:rounded file:border file:border-concrete-300 file:bg-white file:px-2 file:py-1"
          />
        </div>
      </div>
      <div className="grid gap-2">
        <div className="flex flex-col gap-0.5">
          <label htmlFor={descriptionId} className="text-xs font-medium text-concrete-700">
            Description (optional)
          </label>
          <input
            id={descriptionId}
            type="text"
            value={description}
            maxLength={ATTACHMENT_DESCRIPTION_MAX}
            placeholder="What the file shows, e.g. pier elevation, sheet 2"
            aria-invalid={descriptionError ? true : undefined}
            aria-describedby={descriptionError ? `${descriptionId}-error` : undefined}
            onChange={(e) => setDescription(e.target.value)}
            className={inputClass(Boolean(descriptionError))}
          />
          {descriptionError ? (
            <p id={`${descriptionId}-error`} className="text-xs text-util-over">
              Description {descriptionError}
            </p>
          ) : null}
        </div>
        <div className="flex flex-col gap-0.5">
          <label htmlFor={revisionId} className="text-xs font-medium text-concrete-700">
            Belongs to
          </label>
          <select
            id={revisionId}
            value={revision}
            aria-invalid={revisionError ? true : undefined}
            aria-describedby={revisionError ? `${revisionId}-error` : undefined}
            onChange={(e) => setRevision(e.target.value)}
            className={inputClass(Boolean(revisionError))}
          >
            <option value="">the cantilever (no particular revision)</option>
            {(revisions.data ?? []).map((r) => (
              <option key={r.id} value={String(r.id)}>
                revision {r.number}: {r.message.length > 40 ? `${r.message.slice(0, 39)}…` : r.message}
              </option>
            ))}
          </select>
          {revisionError ? (
            <p id={`${revisionId}-error`} className="text-xs text-util-over">
              Revision {revisionError}
            </p>
          ) : null}
        </div>
      </div>
      <Button onClick={start} disabled={!file || upload.isPending}>
        <Upload aria-hidden="true" className="h-4 w-4" />
        {upload.isPending ? 'Uploading…' : 'Upload'}
      </Button>
      {hint && <p className="text-sm text-oxide-700">{hint}</p>}
      {progress !== null && (
        <div className="flex items-center gap-2 text-xs text-concrete-700">
          <progress
            max={1}
            value={progress}
            aria-label="Upload progress"
            className="h-2 w-48 accent-oxide-600"
          />
          <span className="tabular-nums">{Math.round(progress * 100)} %</span>
        </div>
      )}
      <p role="status" aria-live="polite" className="text-sm text-concrete-800">
        {status}
      </p>
      {upload.isError && (
        <p role="alert" className="text-sm text-util-over">
          {placed ? 'The upload was refused; see the field above.' : uploadErrorText(upload.error)}
        </p>
      )}
    </div>
  );
}
