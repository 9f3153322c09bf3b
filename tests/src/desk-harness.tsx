/**
 * The desk's form as the desk wires it (useDeskForm: the form holds the text, the engine's worker
 * validates; under jsdom the same code runs on the main thread), for tests of single input groups.
 * `issues` adds engine issues a test wants at given fields, on top of the live ones.
 */
import type { ReactNode } from 'react';
import { FormProvider } from 'react-hook-form';
import { exampleDesign } from '../../shared/engine/examples';
import type { ShapeRecord } from '../../shared/engine/shapes/types';
import type { DesignDocument } from '../../shared/schemas/design';
import { DeskIssuesContext } from '../../src/features/desk/components/field-context';
import { useDeskForm, type DeskFormApi } from '../../src/features/desk/hooks/use-desk-form';

const NO_SHAPES: ShapeRecord[] = [];

export function DeskFormHarness({
  children,
  doc = exampleDesign,
  issues,
  onForm,
}: {
  children: ReactNode;
  doc?: DesignDocument;
  issues?: ReadonlyMap<string, string>;
  /** Hands the test the form (to read what would be saved). */
  onForm?: (form: DeskFormApi) => void;
}) {
  const desk = useDeskForm(doc, NO_SHAPES);
  onForm?.(desk.form);
  const shown = issues ? new Map([...desk.issues, ...issues]) : desk.issues;
  return (
    <FormProvider {...desk.form}>
      <DeskIssuesContext.Provider value={shown}>{children}</DeskIssuesContext.Provider>
    </FormProvider>
  );
}
