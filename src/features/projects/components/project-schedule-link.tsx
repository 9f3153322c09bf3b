import { Download } from 'lucide-react';

/** The project's plate schedule: approved revisions only, or with the newer drafts marked. */
export const projectScheduleUrl = (projectId: number, drafts = false) =>
  `/api/projects/${projectId}/plate-schedule.csv${drafts ? '?include=drafts' : ''}`;

/**
 * The project's plate schedule as a CSV download: each cantilever at its latest approved revision.
 * The second link adds newer drafts, marked "not approved" in every row.
 */
export function ProjectScheduleLink({ projectId }: { projectId: number }) {
  return (
    <span className="inline-flex flex-wrap items-center gap-3 text-sm">
      <a
        href={projectScheduleUrl(projectId)}
        download
        className="inline-flex items-center gap-1 text-oxide-700 underline"
        data-testid="project-schedule-link"
      >
        <Download size={14} aria-hidden="true" /> Plate schedule (CSV, approved revisions)
      </a>
      <a
        href={projectScheduleUrl(projectId, true)}
        download
        className="text-xs text-concrete-600 underline"
        data-testid="project-schedule-drafts-link"
      >
        with drafts, marked
      </a>
    </span>
  );
}
