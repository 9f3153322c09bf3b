import { FileDown } from 'lucide-react';

/** Where the server makes the calculation package of a stored revision. */
export const packageUrl = (revisionId: number) => `/api/revisions/${revisionId}/package.pdf`;

/** Download link to a stored revision's calculation package (PDF). */
export function PackageLink({
  revisionId,
  number,
  className,
}: {
  revisionId: number;
  number: number;
  className?: string;
}) {
  return (
    <a
      href={packageUrl(revisionId)}
      download
      data-testid="package-link"
      className={
        className ??
        'inline-flex items-center gap-1 rounded border border-concrete-300 px-3 py-1 text-sm text-concrete-800 hover:bg-concrete-50'
      }
    >
      <FileDown aria-hidden="true" className="h-4 w-4" />
      Calculation package of revision {number} (PDF)
    </a>
  );
}
