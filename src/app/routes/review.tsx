import { useParams } from 'react-router-dom';
import { useQuery } from '@tanstack/react-query';
import { revisionQueryOptions } from '../../lib/api/revisions/get-revision';
import { useMe } from '../../lib/api/me/get-me';
import { errorText } from '../../lib/error-text';
import { ReviewView } from '../../features/review/components/review-view';
import { useRevisions } from '../../lib/api/revisions/get-revisions';
import { RevisionEvidence } from '../revision-evidence';

/** Review: one revision, for the engineer who decides on it. */
export default function ReviewRoute() {
  const revisionId = Number(useParams().revisionId);
  const valid = Number.isInteger(revisionId) && revisionId > 0;
  // The input and result never change, but the review state does: fetch it fresh on every visit.
  const revision = useQuery({
    ...revisionQueryOptions(valid ? revisionId : 0),
    enabled: valid,
    staleTime: 0,
  });
  const me = useMe();
  const list = useRevisions(revision.data?.cantileverId ?? 0);
  const newerList = revision.data ? (list.data ?? []).filter((r) => r.number > revision.data.number) : [];
  const newer = newerList.length
    ? { id: newerList[0].id, number: newerList[0].number, count: newerList.length }
    : null;

  return (
    <div className="mx-auto max-w-5xl space-y-4 p-4 sm:p-6">
      {!valid && (
        <p role="alert" className="text-util-over">
          This address does not name a revision.
        </p>
      )}
      {valid && revision.isPending && (
        <p role="status" className="text-concrete-600">
          Loading the revision…
        </p>
      )}
      {revision.isError && (
        <p role="alert" className="text-util-over">
          The revision could not be loaded: {errorText(revision.error)}
        </p>
      )}
      {revision.data && (
        <ReviewView
          revision={revision.data}
          user={me.data}
          newer={newer}
          evidence={<RevisionEvidence revision={revision.data} />}
        />
      )}
    </div>
  );
}
