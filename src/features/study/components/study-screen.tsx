import { useCallback, useMemo, useRef, useState } from 'react';
import { Link } from 'react-router-dom';
import { lookupWith, SHAPES } from '../../../../shared/engine/shapes/table';
import type { ShapeFamily, ShapeRecord } from '../../../../shared/engine/shapes/types';
import type { CantileverDto } from '../../../../shared/schemas/api';
import type { DesignDocument } from '../../../../shared/schemas/design';
import { cellInput } from '../../../../shared/study/study-plan';
import { Button } from '../../../components/ui/button';
import { CautionNote } from '../../../components/ui/caution-note';
import { paths } from '../../../config/paths';
import type { DeskProposal } from '../../../lib/desk-proposal';
import { useStudyRun } from '../hooks/use-study-run';
import { pointLabel } from '../lib/cell-words';
import { defaultSpec } from '../lib/default-spec';
import { LEGEND } from '../lib/map-colours';
import { AxisFields, draftOf, specOf, type AxisDraft } from './axis-fields';
import { LightestPanel } from './lightest-panel';
import { PointReadout } from './point-readout';
import { StudyMap } from './study-map';
import { StudyTable } from './study-table';

export interface StudyScreenProps {
  cantilever: CantileverDto;
  /** The desk's document in the person's units. */
  document: DesignDocument;
  /** Where the document came from, in words. */
  startNote: string;
  customShapes: ShapeRecord[];
  /** The person may change the member (and so load a point into the desk). */
  mayUse: boolean;
  onPropose: (proposal: DeskProposal) => void;
}

