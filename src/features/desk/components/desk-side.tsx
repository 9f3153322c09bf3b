import { memo, type ReactNode } from 'react';
import { RevisionList } from './revision-list';

/** Revisions and files of the cantilever, under the results; the files panel comes from the route. */
export const DeskSide = memo(function DeskSide({
  cantileverId,
  current,
  files,
}: {
  cantileverId: number;
  current: number | null;
  files: ReactNode;
}) {
  return (
    <div className="grid gap-3 xl:grid-cols-2">
      <section aria-label="Revisions" className="rounded-md border border-concrete-300 bg-white p-3">
        <h2 className="mb-2 text-sm font-semibold text-concrete-800">Revisions</h2>
        <RevisionList cantileverId={cantileverId} current={current} />
      </section>
      <section aria-label="Files" className="rounded-md border border-concrete-300 bg-white p-3">
        <h2 className="mb-2 text-sm font-semibold text-concrete-800">Files</h2>
        {files}
      </section>
    </div>
  );
});
