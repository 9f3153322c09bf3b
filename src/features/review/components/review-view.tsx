import type { ReactNode } from 'react';
import { TriangleAlert } from 'lucide-react';
import { PackageLink } from '../../../components/ui/package-link';
import { Link } from 'react-router-dom';
import type { RevisionDto, UserDto } from '../../../../shared/schemas/api';
import { paths } from '../../../config/paths';
import { CautionNote } from '../../../components/ui/caution-note';
import { ReviewStateBadge } from '../../../components/ui/review-state-badge';
import { VerdictWord } from '../../../components/ui/verdict-word';
import { CommentsThread } from '../../../components/comments-thread';
import { formatDateTime } from '../../../lib/format';
import { verdictOf } from '../../../../shared/words/check-words';
import { displayChecks } from '../../../../shared/words/check-display';
import { CheckList } from './check-list';
import { KeyResults } from './key-results';
import { BaseChanges } from './base-changes';
import { DecisionPanel } from './decision-panel';
import { ReviewRecord } from './review-record';

function Section({ id, title, children }: { id: string; title: string; children: ReactNode }) {
  return (
    <section aria-labelledby={id} className="rounded border border-concrete-200 bg-white p-4">
      <h2 id={id} className="mb-2 text-lg font-semibold text-concrete-900">
        {title}
      </h2>
      {children}
    </section>
  );
}

/** The newest revision of the same cantilever, when it is not this one. */
export interface NewerRevision {
  id: number;
  number: number;
  count: number;
}

/**
 * An engineer's view of one revision, evidence first: the verdict and every check, every input,
 * the diagrams and sketches (`evidence`, composed by the route from the desk's components), key
 * results and changes; then the decision, the comments and the record.
 */
export function ReviewView({
  revision,
  user,
  evidence,
  newer,
}: {
  revision: RevisionDto;
  user: UserDto | null | undefined;
  evidence?: ReactNode;
  newer?: NewerRevision | null;
}) {
  const verdict = verdictOf(revision.result.checks, revision.result.ok);
  return (
    <div className="space-y-4">
      <header className="space-y-1">
        <nav aria-label="Breadcrumb" className="text-sm text-concrete-600">
          <Link to={paths.history(revision.cantileverId)} className="underline hover:text-oxide-700">
            History
          </Link>
          {' · '}
          <Link to={paths.desk(revision.cantileverId)} className="underline hover:text-oxide-700">
            Design desk
          </Link>
        </nav>
        <h1 className="flex flex-wrap items-center gap-3 text-xl font-semibold text-concrete-900">
          Review of revision {revision.number}
          <ReviewStateBadge state={revision.reviewState} />
        </h1>
        <p className="text-sm text-concrete-800">“{revision.message}”</p>
        <p className="text-xs text-concrete-600">
          {revision.authorName} · {formatDateTime(revision.createdAt)} ·{' '}
          {revision.baseRevisionNumber === null
            ? 'first revision'
            : `based on revision ${revision.baseRevisionNumber}`}{' '}
          · engine {revision.engineVersion}
        </p>
      </header>
      <CautionNote />
      {newer ? (
        <p
          role="alert"
          data-testid="newer-revisions"
          className="flex items-start gap-2 rounded border border-util-near bg-amber-50 p-3 text-sm text-concrete-900"
        >
          <TriangleAlert aria-hidden="true" className="mt-0.5 h-4 w-4 shrink-0" />
          <span>
            {newer.count === 1 ? 'A newer revision exists' : `${newer.count} newer revisions exist`}: the
            latest is revision {newer.number}. You are reviewing revision {revision.number}.{' '}
            <Link to={paths.revision(newer.id)} className="font-medium text-oxide-700 underline">
              Open revision {newer.number}
            </Link>
          </span>
        </p>
      ) : null}
      <div className="flex flex-wrap gap-2">
        <PackageLink revisionId={revision.id} number={revision.number} />
        <Link
          to={paths.revision(revision.id)}
          className="rounded border border-concrete-300 px-3 py-1 text-sm text-concrete-800 hover:bg-concrete-50"
        >
          Open revision {revision.number} read-only
        </Link>
      </div>
      <Section id="review-verdict" title="Verdict and checks">
        <p className="mb-2 text-sm">
          <VerdictWord ok={verdict.state === 'none' ? null : verdict.pass} />{' '}
          <span className="text-concrete-700">
            {verdict.sentence} {revision.result.method}, results in {revision.result.units} units.
          </span>
        </p>
        <CheckList checks={displayChecks(revision.result.checks, revision.result.connection)} />
      </Section>
      {evidence ? (
        <Section id="review-evidence" title="Inputs, diagrams and sketches">
          {evidence}
        </Section>
      ) : null}
      <Section id="review-key" title="Key results">
        <KeyResults result={revision.result} input={revision.input} />
      </Section>
      <Section
        id="review-changes"
        title={
          revision.baseRevisionNumber === null
            ? 'Changes'
            : `Changes from revision ${revision.baseRevisionNumber}`
        }
      >
        <BaseChanges revision={revision} />
      </Section>
      <Section id="review-decision" title="Decision">
        <DecisionPanel revision={revision} user={user} newerNumber={newer?.number ?? null} />
      </Section>
      <Section id="review-comments" title="Comments">
        <CommentsThread revisionId={revision.id} />
      </Section>
      <Section id="review-record" title="Review record">
        <ReviewRecord reviews={revision.reviews} />
      </Section>
    </div>
  );
}
