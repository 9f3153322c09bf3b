import type { RevisionDto } from '../../../../shared/schemas/api';
import type { DesignDocument } from '../../../../shared/schemas/design';
import { diffDesigns } from '../../../../shared/schemas/diff';
import { Button } from '../../../components/ui/button';
import { Dialog } from '../../../components/ui/dialog';
import { pathWords, valueWords } from '../../../../shared/words/field-words';

/**
 * Someone saved a newer revision while you were working. Shows their inputs against yours and lets
 * you keep yours on top of theirs, or load theirs (yours stay restorable); nothing typed is lost.
 */
export function ConflictDialog({
  latest,
  mine,
  onKeepMine,
  onLoadLatest,
  onClose,
}: {
  latest: RevisionDto | null;
  mine: DesignDocument;
  onKeepMine: () => void;
  onLoadLatest: () => void;
  onClose: () => void;
}) {
  if (!latest) return null;
  const changes = diffDesigns(latest.input, mine);
  return (
    <Dialog open title={`Revision ${latest.number} was saved while you worked`} onClose={onClose} wide>
      <p className="text-sm">
        {latest.authorName} saved revision {latest.number} (“{latest.message}”). Your changes were not saved.
        The inputs that differ:
      </p>
      {changes.length === 0 ? (
        <p className="mt-2 text-sm text-concrete-600">
          No input differs: your design matches revision {latest.number}.
        </p>
      ) : (
        <div className="mt-2 max-h-80 overflow-auto">
          <table className="w-full text-sm" aria-label="Inputs that differ">
            <thead>
              <tr className="border-b border-concrete-300 text-left text-xs text-concrete-600">
                <th scope="col" className="py-1 pr-2 font-medium">
                  Input
                </th>
                <th scope="col" className="py-1 pr-2 font-medium">
                  Revision {latest.number}
                </th>
                <th scope="col" className="py-1 font-medium">
                  Yours
                </th>
              </tr>
            </thead>
            <tbody>
              {changes.map((c) => (
                <tr key={c.path} className="border-b border-concrete-200">
                  <th scope="row" className="py-1 pr-2 text-left font-normal">
                    {pathWords(c.path)}
                  </th>
                  <td className="num py-1 pr-2">{valueWords(c.before)}</td>
                  <td className="num py-1 font-medium">{valueWords(c.after)}</td>
                </tr>
              ))}
            </tbody>
          </table>
        </div>
      )}
      <div className="mt-4 flex flex-wrap justify-end gap-2">
        <Button onClick={onLoadLatest}>Load revision {latest.number}</Button>
        <Button variant="primary" onClick={onKeepMine}>
          Keep my changes on top of revision {latest.number}
        </Button>
      </div>
    </Dialog>
  );
}
