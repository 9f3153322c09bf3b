import { Link, useParams, useSearchParams } from 'react-router-dom';
import { paths } from '../../config/paths';
import { useRevision } from '../../lib/api/revisions/get-revision';
import { errorText } from '../../lib/error-text';
import { CompareView } from '../../features/compare/components/compare-view';
import { CautionNote } from '../../components/ui/caution-note';

/** Compare: two revisions of one cantilever (?a= earlier id, ?b= later id). */
export default function CompareRoute() {
  const cantileverId = Number(useParams().cantileverId);
  const [search] = useSearchParams();
  const idA = Number(search.get('a'));
  const idB = Number(search.get('b'));
  const valid = Number.isInteger(idA) && idA > 0 && Number.isInteger(idB) && idB > 0;
  const a = useRevision(valid ? idA : null);
  const b = useRevision(valid ? idB : null);
  const error = a.error ?? b.error;
  const wrongCantilever =
    (a.data && a.data.cantileverId !== cantileverId) || (b.data && b.data.cantileverId !== cantileverId);

  return (
    <div className="mx-auto max-w-6xl space-y-4 p-4 sm:p-6">
      <nav aria-label="Breadcrumb" className="text-sm text-concrete-600">
        <Link to={paths.history(cantileverId)} className="underline hover:text-oxide-700">
          Back to the history
        </Link>
      </nav>
      <h1 className="text-xl font-semibold text-concrete-900">
        Compare{' '}
        {a.data && b.data ? `revision ${a.data.number} with revision ${b.data.number}` : 'two revisions'}
      </h1>
      {!valid && (
        <>
          <p className="text-concrete-700">Pick two revisions in the history to compare them.</p>
          <CautionNote />
        </>
      )}
      {valid && error && (
        <p role="alert" className="text-util-over">
          A revision could not be loaded: {errorText(error)}
        </p>
      )}
      {valid && !error && (a.isPending || b.isPending) && (
        <p role="status" className="text-concrete-600">
          Loading the two revisions…
        </p>
      )}
      {wrongCantilever && (
        <p role="alert" className="text-util-over">
          These revisions belong to another cantilever.
        </p>
      )}
      {a.data && b.data && !wrongCantilever && <CompareView a={a.data} b={b.data} />}
    </div>
  );
}
