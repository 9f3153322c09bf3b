import { createContext, useContext } from 'react';

/**
 * Every problem shown on the desk's fields, by field name: the web worker's answer for the document
 * on screen (the schema's and the engine's issues) and, until the next edit, what the server refused
 * in a save. The only channel for field errors: the form itself does not validate.
 */
export const DeskIssuesContext = createContext<ReadonlyMap<string, string>>(new Map());

export function useFieldIssue(name: string): string | undefined {
  return useContext(DeskIssuesContext).get(name);
}

/** A DOM id for a field name: "loads.area.0.value" → "f-loads-area-0-value". */
export function fieldId(name: string): string {
  return `f-${name.replace(/[^A-Za-z0-9]+/g, '-')}`;
}
