/**
 * PLACEHOLDER until the connection engine lands: the connection is not checked yet, so it
 * reports one failed check rather than a pass that was not computed.
 */
import type { ConnectionInput } from '../../schemas/connection';
import type { Check, ConnectionResult, RootDemand, RootFootprint } from '../types';
import type { ShapeLookup } from '../shapes/types';
import type { UnitSystem } from '../units';

export interface ConnectionContext {
  units: UnitSystem;
  method: 'LRFD' | 'ASD';
  shapes: ShapeLookup;
}

export function checkConnection(
  _input: ConnectionInput,
  _demands: RootDemand[],
  _root: RootFootprint,
  _ctx: ConnectionContext,
): { result: ConnectionResult | null; checks: Check[] } {
  return {
    result: null,
    checks: [
      {
        id: 'connection.pending',
        title: 'Connection at the pier',
        reference: '—',
        combination: null,
        demand: null,
        capacity: null,
        ratio: null,
        ok: false,
        note: 'The connection engine is not available in this build; the connection was not checked.',
      },
    ],
  };
}
