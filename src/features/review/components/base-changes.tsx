import { Link } from 'react-router-dom';
import type { RevisionDto } from '../../../../shared/schemas/api';
import { diffDesigns } from '../../../../shared/schemas/diff';
import { paths } from '../../../config/paths';
import { useRevisions } from '../../../lib/api/revisions/get-revisions';
import { useRevision } from '../../../lib/api/revisions/get-revision';
import { errorText } from '../../../lib/error-text';
import { ChangedInputsTable } from '../../../components/diff/changed-inputs-table';
import { RatioTable } from '../../../components/diff/ratio-table';
import { ratioRows } from '../../../lib/ratio-rows';

/** What changed since the revision this one was based on: inputs and check ratios. */
export function BaseChanges({ revision }: { revision: RevisionDto }) {
  const revisions = useRevisions(revision.cantileverId);
  const baseId = revisions.data?.find((r) => r.number === revision.baseRevisionNumber)?.id ?? null;
  const base = useRevision(baseId);

  if (revision.baseRevisionNumber === null) {
    return (
      <p className="text-sm text-concrete-700">
        This is the first revision: there is nothing earlier to compare with.
      </p>
    );
  }
  if (revisions.isError || base.isError) {
    return (
      <p role="alert" className="text-sm text-util-over">
        The earlier revision could not be loaded: {errorText(revisions.error ?? base.error)}
      </p>
    );
  }
  if (!base.data)
    return (
      <p role="status" className="text-sm text-concrete-600">
        Loading revision {revision.baseRevisionNumber}…
      </p>
    );

  const labelA = `Revision ${base.data.number}`;
  const labelB = `Revision ${revision.number}`;
  return (
    <div className="space-y-3">
      <ChangedInputsTable
        changes={diffDesigns(base.data.input, revision.input)}
        labelA={labelA}
        labelB={labelB}
      />
      <details className="text-sm">
        <summary className="cursor-pointer text-concrete-800">
          Check ratios, {labelA} and {labelB}
        </summary>
        <RatioTable
          rows={ratioRows(base.data.result.checks, revision.result.checks)}
          labelA={labelA}
          labelB={labelB}
        />
      </details>
      <Link
        to={paths.compare(revision.cantileverId, base.data.id, revision.id)}
        className="text-sm text-oxide-700 underline"
      >
        Compare the two revisions with their curves
      </Link>
    </div>
  );
}
