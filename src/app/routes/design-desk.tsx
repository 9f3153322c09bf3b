import { useCallback, useState } from 'react';
import { useLocation, useParams } from 'react-router-dom';
import { exampleDesign } from '../../../shared/engine/examples';
import type { DesignDocument } from '../../../shared/schemas/design';
import { ErrorNote, Loading } from '../../components/ui/status';
import { useMe } from '../../lib/api/me/get-me';
import { useCantilever } from '../../lib/api/cantilevers/get-cantilever';
import { AttachmentsPanel } from '../../features/attachments/components/attachments-panel';
import { DeskEditor } from '../../features/desk/components/desk-editor';
import { prepareDocument } from '../../features/desk/lib/prepare-document';
import { useRevision } from '../../lib/api/revisions/get-revision';
import { readProposal } from '../../lib/desk-proposal';

export default function DesignDeskRoute() {
  const cantileverId = Number(useParams().cantileverId);
  // A point or a section handed over from the reach study, read once when the desk opens.
  const location = useLocation();
  const [proposal] = useState(() => readProposal(location.state));
  const me = useMe();
  const cantilever = useCantilever(cantileverId);
  // The revision the desk opened on stays put while later saves move the cantilever's pointer.
  const [openedOn, setOpenedOn] = useState<number | null | undefined>(undefined);
  if (cantilever.data && openedOn === undefined) setOpenedOn(cantilever.data.currentRevisionId);
  const revision = useRevision(openedOn ?? null);
  const system = me.data?.units === 'SI' ? 'SI' : 'US';
  const toUserUnits = useCallback((doc: DesignDocument) => prepareDocument(doc, system), [system]);

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
  if (!me.data || !cantilever.data || openedOn === undefined || (openedOn !== null && !revision.data))
    return <Loading label="Opening the design desk…" />;
  const start = revision.data ?? null;
  const initialDoc = toUserUnits(start?.input ?? exampleDesign);
  return (
    <DeskEditor
      key={cantileverId}
      cantilever={cantilever.data}
      revision={start}
      initialDoc={initialDoc}
      user={me.data}
      toUserUnits={toUserUnits}
      proposal={proposal}
      files={<AttachmentsPanel cantileverId={cantileverId} />}
    />
  );
}
