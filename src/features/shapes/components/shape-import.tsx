import { Upload } from 'lucide-react';
import { useRef, useState } from 'react';
import { Button } from '../../../components/ui/button';
import { ApiError } from '../../../lib/api-client';
import { useImportShapes } from '../api/import-shapes';

/**
 * Import the published shapes database CSV or a custom CSV into one project (or, for an admin, the
 * organisation); shows progress, the count, every rejected row, and a label already in use with
 * the request for a new name.
 */
export function ShapeImport({ projectId, scopeName }: { projectId: number | null; scopeName: string }) {
  const [progress, setProgress] = useState(0);
  const input = useRef<HTMLInputElement>(null);
  const upload = useImportShapes(setProgress);
  const [file, setFile] = useState<File | null>(null);

  return (
    <section aria-labelledby="import-title" className="rounded-md border border-concrete-300 bg-white p-3">
      <h2 id="import-title" className="text-sm font-semibold">
        Import shapes into {scopeName}
      </h2>
      <p className="text-xs text-concrete-600">
        The published shapes database file, or your own CSV with a label, a family (W, HSS, PIPE, C) and the
        property columns. A label already used here is refused: give the shape a new name in the file.
      </p>
      <form
        className="mt-2 flex flex-wrap items-center gap-2"
        onSubmit={(e) => {
          e.preventDefault();
          if (file) {
            setProgress(0);
            upload.mutate({ file, projectId });
          }
        }}
      >
        <label htmlFor="shape-file" className="text-sm">
          CSV file
        </label>
        <input
          id="shape-file"
          ref={input}
          type="file"
          accept=".csv,text/csv"
          onChange={(e) => setFile(e.target.files?.[0] ?? null)}
          className="text-sm file:mr-2 file:rounded file:border file:border-concrete-300 file:bg-concrete-100 file:px-2 file:py-1"
        />
        <Button type="submit" variant="primary" disabled={!file || upload.isPending}>
          <Upload size={14} aria-hidden="true" /> Import
        </Button>
      </form>
      {upload.isPending ? (
        <div className="mt-2" role="status">
          <progress max={1} value={progress} className="w-64" aria-label="Upload progress" />{' '}
          <span className="num text-xs">{Math.round(progress * 100)} %</span>
        </div>
      ) : null}
      {upload.isError ? (
        <div role="alert" className="mt-2 text-sm text-util-over">
          <p>The import failed: {upload.error.message}</p>
          {upload.error instanceof ApiError && upload.error.issues.length > 0 ? (
            <ul className="mt-1 list-disc pl-5 text-xs" aria-label="What to change">
              {upload.error.issues.map((issue, i) => (
                <li key={i}>{issue.message}</li>
              ))}
            </ul>
          ) : null}
        </div>
      ) : null}
      {upload.data ? (
        <div className="mt-2 text-sm" role="status" data-testid="import-result">
          <p>
            <strong className="num">{upload.data.imported}</strong> shape
            {upload.data.imported === 1 ? '' : 's'} imported;{' '}
            <strong className="num">{upload.data.rejected.length}</strong> row
            {upload.data.rejected.length === 1 ? '' : 's'} rejected.
          </p>
          {upload.data.rejected.length > 0 ? (
            <table className="mt-1 w-full text-xs" aria-label="Rejected rows">
              <thead>
                <tr className="text-left text-concrete-600">
                  <th className="pr-2 font-medium">Row</th>
                  <th className="pr-2 font-medium">Label</th>
                  <th className="font-medium">Reason</th>
                </tr>
              </thead>
              <tbody>
                {upload.data.rejected.map((r) => (
                  <tr key={r.row} className="border-t border-concrete-200">
                    <td className="num pr-2">{r.row}</td>
                    <td className="pr-2 font-mono">{r.label ?? '—'}</td>
                    <td>{r.reason}</td>
                  </tr>
                ))}
              </tbody>
            </table>
          ) : null}
        </div>
      ) : null}
    </section>
  );
}
