import { Plus } from 'lucide-react';
import { useState } from 'react';
import { Link, useNavigate, useParams } from 'react-router-dom';
import { EDIT_RIGHTS } from '../../../shared/schemas/api';
import { paths } from '../../config/paths';
import { Button } from '../../components/ui/button';
import { Dialog } from '../../components/ui/dialog';
import { ErrorNote, Loading } from '../../components/ui/status';
import { ProjectMembersPanel } from '../../features/admin/components/project-members-panel';
import { useMe } from '../../lib/api/me/get-me';
import { useProject } from '../../features/projects/api/get-project';
import { CantileverTable } from '../../features/projects/components/cantilever-table';
import { CreateCantileverForm } from '../../features/projects/components/create-cantilever-form';
import { ScrollBox } from '../../components/ui/scroll-box';
import { ProjectScheduleLink } from '../../features/projects/components/project-schedule-link';

export default function ProjectRoute() {
  const projectId = Number(useParams().projectId);
  const project = useProject(projectId);
  const me = useMe();
  const navigate = useNavigate();
  const [creating, setCreating] = useState(false);
  if (project.isPending) return <Loading />;
  if (project.isError)
    return (
      <div className="p-6">
        <ErrorNote error={project.error}>This project could not be loaded.</ErrorNote>
      </div>
    );
  const p = project.data;
  const role = me.data?.role;
  const mayCreate = role ? EDIT_RIGHTS[role].member : false;
  return (
    <section className="mx-auto max-w-5xl p-4 sm:p-6">
      <p className="text-xs text-concrete-500">
        <Link to={paths.projects} className="underline">
          Projects
        </Link>{' '}
        /
      </p>
      <h1 className="text-xl font-semibold">{p.name}</h1>
      <p className="text-sm text-concrete-600">
        {p.site || 'no site given'} · {p.codeBasis} · {p.units}
      </p>
      <div className="mt-6 mb-2 flex flex-wrap items-center justify-between gap-2">
        <h2 className="font-semibold">Cantilevers</h2>
        <div className="flex flex-wrap items-center gap-4">
          {p.cantilevers.length > 0 ? <ProjectScheduleLink projectId={p.id} /> : null}
          {mayCreate ? (
            <Button variant="primary" onClick={() => setCreating(true)}>
              <Plus size={16} aria-hidden="true" /> New cantilever
            </Button>
          ) : null}
        </div>
      </div>
      <ScrollBox label="Cantilevers">
        <CantileverTable cantilevers={p.cantilevers} mayEdit={role ? role !== 'admin' : false} />
      </ScrollBox>
      <h2 className="mt-8 mb-2 font-semibold">Team</h2>
      {/* An admin gets the one list with adding and removing; everyone else the plain list. */}
      {role === 'admin' ? (
        <ProjectMembersPanel projectId={p.id} />
      ) : (
        <ul className="flex flex-wrap gap-2 text-sm">
          {p.members.map((m) => (
            <li key={m.userId} className="rounded border border-concrete-300 bg-white px-2 py-1">
              {m.displayName} <span className="text-xs text-concrete-500">{m.role}</span>
            </li>
          ))}
        </ul>
      )}
      <Dialog open={creating} title="New cantilever" onClose={() => setCreating(false)}>
        <CreateCantileverForm
          projectId={p.id}
          onDone={(id) => {
            setCreating(false);
            navigate(paths.desk(id));
          }}
        />
      </Dialog>
    </section>
  );
}
