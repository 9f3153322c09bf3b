import { memo } from 'react';
import type { FieldIssue } from '../../../../shared/schemas/quantity';
import { focusField } from '../lib/focus-field';
import { FieldProblemList } from './field-problem-list';
import { LoadsGroup } from './loads-group';
import { ReachGroup } from './reach-group';
import { SectionGroup } from './section-group';
import { SupportGroup } from './support-group';

export interface DeskInputsProps {
  mayEditMember: boolean;
  mayEditConnection: boolean;
  onBrowseMember: () => void;
  onBrowseFootprint: () => void;
}

/** The four input groups; memoised so a new result does not re-render the inputs. */
export const DeskInputs = memo(function DeskInputs({
  mayEditMember,
  mayEditConnection,
  onBrowseMember,
  onBrowseFootprint,
}: DeskInputsProps) {
  return (
    <div className="flex flex-col gap-2">
      <ReachGroup disabled={!mayEditMember} />
      <SectionGroup disabled={!mayEditMember} onBrowse={onBrowseMember} />
      <LoadsGroup disabled={!mayEditMember} />
      <SupportGroup disabled={!mayEditConnection} onBrowse={onBrowseFootprint} />
    </div>
  );
});

/** Every problem that keeps the design from computing, in one list (each is also shown at its field). */
export function IssueSummary({ issues, failure }: { issues: readonly FieldIssue[]; failure: string | null }) {
  if (issues.length === 0 && !failure) return null;
  return (
    <div
      role="alert"
      className="rounded-md border border-util-over/50 bg-oxide-50 p-2 text-xs text-util-over"
      data-testid="issue-summary"
    >
      <p className="font-semibold">
        Not recomputed:{' '}
        {failure
          ? 'the engine stopped on these inputs.'
          : `${issues.length} input${issues.length === 1 ? ' needs' : 's need'} attention.`}
      </p>
      <FieldProblemList issues={issues} onPick={focusField} className="mt-1" />
      {failure ? <p className="mt-1">{failure}</p> : null}
    </div>
  );
}
