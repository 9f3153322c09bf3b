/**
 * A preliminary package from a design document that was never saved (the CLI's `report`): the
 * engine runs on the document, nothing is stored, and the package says so on every page.
 */
import { createHash } from 'node:crypto';
import { plateScheduleRow } from '../../../shared/engine/connection/plate-schedule';
import { evaluateDesign } from '../../../shared/engine/design';
import { findShape } from '../../../shared/engine/shapes/table';
import type { DesignInput } from '../../../shared/schemas/design';
import { parseDesign } from '../../../shared/schemas/parsed-design';
import type { PackageData } from './package-data';
import { layoutFor } from './package-root';

export const sha256 = (text: string | Buffer) => createHash('sha256').update(text).digest('hex');

export function packageFromDocument(
  input: DesignInput,
  source: { name: string; text: string; modified: Date },
): PackageData {
  const parsed = parseDesign(input);
  const result = evaluateDesign(parsed, { stations: true, shapes: findShape });
  return {
    projectName: 'not stored in a project',
    site: '',
    codeBasis: '',
    cantileverName: source.name,
    quantity: 1,
    revision: {
      number: null,
      of: null,
      message: 'made from a design file; not a saved revision',
      author: 'not recorded (design file)',
      createdAt: source.modified.toISOString(),
      reviewState: 'not reviewed (design file)',
      approvedBy: null,
      approvedAt: null,
    },
    engineVersion: result.engineVersion,
    inputSha256: sha256(source.text),
    resultSha256: sha256(JSON.stringify(result)),
    input,
    result,
    layout: layoutFor(input, findShape),
    scheduleRow: parsed.connection
      ? plateScheduleRow(source.name, parsed.connection, result.connection)
      : null,
  };
}
