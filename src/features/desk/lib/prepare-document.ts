import type { UnitSystem } from '../../../../shared/engine/units';
import { designSchema, type DesignDocument } from '../../../../shared/schemas/design';
import { switchUnits } from './switch-units';

/**
 * A stored document made ready for the form: defaults filled in (so every list and limit has a field)
 * and written in the person's unit system.
 */
export function prepareDocument(doc: DesignDocument, system: UnitSystem): DesignDocument {
  const parsed = designSchema.safeParse(doc);
  const filled: DesignDocument = parsed.success ? parsed.data : doc;
  const withLists: DesignDocument = {
    ...filled,
    loads: { selfWeight: true, area: [], line: [], point: [], ...filled.loads },
  };
  return withLists.units === system ? withLists : switchUnits(withLists, system).doc;
}
