import type { ConnectionInput } from '../../../../shared/schemas/connection';

/** The connection a design starts from when "no connection" is switched off (US units). */
export const DEFAULT_CONNECTION: ConnectionInput = {
  arrangement: 'post-base',
  plate: { N: '20 in', B: '14 in', thickness: '1.5 in', Fy: '36 ksi' },
  anchors: {
    perSide: 2,
    diameter: '1 in',
    grade: 'F1554-36',
    offset: '8 in',
    gauge: '10 in',
    embedment: '12 in',
  },
  concrete: { fc: '4000 psi', cracked: true },
  pier: { length: '30 in', width: '24 in' },
};
