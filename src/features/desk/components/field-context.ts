import { createContext, useContext } from 'react';

/** Problems the engine found that the schema cannot see (an unknown shape, a load past the tip), by field name. */
export const EngineIssuesContext = createContext<Map<string, string>>(new Map());

export function useEngineIssue(name: string): string | undefined {
  return useContext(EngineIssuesContext).get(name);
}

/** A DOM id for a field name: "loads.area.0.value" → "f-loads-area-0-value". */
export function fieldId(name: string): string {
  return `f-${name.replace(/[^A-Za-z0-9]+/g, '-')}`;
}