/** The reach study: two axes, a run over workers, the map with its readout and table, and the lightest sections. */
export function StudyScreen({
  cantilever,
  document,
  startNote,
  customShapes,
  mayUse,
  onPropose,
}: StudyScreenProps) {
  const lookup = useMemo(() => lookupWith(customShapes), [customShapes]);
  const catalog = useMemo(
    () => [...customShapes, ...SHAPES.filter((s) => !customShapes.some((c) => c.label === s.label))],
    [customShapes],
  );
  const initial = useMemo(() => defaultSpec(document, lookup), [document, lookup]);
  const [x, setX] = useState<AxisDraft>(() => draftOf(initial.x));
  const [y, setY] = useState<AxisDraft>(() => draftOf(initial.y));
  const [view, setView] = useState<'map' | 'table'>('map');
  const [point, setPoint] = useState<{ i: number; j: number } | null>(null);
  const { run, start, cancel, lightest, findLightest } = useStudyRun();
  const measured = useRef(new Set<string>());
  const units = document.units === 'SI' ? 'SI' : 'US';
  const errors = Object.fromEntries(run.issues.map((i) => [i.path, i.message]));
  const docIssues = run.issues.filter((i) => !/^[xy]\./.test(i.path));

  const onDrawn = useCallback(
    (runId: number, filled: number) => {
      const mark = `study-start-${runId}`;
      if (performance.getEntriesByName(mark, 'mark').length === 0) return;
      if (filled > 0 && !measured.current.has(`first-${runId}`)) {
        measured.current.add(`first-${runId}`);
        performance.measure('study-first-paint', mark);
      }
      if (filled > 0 && filled === run.total && !measured.current.has(`done-${runId}`)) {
        measured.current.add(`done-${runId}`);
        performance.measure('study-complete', mark);
      }
    },
    [run.total],
  );

  const plan = run.plan;
  function pick(i: number, j: number) {
    if (!plan || !mayUse) return;
    const o = run.cells[j * plan.xValues.length + i];
    if (!o) return;
    onPropose({ source: 'study', label: pointLabel(plan, i, j), document: cellInput(plan, i, j, lookup) });
  }

  const running = run.status === 'running';
  const section = document.member.section;
  return (
    <section className="mx-auto flex max-w-6xl flex-col gap-4 p-4" aria-labelledby="study-title">
      <div>
        <p className="text-xs text-concrete-600">
          <Link to={paths.project(cantilever.projectId)} className="underline">
            Project
          </Link>{' '}
          /{' '}
          <Link to={paths.desk(cantilever.id)} className="underline">
            Design desk
          </Link>{' '}
          / Reach study
        </p>
        <h1 id="study-title" className="text-lg font-semibold">
          Reach study: {cantilever.name}
        </h1>
        <p className="text-sm text-concrete-600" data-testid="study-start-note">
          {startNote} Every point is a full design (member and connection) by the same engine as the desk. A
          point load at the tip moves with the tip; other point loads keep their distance from the root.
        </p>
      </div>
      <CautionNote />
      <form
        className="grid gap-3 md:grid-cols-2"
        aria-label="Study axes"
        onSubmit={(e) => {
          e.preventDefault();
          start(document, { x: specOf(x, catalog), y: specOf(y, catalog) }, customShapes);
        }}
      >
        <AxisFields name="x" draft={x} onChange={setX} units={units} catalog={catalog} errors={errors} />
        <AxisFields name="y" draft={y} onChange={setY} units={units} catalog={catalog} errors={errors} />
        <div className="flex flex-wrap items-center gap-3 md:col-span-2">
          {/* oxide-600: white text on oxide-500 is below 4.5:1 for this text size. */}
          <Button type="submit" variant="primary" style={{ backgroundColor: '#a94714' }}>
            {running ? 'Restart study' : 'Run study'}
          </Button>
          <Button onClick={cancel} disabled={!running}>
            Cancel
          </Button>
          {run.total > 0 ? (
            <label className="flex items-center gap-2 text-sm">
              <progress value={run.done} max={run.total} className="w-48" data-testid="study-progress" />
              <span data-testid="study-status" role="status">
                {run.status === 'cancelled'
                  ? `Cancelled after ${run.done} of ${run.total} points.`
                  : run.status === 'done'
                    ? `All ${run.total} points computed (${run.workers} worker${run.workers === 1 ? '' : 's'}).`
                    : `${run.done} of ${run.total} points (${run.workers} worker${run.workers === 1 ? '' : 's'})…`}
              </span>
            </label>
          ) : null}
        </div>
        {docIssues.length > 0 || run.message ? (
          <div role="alert" className="text-sm text-util-over md:col-span-2">
            {run.message ? <p>The engine stopped: {run.message}</p> : null}
            {docIssues.map((i) => (
              <p key={i.path}>
                {i.path}: {i.message} (fix it in the desk first)
              </p>
            ))}
          </div>
        ) : null}
      </form>
      {plan ? (
        <div className="flex flex-col gap-2">
          <div role="group" aria-label="View" className="flex gap-1">
            {(['map', 'table'] as const).map((v) => (
              <Button
                key={v}
                size="sm"
                variant={view === v ? 'secondary' : 'ghost'}
                className={view === v ? 'border-concrete-800 font-semibold ring-1 ring-concrete-800' : ''}
                aria-pressed={view === v}
                onClick={() => setView(v)}
              >
                {v === 'map' ? 'Map' : 'Table'}
              </Button>
            ))}
          </div>
          {view === 'map' ? (
            <div className="grid gap-4 lg:grid-cols-[minmax(0,560px)_1fr]">
              <StudyMap
                plan={plan}
                cells={run.cells}
                complete={run.status === 'done'}
                runId={run.runId}
                onPick={pick}
                onPoint={setPoint}
                onDrawn={onDrawn}
              />
              <div className="flex flex-col gap-3">
                <PointReadout
                  plan={plan}
                  point={point}
                  outcome={point ? run.cells[point.j * plan.xValues.length + point.i] : undefined}
                />
                <ul className="flex flex-col gap-1 text-xs" aria-label="Legend">
                  {LEGEND.map((l) => (
                    <li key={l.label} className="flex items-center gap-2">
                      <span
                        className="inline-block h-3 w-5 rounded-sm"
                        style={{ background: l.colour }}
                        aria-hidden="true"
                      />
                      governing utilisation {l.label}
                    </li>
                  ))}
                  <li className="flex items-center gap-2">
                    <span
                      className="inline-block h-3 w-5 rounded-sm bg-concrete-300 bg-[repeating-linear-gradient(45deg,#56504a_0_1px,transparent_1px_4px),repeating-linear-gradient(-45deg,#56504a_0_1px,transparent_1px_4px)]"
                      aria-hidden="true"
                    />
                    not a valid design (cross-hatched)
                  </li>
                  <li className="flex items-center gap-2">
                    <span
                      className="inline-block h-0 w-5 border-t-[3px] border-concrete-900"
                      aria-hidden="true"
                    />
                    edge of the region where every check passes
                  </li>
                  <li className="flex items-center gap-2">
                    <span className="inline-block h-0 w-5 border-t border-concrete-900" aria-hidden="true" />
                    tip deflection contours (total)
                  </li>
                  <li className="flex items-center gap-2">
                    <span
                      className="inline-block h-0 w-5 border-t border-dashed border-[#1f4e79]"
                      aria-hidden="true"
                    />
                    steel weight contours (one beam)
                  </li>
                  {run.status !== 'done' ? (
                    <li className="text-concrete-600">Contours appear when every point is in.</li>
                  ) : null}
                </ul>
                {!mayUse ? (
                  <p className="text-xs text-concrete-600">
                    Your role may not change the member, so points cannot be loaded into the desk.
                  </p>
                ) : null}
              </div>
            </div>
          ) : (
            <StudyTable plan={plan} cells={run.cells} />
          )}
        </div>
      ) : null}
      <LightestPanel
        state={lightest}
        length={document.member.length}
        tapered={Boolean(section.shape && section.tipDepth)}
        mayUse={mayUse}
        onFind={(families: ShapeFamily[]) => findLightest(document, families, customShapes)}
        onUse={(shape, tipDepth) =>
          onPropose({
            source: 'lightest-sections',
            label: tipDepth ? `${shape} tapered to ${tipDepth}` : shape,
            document: {
              ...document,
              member: { ...document.member, section: tipDepth ? { shape, tipDepth } : { shape } },
            },
          })
        }
      />
    </section>
  );
}
