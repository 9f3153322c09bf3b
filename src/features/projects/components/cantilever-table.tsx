import { Link } from 'react-router-dom';
import type { CantileverDto } from '../../../../shared/schemas/api';
import { paths } from '../../../config/paths';
import { ReviewStateBadge } from '../../../components/ui/review-state-badge';
import { VerdictWord } from '../../../components/ui/verdict-word';
import { QuantityCell } from './quantity-cell';

/**
 * The project's cantilevers: the latest revision with its review state and pass/fail word, and
 * the latest approved revision (what the shop builds from), which may be an older one.
 */
export function CantileverTable({
  cantilevers,
  mayEdit = false,
}: {
  cantilevers: CantileverDto[];
  /** Design roles may set each cantilever's number of beams. */
  mayEdit?: boolean;
}) {
  if (cantilevers.length === 0)
    return <p className="text-sm text-concrete-600">No cantilevers in this project yet.</p>;
  return (
    <table className="w-full border-collapse text-sm">
      <thead>
        <tr className="border-b border-concrete-300 text-left text-xs text-concrete-600">
          <th className="py-1.5 pr-3 font-medium">Cantilever</th>
          <th className="py-1.5 pr-3 font-medium">Latest revision</th>
          <th className="py-1.5 pr-3 font-medium">Review</th>
          <th className="py-1.5 pr-3 font-medium">Latest approved</th>
          <th className="py-1.5 pr-3 font-medium">Beams</th>
          <th className="py-1.5 pr-3 font-medium">Checks</th>
          <th className="py-1.5 pr-3 font-medium">Updated</th>
          <th className="py-1.5 font-medium">
            <span className="sr-only">Study</span>
          </th>
        </tr>
      </thead>
      <tbody>
        {cantilevers.map((c) => (
          <tr key={c.id} className="border-b border-concrete-200">
            <td className="py-2 pr-3">
              <Link
                to={paths.desk(c.id)}
                className="font-medium text-oxide-700 underline-offset-2 hover:underline"
              >
                {c.name}
              </Link>
              {c.description ? <div className="text-xs text-concrete-500">{c.description}</div> : null}
            </td>
            <td className="num py-2 pr-3">
              {c.currentRevisionNumber && c.currentRevisionId ? (
                <Link to={paths.revision(c.currentRevisionId)} className="text-oxide-700 underline">
                  rev {c.currentRevisionNumber}
                </Link>
              ) : (
                '—'
              )}
            </td>
            <td className="py-2 pr-3">
              <ReviewStateBadge state={c.reviewState} />
            </td>
            <td className="py-2 pr-3 text-xs" data-testid="latest-approved">
              {c.latestApproved ? (
                <>
                  <Link
                    to={paths.revision(c.latestApproved.revisionId)}
                    className="num font-medium text-oxide-700 underline"
                  >
                    rev {c.latestApproved.number}
                  </Link>{' '}
                  <span className="text-concrete-600">
                    by {c.latestApproved.approvedBy},{' '}
                    {new Date(c.latestApproved.approvedAt).toLocaleDateString()}
                  </span>
                </>
              ) : (
                <span className="text-concrete-600">none approved</span>
              )}
            </td>
            <td className="py-2 pr-3">
              <QuantityCell cantilever={c} editable={mayEdit} />
            </td>
            <td className="py-2 pr-3">
              <VerdictWord ok={c.ok} />
            </td>
            <td className="num py-2 pr-3 text-xs text-concrete-600">
              {new Date(c.updatedAt).toLocaleString()}
            </td>
            <td className="py-2">
              <Link to={paths.study(c.id)} className="text-xs text-oxide-700 underline">
                Reach study
              </Link>
            </td>
          </tr>
        ))}
      </tbody>
    </table>
  );
}
