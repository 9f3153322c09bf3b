/**
 * The two demo designs seeded into an empty database. Invented numbers for a demonstration
 * project; they are not a real building and must not be relied on.
 */
import type { DesignDocument } from '../../shared/schemas/design';

/** A rolled W beam whose web is cut to a taper, standing on a post-base plate on a concrete pier. */
export const EAST_DECK_DESIGN: DesignDocument = {
  units: 'US',
  method: 'LRFD',
  member: {
    length: '7 ft',
    spacing: '4 ft',
    section: { shape: 'W12X26', tipDepth: '7 in' },
    steel: { Fy: '50 ksi', E: '29000 ksi' },
  },
  loads: {
    selfWeight: true,
    area: [
      { case: 'D', value: '15 psf' },
      { case: 'L', value: '60 psf' },
    ],
    line: [{ case: 'D', value: '30 lbf/ft' }],
    point: [{ case: 'D', value: '150 lbf', at: '7 ft' }],
  },
  deflectionLimits: { live: 360, total: 240 },
  frequencyMin: '8 Hz',
  connection: {
    arrangement: 'post-base',
    plate: { N: '24 in', B: '16 in', thickness: '1.5 in', Fy: '36 ksi' },
    anchors: {
      perSide: 2,
      diameter: '1 in',
      grade: 'F1554-55',
      offset: '9.5 in',
      gauge: '11 in',
      embedment: '15 in',
    },
    concrete: { fc: '4000 psi', cracked: true },
    pier: { length: '36 in', width: '28 in' },
  },
};

/** A short tube canopy over the entrance, bolted through an end plate to the face of a wall. */
export const ENTRY_CANOPY_DESIGN: DesignDocument = {
  units: 'US',
  method: 'LRFD',
  member: {
    length: '4 ft',
    spacing: '5 ft',
    section: { shape: 'HSS8X4X1/4' },
  },
  loads: {
    selfWeight: true,
    area: [
      { case: 'D', value: '12 psf' },
      { case: 'Lr', value: '20 psf' },
      { case: 'S', value: '25 psf' },
    ],
    line: [],
    point: [],
  },
  deflectionLimits: { live: 240, total: 180 },
  connection: {
    arrangement: 'face-plate',
    plate: { N: '14 in', B: '10 in', thickness: '1 in', Fy: '36 ksi' },
    anchors: {
      perSide: 2,
      diameter: '3/4 in',
      grade: 'F1554-36',
      offset: '5.5 in',
      gauge: '6 in',
      embedment: '8 in',
    },
    concrete: { fc: '4000 psi', cracked: true },
    pier: { length: '30 in', width: '24 in' },
  },
};
