/** Placeholder until the team feature lands: add and remove project members (admin). */
export function ProjectMembersPanel({ projectId }: { projectId: number }) {
  return <p className="text-sm text-concrete-600" data-project={projectId}>Team management is not available yet.</p>;
}
