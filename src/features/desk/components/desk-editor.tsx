import { useCallback, useEffect, useMemo, useState, type ReactNode } from 'react';
import { FormProvider, useFormState, useWatch } from 'react-hook-form';
import { useNavigate } from 'react-router-dom';
import type { ShapeRecord } from '../../../../shared/engine/shapes/types';
import type { UnitSystem } from '../../../../shared/engine/units';
import {
  EDIT_RIGHTS,
  type CantileverDto,
  type RevisionDto,
  type UserDto,
} from '../../../../shared/schemas/api';
import type { DesignDocument } from '../../../../shared/schemas/design';
import { paths } from '../../../config/paths';
import { useUpdateMe } from '../../../lib/api/me/update-me';
import type { DeskProposal } from '../../../lib/desk-proposal';
import { studyState } from '../../../lib/study-handoff';
import { ShapePickerDialog } from '../../../components/shapes/shape-picker-dialog';
import { useShapes } from '../../../lib/api/shapes/get-shapes';
import { useDeskForm } from '../hooks/use-desk-form';
import { useUnitsSwitch } from '../hooks/use-units-switch';
import { useDiffersFromSaved } from '../hooks/use-differs-from-saved';
import { prepareDocument } from '../lib/prepare-document';
import { DeskHeader } from './desk-header';
import { DeskInputs, IssueSummary } from './desk-inputs';
import { DeskResults } from './desk-results';
import { PlateScheduleLink } from './plate-schedule-link';
import { PackageLink } from '../../../components/ui/package-link';
import { SubmitForReview } from '../../../components/submit-for-review';
import { DeskSave } from './desk-save';
import { DeskIssuesContext } from './field-context';
import { DeskSide } from './desk-side';

const NO_SHAPES: ShapeRecord[] = [];

export interface DeskEditorProps {
  cantilever: CantileverDto;
  /** The revision the desk opens on (the route loader's choice); null when nothing is saved yet. */
  revision: RevisionDto | null;
  /** The opening document, already in the person's unit system. */
  initialDoc: DesignDocument;
  user: UserDto;
  /** The cantilever's files panel (the attachments feature, composed by the route). */
  files: ReactNode;
  /** A document handed over by the reach study: loaded as unsaved changes on top of the revision. */
  proposal?: DeskProposal | null;
}

