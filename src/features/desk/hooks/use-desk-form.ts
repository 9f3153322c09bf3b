import { useCallback, useEffect, useMemo, useRef, useState } from 'react';
import { useForm, type UseFormReturn } from 'react-hook-form';
import type { ShapeRecord } from '../../../../shared/engine/shapes/types';
import type { DesignDocument } from '../../../../shared/schemas/design';
import { issuesByField, mergeIssues, type Issue } from '../lib/issue-paths';
import { useLiveDesign } from './use-live-design';

/** The desk's form: it holds the text as typed and never validates (the worker does). */
export type DeskFormApi = UseFormReturn<DesignDocument>;

const NONE: readonly Issue[] = [];

/**
 * The desk's document and its one source of errors. Every change of the form goes to the web worker
 * (latest wins), which validates it with the shared schema and runs the engine: validation happens
 * there and only there, so typing never waits for a parse on the main thread. The problems shown are
 * the worker's for the document on screen, with (until the next edit) any the server gave when it
 * refused a save.
 */
export function useDeskForm(initialDoc: DesignDocument, customShapes: ShapeRecord[]) {
  const form = useForm<DesignDocument>({ defaultValues: initialDoc });
  const { live, busy, submit, settled } = useLiveDesign(customShapes);
  const [refused, setRefused] = useState<readonly Issue[]>(NONE);
  const refusedRef = useRef(refused);
  const refuse = useCallback((list: readonly Issue[]) => {
    refusedRef.current = list;
    setRefused(list);
  }, []);

  useEffect(() => {
    submit(form.getValues());
    return form.subscribe({
      formState: { values: true },
      callback: ({ values }) => {
        if (refusedRef.current.length > 0) refuse(NONE);
        submit(values);
      },
    });
  }, [form, submit, refuse]);

  /** Problems by field name, for the fields (one entry per field). */
  const issues = useMemo(
    () => issuesByField(mergeIssues(refused, issuesByField(live.issues))),
    [refused, live.issues],
  );

  /** Every problem of the document on screen, once the worker has answered for it (for the save). */
  const problems = useCallback(async (): Promise<Issue[]> => {
    const answer = await settled();
    return mergeIssues(refusedRef.current, issuesByField(answer.issues));
  }, [settled]);

  return { form, live, busy, issues, problems, refuse };
}
