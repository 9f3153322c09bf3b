import { useId, useRef, useState } from 'react';
import { Upload } from 'lucide-react';
import { Button } from '../../../components/ui/button';
import { useUploadAttachment } from '../api/upload-attachment';
import { ACCEPTED, uploadErrorText, uploadHint } from '../utils/upload-messages';

/** Choose a file and upload it with a progress bar; the outcome is announced. */
export function UploadControl({ cantileverId }: { cantileverId: number }) {
  const inputId = useId();
  const inputRef = useRef<HTMLInputElement>(null);
  const [file, setFile] = useState<File | null>(null);
  const [progress, setProgress] = useState<number | null>(null);
  const [status, setStatus] = useState('');
  const upload = useUploadAttachment(cantileverId);
  const hint = file ? uploadHint(file) : null;

  function start() {
    if (!file) return;
    setStatus('');
    setProgress(0);
    upload.mutate(
      { file, onProgress: setProgress },
      {
        onSuccess: (saved) => {
          setStatus(`Uploaded “${saved.originalName}”.`);
          setFile(null);
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
            className="text-sm file:mr-2 file:rounded file:border file:border-concrete-300 file:bg-white file:px-2 file:py-1"
          />
        </div>
        <Button onClick={start} disabled={!file || upload.isPending}>
          <Upload aria-hidden="true" className="h-4 w-4" />
          {upload.isPending ? 'Uploading…' : 'Upload'}
        </Button>
      </div>
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
          {uploadErrorText(upload.error)}
        </p>
      )}
    </div>
  );
}
