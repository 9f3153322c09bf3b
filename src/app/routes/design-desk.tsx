import { useMemo, useState } from 'react';
import { useLoaderData, useLocation, useParams } from 'react-router-dom';
import { exampleDesign } from '../../../shared/engine/examples';
import { ErrorNote, Loading } from '../../components/ui/status';
import { useMe } from '../../lib/api/me/get-me';
import { useCantilever } from '../../lib/api/cantilevers/get-cantilever';
import { AttachmentsPanel } from '../../features/attachments/components/attachments-panel';
import { DeskEditor } from '../../features/desk/components/desk-editor';
import { prepareDocument } from '../../features/desk/lib/prepare-document';
import { useRevision } from '../../lib/api/revisions/get-revision';
import { readProposal } from '../../lib/desk-proposal';
import type { DeskOpening } from './design-desk-loader';

export default function DesignDeskRoute() {
  const cantileverId = Number(useParams().cantileverId);
  // A point or a section handed over from the reach study, read once when the desk opens.
  const location = useLocation();
  const [proposal] = useState(() => readProposal(location.state));
  // The revision the desk opens on, chosen by the route loader (its data is already in the cache).
  const opening = useLoaderData<DeskOpening>();
  const me = useMe();
  const cantilever = useCantilever(cantileverId);
  // Only when the loader's read failed and a later retry of the query succeeded.
  const revisionId =
    opening.revisionId !== undefined ? opening.revisionId : cantilever.data?.currentRevisionId;
  const revision = useRevision(revisionId ?? null);
  const start = revisionId ? revision.data : null;
  const system = me.data?.units === 'SI' ? 'SI' : 'US';
  // The person's unit system at opening; from then on the form's own `units` field is the only one.
  const initialDoc = useMemo(
    () => (start === undefined ? null : prepareDocument(start?.input ?? exampleDesign, system)),
    [start, system],
  );

  if (cantilever.isError)
    return (
      <div className="p-6">
        <ErrorNote error={cantilever.error}>This cantilever could not be loaded.</ErrorNote>
      </div>
    );
  if (revision.isError)
    return (
      <div className="p-6">
        <ErrorNote error={revision.error}>Its current revision could not be loaded.</ErrorNote>
      </div>
    );
  if (!me.data || !cantilever.data || revisionId === undefined || start === undefined || !initialDoc)
    return <Loading label="Opening the design desk…" />;
  return (
    <DeskEditor
      key={cantileverId}
      cantilever={cantilever.data}
      revision={start}
      initialDoc={initialDoc}
      user={me.data}
      proposal={proposal}
      files={<AttachmentsPanel cantileverId={cantileverId} />}
    />
  );
}
