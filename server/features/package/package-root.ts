/**
 * The section at the root as the engine's plate layout takes it, from the stored sections of a
 * revision (or the published table), and the layout itself; null without a connection.
 */
import { plateLayout, type PlateLayout } from '../../../shared/engine/connection/plate-layout';
import type { ShapeLookup } from '../../../shared/engine/shapes/types';
import { rootOutline } from '../../../shared/engine/connection/root-outline';
import type { DesignInput } from '../../../shared/schemas/design';
import { parsedConnectionSchema } from '../../../shared/schemas/parsed-design';

export function layoutFor(input: DesignInput, find: ShapeLookup): PlateLayout | null {
  if (!input.connection) return null;
  const root = rootOutline(input.member.section, find);
  if (!root) return null;
  try {
    return plateLayout(parsedConnectionSchema.parse(input.connection), root, find);
  } catch {
    return null;
  }
}