/** The design desk: inputs on the left, live results on the right, saving as revisions. */
export function DeskEditor({ cantilever, revision, initialDoc, user, files, proposal }: DeskEditorProps) {
  const shapes = useShapes(cantilever.projectId);
  const custom = useMemo(() => shapes.data?.shapes.filter((s) => s.custom) ?? NO_SHAPES, [shapes.data]);
  const { form, live, busy, issues, problems, refuse } = useDeskForm(initialDoc, custom);
  const { isDirty: formSaysDirty } = useFormState({ control: form.control });
  const differsFromSaved = useDiffersFromSaved(form);
  // react-hook-form can keep isDirty set after every field is typed back to its saved value, so the
  // marker also asks whether the document really differs; isDirty still covers the reset after a save.
  const isDirty = formSaysDirty && differsFromSaved;
  // The revision the desk stands on: the one it opened on, then each revision saved (or taken from
  // a conflict) here. The only copy: header, save, plate schedule, package, submit and list read it.
  const [baseRevision, setBase] = useState<RevisionDto | null>(revision);
  const base = baseRevision?.number ?? null;
  // The unit system is the document's own `units` field; the switch rewrites it with the quantities.
  const units: UnitSystem = useWatch({ control: form.control, name: 'units' }) === 'SI' ? 'SI' : 'US';
  const [picker, setPicker] = useState<'member' | 'footprint' | null>(null);
  const switchUnits = useUnitsSwitch(form);
  const updateMe = useUpdateMe();
  const rights = EDIT_RIGHTS[user.role];

  // A document from the server written in the unit system the desk shows now.
  const toUserUnits = useCallback(
    (doc: DesignDocument) => prepareDocument(doc, form.getValues('units') === 'SI' ? 'SI' : 'US'),
    [form],
  );

  const navigate = useNavigate();
  const [fromStudy] = useState(() => proposal ?? null);
  useEffect(() => {
    // The saved document stays the form's default (so the change reads as unsaved); the values are the proposal's.
    if (fromStudy) form.reset(toUserUnits(fromStudy.document), { keepDefaultValues: true });
  }, [form, fromStudy, toUserUnits]);
  const openStudy = useCallback(
    () =>
      navigate(paths.study(cantilever.id), {
        state: studyState({ document: form.getValues(), unsaved: isDirty }),
      }),
    [navigate, cantilever.id, form, isDirty],
  );

  const onUnits = useCallback(
    (to: UnitSystem) => {
      switchUnits(to);
      updateMe.mutate({ units: to });
    },
    [switchUnits, updateMe],
  );

  const openMember = useCallback(() => setPicker('member'), []);
  const openFootprint = useCallback(() => setPicker('footprint'), []);
  const hasConnection = live.doc?.connection !== undefined;
  const baseId = baseRevision?.id ?? null;
  // Memoised so that the results (a memo component) skip the re-render of every keystroke.
  const schedule = useMemo(
    () => (
      <>
        <PlateScheduleLink revisionId={baseId} dirty={isDirty} hasConnection={hasConnection} />
        {/* The package is made from the saved revision; while changes are unsaved it is of the saved one. */}
        {baseRevision ? (
          <p className="mt-2 text-sm">
            <PackageLink revisionId={baseRevision.id} number={baseRevision.number} />
            {isDirty ? (
              <span className="ml-2 text-xs text-concrete-600">
                of the saved revision, not the inputs on screen
              </span>
            ) : null}
          </p>
        ) : null}
      </>
    ),
    [baseId, baseRevision, isDirty, hasConnection],
  );

  function applyShape(target: 'member' | 'footprint', label: string) {
    const opts = { shouldDirty: true } as const;
    if (target === 'member') {
      const section = form.getValues('member.section');
      form.setValue('member.section', section.plates ? { shape: label } : { ...section, shape: label }, opts);
    } else {
      form.setValue('connection.footprint', { shape: label }, opts);
    }
    setPicker(null);
  }

  const actions = [
    ...(rights.member ? [{ label: 'Use for member', onUse: (l: string) => applyShape('member', l) }] : []),
    ...(rights.connection && hasConnection
      ? [{ label: 'Use for post footprint', onUse: (l: string) => applyShape('footprint', l) }]
      : []),
  ];
  if (picker === 'footprint') actions.reverse();

  return (
    <FormProvider {...form}>
      <DeskIssuesContext.Provider value={issues}>
        <div className="flex flex-col">
          <DeskHeader
            cantilever={cantilever}
            base={base}
            dirty={isDirty}
            busy={busy}
            live={live}
            units={units}
            onUnits={onUnits}
            onStudy={openStudy}
            save={
              <DeskSave
                cantileverId={cantilever.id}
                base={baseRevision}
                setBase={setBase}
                dirty={isDirty}
                mayEdit={rights.member || rights.connection}
                toUserUnits={toUserUnits}
                problems={problems}
                onRefused={refuse}
              />
            }
          />
          {/* On a phone the verdict and results come first, the inputs below them, revisions and files last;
              from lg the inputs are the left column beside the results. */}
          <div className="grid min-w-0 gap-4 p-2 sm:p-4 lg:grid-cols-[26rem_minmax(0,1fr)] lg:items-start">
            <form
              onSubmit={(e) => e.preventDefault()}
              noValidate
              aria-label="Design inputs"
              className="order-2 flex min-w-0 flex-col gap-2 lg:order-none lg:col-start-1 lg:row-span-2 lg:row-start-1"
            >
              {fromStudy ? (
                <p
                  role="status"
                  className="rounded border border-oxide-300 bg-oxide-50 p-2 text-sm"
                  data-testid="from-study"
                >
                  Loaded from the {fromStudy.source === 'study' ? 'reach study' : 'lightest sections list'}:{' '}
                  <strong>{fromStudy.label}</strong>. These are unsaved changes; save a revision to keep them.
                </p>
              ) : null}
              <IssueSummary issues={live.issues} failure={live.failure} />
              <DeskInputs
                mayEditMember={rights.member}
                mayEditConnection={rights.connection}
                onBrowseMember={openMember}
                onBrowseFootprint={openFootprint}
              />
            </form>
            <div className="order-1 flex min-w-0 flex-col gap-3 lg:order-none lg:col-start-2 lg:row-start-1">
              {baseRevision &&
              !isDirty &&
              (rights.member || rights.connection) &&
              baseRevision.reviewState === 'draft' ? (
                <SubmitForReview
                  key={baseRevision.id}
                  cantileverId={cantilever.id}
                  revisionId={baseRevision.id}
                  number={baseRevision.number}
                />
              ) : null}
              <DeskResults live={live} doc={live.doc} schedule={schedule} beams={cantilever.quantity} />
            </div>
            <div className="order-3 flex min-w-0 flex-col gap-3 lg:order-none lg:col-start-2 lg:row-start-2">
              <DeskSide cantileverId={cantilever.id} current={base} files={files} />
            </div>
          </div>
        </div>
        <ShapePickerDialog
          projectId={cantilever.projectId}
          open={picker !== null}
          onClose={() => setPicker(null)}
          actions={actions}
          initial={
            picker === 'footprint'
              ? (form.getValues('connection.footprint.shape') ?? null)
              : (form.getValues('member.section.shape') ?? null)
          }
        />
      </DeskIssuesContext.Provider>
    </FormProvider>
  );
}
