import { documentLeaves } from '../../shared/schemas/document-leaves';
import type { DesignDocument } from '../../shared/schemas/design';
import { pathWords, valueWords } from '../../shared/words/field-words';

const GROUP_ORDER = ['Reach', 'Section', 'Loads', 'Support', 'Limits', 'Settings'];

function rank(group: string): number {
  const i = GROUP_ORDER.indexOf(group);
  return i < 0 ? GROUP_ORDER.length : i;
}

/** Every input of a stored design, grouped as the desk groups them, as read-only text. */
export function groupedInputs(
  doc: DesignDocument,
): { group: string; rows: { label: string; value: string; path: string }[] }[] {
  const all = documentLeaves(doc);
  const groups = new Map<string, { label: string; value: string; path: string }[]>();
  for (const [path, value] of all) {
    const words = pathWords(path);
    const [group, ...rest] = words.split(': ');
    const rows = groups.get(group) ?? [];
    rows.push({ label: rest.join(': ') || words, value: valueWords(value), path });
    groups.set(group, rows);
  }
  return [...groups.entries()]
    .sort(([a], [b]) => rank(a) - rank(b))
    .map(([group, rows]) => ({ group, rows }));
}

export function DesignInputsList({ doc }: { doc: DesignDocument }) {
  return (
    <div className="flex flex-col gap-3" data-testid="inputs-read-only">
      {groupedInputs(doc).map(({ group, rows }) => (
        <section
          key={group}
          aria-label={`${group} inputs`}
          className="rounded-md border border-concrete-300 bg-white p-3"
        >
          <h3 className="mb-1 text-sm font-semibold text-concrete-800">{group}</h3>
          <dl className="grid grid-cols-[1fr_auto] gap-x-3 gap-y-0.5 text-sm">
            {rows.map((r) => (
              <div key={r.path} className="contents">
                <dt className="text-concrete-700">{r.label}</dt>
                <dd className="num text-right text-concrete-900">{r.value}</dd>
              </div>
            ))}
          </dl>
        </section>
      ))}
    </div>
  );
}
