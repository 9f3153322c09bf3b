import { useState } from 'react';
import { useMe } from '../../lib/api/me/get-me';
import { ShapesBrowser } from '../../components/shapes/shapes-browser';
import { inputClass } from '../../components/ui/field';
import { useProjects } from '../../features/projects/api/get-projects';
import { ShapeImport } from '../../features/shapes/components/shape-import';

/**
 * The shapes of one project (its own imports, the organisation's and the published table), or the
 * organisation's alone. Imported shapes belong to a project; an admin imports organisation shapes.
 */
export default function ShapesRoute() {
  const me = useMe();
  const projects = useProjects();
  const [chosen, setChosen] = useState<number | null | undefined>(undefined);
  const isAdmin = me.data?.role === 'admin';
  // Design roles start on their first project; an admin on the organisation's shapes.
  const projectId = chosen !== undefined ? chosen : isAdmin ? null : (projects.data?.[0]?.id ?? null);
  const project = projects.data?.find((p) => p.id === projectId) ?? null;
  const mayImport = me.data ? (projectId === null ? isAdmin : !isAdmin) : false;
  return (
    <section className="mx-auto flex max-w-7xl flex-col gap-4 p-4 sm:p-6">
      <div>
        <h1 className="text-xl font-semibold">Shapes</h1>
        <p className="text-sm text-concrete-600">
          The open shapes table and the shapes imported for a project or for the whole organisation. Values
          are in US customary units.
        </p>
      </div>
      <div className="flex items-center gap-2 text-sm">
        <label htmlFor="shape-scope">Shapes of</label>
        <select
          id="shape-scope"
          className={inputClass(false, 'w-auto')}
          value={projectId === null ? '' : String(projectId)}
          onChange={(e) => setChosen(e.target.value === '' ? null : Number(e.target.value))}
        >
          <option value="">the organisation only</option>
          {(projects.data ?? []).map((p) => (
            <option key={p.id} value={p.id}>
              project {p.name}
            </option>
          ))}
        </select>
      </div>
      <ShapesBrowser projectId={projectId ?? undefined} />
      {mayImport ? (
        <ShapeImport
          projectId={projectId}
          scopeName={project ? `the project ${project.name}` : 'the organisation'}
        />
      ) : (
        <p className="text-sm text-concrete-600">
          {isAdmin
            ? 'Admins import organisation shapes: choose "the organisation only".'
            : 'Choose one of your projects to import shapes into it.'}
        </p>
      )}
    </section>
  );
}
