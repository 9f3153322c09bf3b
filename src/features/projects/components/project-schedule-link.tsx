import { Download } from 'lucide-react';

/** Where the server makes the plate schedule of every cantilever's current revision in a project. */
export const projectScheduleUrl = (projectId: number) => `/api/projects/${projectId}/plate-schedule.csv`;

/** The project's plate schedule as a CSV download (one row per cantilever with a connection). */
export function ProjectScheduleLink({ projectId }: { projectId: number }) {
  return (
    <a
      href={projectScheduleUrl(projectId)}
      download
      className="inline-flex items-center gap-1 text-sm text-oxide-700 underline"
      data-testid="project-schedule-link"
    >
      <Download size={14} aria-hidden="true" /> Plate schedule (CSV)
    </a>
  );
}
