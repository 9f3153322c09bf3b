import { Download } from 'lucide-react';

/** Where the server makes one revision's plate schedule (the session cookie goes along). */
export const revisionScheduleUrl = (revisionId: number) => `/api/revisions/${revisionId}/plate-schedule.csv`;

function reasonDisabled(revisionId: number | null, dirty: boolean, hasConnection: boolean): string | null {
  if (revisionId === null) return 'Save a revision first: the schedule is made from a saved revision.';
  if (dirty)
    return 'Save your changes first: the schedule is made from the saved revision, not from the inputs on screen.';
  if (!hasConnection) return 'No connection, so there is no plate to schedule.';
  return null;
}

/**
 * The fabricator's plate schedule of the saved revision, as a CSV download. Without a saved,
 * unchanged design with a connection there is nothing true to download, so the link says why not.
 */
export function PlateScheduleLink({
  revisionId,
  dirty,
  hasConnection,
}: {
  revisionId: number | null;
  dirty: boolean;
  hasConnection: boolean;
}) {
  const reason = reasonDisabled(revisionId, dirty, hasConnection);
  const label = (
    <>
      <Download size={14} aria-hidden="true" /> Plate schedule (CSV)
    </>
  );
  if (reason !== null || revisionId === null) {
    return (
      <p className="mt-2 flex flex-wrap items-center gap-2 text-sm">
        <a
          role="link"
          aria-disabled="true"
          aria-describedby="plate-schedule-why"
          className="flex items-center gap-1 text-concrete-500"
          data-testid="plate-schedule-link"
        >
          {label}
        </a>
        <span id="plate-schedule-why" className="text-xs text-concrete-600">
          {reason}
        </span>
      </p>
    );
  }
  return (
    <p className="mt-2 text-sm">
      <a
        href={revisionScheduleUrl(revisionId)}
        download
        className="inline-flex items-center gap-1 text-oxide-700 underline"
        data-testid="plate-schedule-link"
      >
        {label}
      </a>
    </p>
  );
}
