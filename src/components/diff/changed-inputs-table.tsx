import type { FieldChange } from '../../../shared/schemas/diff';
import { pathWords, valueWords } from '../../../shared/words/field-words';
import { ScrollBox } from '../ui/scroll-box';
import { ColumnHeads } from '../ui/column-heads';

interface ChangedInputsTableProps {
  changes: FieldChange[];
  labelA: string;
  labelB: string;
}

/** The inputs that differ between two revisions, side by side, in plain words. */
export function ChangedInputsTable({ changes, labelA, labelB }: ChangedInputsTableProps) {
  if (changes.length === 0) {
    return <p className="text-sm text-concrete-700">The two revisions have the same inputs.</p>;
  }
  return (
    <ScrollBox label={`Changed inputs, ${labelA} then ${labelB}`}>
      <table className="w-full border-collapse text-sm">
        <caption className="sr-only">
          Changed inputs, {labelA} then {labelB}
        </caption>
        <ColumnHeads names={['Input', labelA, labelB]} />
        <tbody>
          {changes.map((change) => (
            <tr key={change.path} className="border-b border-concrete-100 align-top">
              <th scope="row" className="py-1 pr-3 text-left font-normal text-concrete-900">
                {pathWords(change.path)}
              </th>
              <td className="py-1 pr-3 font-mono tabular-nums text-concrete-700">
                {valueWords(change.before)}
              </td>
              <td className="py-1 font-mono tabular-nums font-medium text-concrete-900">
                {valueWords(change.after)}
              </td>
            </tr>
          ))}
        </tbody>
      </table>
    </ScrollBox>
  );
}
