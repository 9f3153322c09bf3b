/**
 * Demo designs of Reachline's own (invented numbers): a residential deck on steel cantilevers.
 * Used by the seed data, the desk's "new cantilever" starting point, tests and the bench.
 */
import type { DesignDocument } from '../schemas/design';

/** A W-shape cantilever reaching 9 ft at 4 ft centres, with a post base on a concrete pier. */
export const exampleDesign: DesignDocument = {
  units: 'US',
  method: 'LRFD',
  member: {
    length: '9 ft',
    spacing: '4 ft',
    section: { shape: 'W8X18' },
    unbracedLength: '9 ft',
  },
  loads: {
    selfWeight: true,
    area: [
      { case: 'D', value: '15 psf' }, // framing, decking and finishes (invented)
      { case: 'L', value: '60 psf' }, // 1.5 x 40 psf residential, ASCE 7-16 Table 4.3-1 [mem]
      { case: 'S', value: '25 psf' }, // an invented site snow load
    ],
    line: [],
    point: [{ case: 'D', value: '160 lbf', at: '9 ft' }], // guard and fascia at the tip (invented)
  },
  deflectionLimits: { live: 360, total: 240 },
  // The demo project's own threshold, a project choice stated here, not a code requirement.
  frequencyMin: '8 Hz',
  connection: {
    arrangement: 'post-base',
    plate: { N: '18 in', B: '14 in', thickness: '1.25 in', Fy: '36 ksi' },
    anchors: {
      perSide: 2,
      diameter: '3/4 in',
      grade: 'F1554-36',
      offset: '7 in',
      gauge: '9 in',
      embedment: '12 in',
    },
    concrete: { fc: '4000 psi', cracked: true },
    pier: { length: '30 in', width: '24 in' },
  },
};

/** The same member without a connection: only the member is checked. */
export const exampleMemberOnly: DesignDocument = {
  units: exampleDesign.units,
  method: exampleDesign.method,
  member: exampleDesign.member,
  loads: exampleDesign.loads,
  deflectionLimits: exampleDesign.deflectionLimits,
  frequencyMin: exampleDesign.frequencyMin,
};

/** A tapered example: the same reach with the W's web cut to 6 in at the tip. */
export const exampleTapered: DesignDocument = {
  ...exampleMemberOnly,
  member: { ...exampleDesign.member, section: { shape: 'W10X19', tipDepth: '6 in' } },
};
