import { useMemo, useState } from 'react';
import { useLocation, useNavigate, useParams } from 'react-router-dom';
import { exampleDesign } from '../../../shared/engine/examples';
import type { ShapeRecord } from '../../../shared/engine/shapes/types';
import { EDIT_RIGHTS } from '../../../shared/schemas/api';
import { paths } from '../../config/paths';
import { ErrorNote, Loading } from '../../components/ui/status';
import { prepareDocument } from '../../features/desk/lib/prepare-document';
import { StudyScreen } from '../../features/study/components/study-screen';
import { useCantilever } from '../../lib/api/cantilevers/get-cantilever';
import { useMe } from '../../lib/api/me/get-me';
import { useRevision } from '../../lib/api/revisions/get-revision';
import { useShapes } from '../../lib/api/shapes/get-shapes';
import { proposalState } from '../../lib/desk-proposal';
import { readStudyStart } from '../../lib/study-handoff';

const NO_SHAPES: ShapeRecord[] = [];

/** The reach study of a cantilever, from the desk's document (handed over) or its current revision. */
export default function ReachStudyRoute() {
  const cantileverId = Number(useParams().cantileverId);
  const location = useLocation();
  const navigate = useNavigate();
  const [handed] = useState(() => readStudyStart(location.state));
  const me = useMe();
  const cantilever = useCantilever(cantileverId);
  const revision = useRevision(handed ? null : (cantilever.data?.currentRevisionId ?? null));
  const shapes = useShapes(cantilever.data?.projectId);
  const custom = useMemo(() => shapes.data?.shapes.filter((s) => s.custom) ?? NO_SHAPES, [shapes.data]);
  const system = me.data?.units === 'SI' ? 'SI' : 'US';
  const start =
    handed?.document ?? revision.data?.input ?? (cantilever.data?.currentRevisionId ? null : exampleDesign);
  const document = useMemo(() => (start ? prepareDocument(start, system) : null), [start, system]);

  if (cantilever.isError || revision.isError)
    return (
      <div className="p-6">
        <ErrorNote error={cantilever.error ?? revision.error}>This cantilever could not be loaded.</ErrorNote>
      </div>
    );
  if (!me.data || !cantilever.data || !document) return <Loading label="Opening the reach study…" />;
  const note = handed
    ? handed.unsaved
      ? "Starting from the desk's inputs, including its unsaved changes."
      : "Starting from the desk's inputs."
    : revision.data
      ? `Starting from revision ${revision.data.number}.`
      : 'Starting from the example design (nothing is saved yet).';
  return (
    <StudyScreen
      key={cantileverId}
      cantilever={cantilever.data}
      document={document}
      startNote={note}
      customShapes={custom}
      mayUse={EDIT_RIGHTS[me.data.role].member}
      onPropose={(proposal) => navigate(paths.desk(cantileverId), { state: proposalState(proposal) })}
    />
  );
}
