import { FolderPlus } from 'lucide-react';
import { useState } from 'react';
import { Link, useNavigate } from 'react-router-dom';
import { paths } from '../../config/paths';
import { Button } from '../../components/ui/button';
import { Dialog } from '../../components/ui/dialog';
import { ErrorNote, Loading } from '../../components/ui/status';
import { useMe } from '../../lib/api/me/get-me';
import { useProjects } from '../../features/projects/api/get-projects';
import { CreateProjectForm } from '../../features/projects/components/create-project-form';
import { AwaitingReviewList } from '../../features/projects/components/awaiting-review-list';

export default function ProjectsRoute() {
  const projects = useProjects();
  const me = useMe();
  const navigate = useNavigate();
  const [creating, setCreating] = useState(false);
  const mayCreate =
    me.data?.role === 'admin' || me.data?.role === 'engineer' || me.data?.role === 'architect';
  return (
    <section className="mx-auto max-w-5xl p-4 sm:p-6">
      <div className="mb-4 flex items-center justify-between">
        <h1 className="text-xl font-semibold">Projects</h1>
        {mayCreate ? (
          <Button variant="primary" onClick={() => setCreating(true)}>
            <FolderPlus size={16} aria-hidden="true" /> New project
          </Button>
        ) : null}
      </div>
      {me.data?.role === 'engineer' ? <AwaitingReviewList /> : null}
      {projects.isPending ? (
        <Loading />
      ) : projects.isError ? (
        <ErrorNote error={projects.error}>Projects could not be loaded.</ErrorNote>
      ) : projects.data.length === 0 ? (
        <p className="text-sm text-concrete-600">You are not a member of any project yet.</p>
      ) : (
        <ul className="grid gap-3 sm:grid-cols-2">
          {projects.data.map((p) => (
            <li key={p.id}>
              <Link
                to={paths.project(p.id)}
                className="block rounded-md border border-concrete-300 bg-white p-4 hover:border-oxide-500 focus-visible:outline-2 focus-visible:outline-oxide-500"
              >
                <div className="font-medium">{p.name}</div>
                <div className="text-sm text-concrete-600">{p.site || 'no site given'}</div>
                <div className="num mt-2 text-xs text-concrete-500">
                  {p.cantileverCount} cantilever{p.cantileverCount === 1 ? '' : 's'} · {p.units} ·{' '}
                  {p.codeBasis}
                </div>
              </Link>
            </li>
          ))}
        </ul>
      )}
      <Dialog open={creating} title="New project" onClose={() => setCreating(false)}>
        <CreateProjectForm
          onDone={(id) => {
            setCreating(false);
            navigate(paths.project(id));
          }}
        />
      </Dialog>
    </section>
  );
}
