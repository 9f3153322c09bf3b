import { pathWords } from '../../../../shared/words/field-words';
import type { Issue } from '../lib/issue-paths';

/**
 * Problems on the desk's fields, each named in words (never by its path) and a button that takes
 * the person to the field.
 */
export function FieldProblemList({
  issues,
  onPick,
  className = '',
}: {
  issues: readonly Issue[];
  onPick: (path: string) => void;
  className?: string;
}) {
  return (
    <ul className={`list-disc pl-4 ${className}`} data-testid="field-problems">
      {issues.map((i) => (
        <li key={`${i.path}:${i.message}`}>
          <button
            type="button"
            className="text-left underline decoration-dotted underline-offset-2 hover:decoration-solid"
            onClick={() => onPick(i.path)}
          >
            <span className="font-medium">{pathWords(i.path)}</span>
          </button>
          : {i.message}
        </li>
      ))}
    </ul>
  );
}
