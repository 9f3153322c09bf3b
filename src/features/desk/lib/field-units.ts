/**
 * Which unit each quantity field of the design document is written in, per unit system, and the
 * units its list of conversions offers. Lengths along the member are in ft / m; section, plate and rod sizes
 * in in / mm; loads in psf / kPa, lbf/ft / kN/m, lbf / kN; steel in ksi / MPa; concrete in psi / MPa.
 */
import type { Dimension, UnitSystem } from '../../../../shared/engine/units';

export interface FieldUnit {
  dimension: Dimension;
  US: string;
  SI: string;
}

const long = (): FieldUnit => ({ dimension: 'length', US: 'ft', SI: 'm' });
const small = (): FieldUnit => ({ dimension: 'length', US: 'in', SI: 'mm' });
const steel = (): FieldUnit => ({ dimension: 'stress', US: 'ksi', SI: 'MPa' });

/** Field patterns with `#` standing for an array index. */
const FIELD_UNITS: Record<string, FieldUnit> = {
  'member.length': long(),
  'member.spacing': long(),
  'member.unbracedLength': long(),
  'member.lateralSupport.braces.#': long(),
  'member.section.tipDepth': small(),
  'member.section.plates.rootDepth': small(),
  'member.section.plates.tipDepth': small(),
  'member.section.plates.flangeWidth': small(),
  'member.section.plates.flangeThickness': small(),
  'member.section.plates.webThickness': small(),
  'member.steel.Fy': steel(),
  'member.steel.E': steel(),
  'loads.area.#.value': { dimension: 'areaLoad', US: 'psf', SI: 'kPa' },
  'loads.line.#.value': { dimension: 'lineLoad', US: 'lbf/ft', SI: 'kN/m' },
  'loads.point.#.value': { dimension: 'force', US: 'lbf', SI: 'kN' },
  'loads.point.#.at': long(),
  frequencyMin: { dimension: 'frequency', US: 'Hz', SI: 'Hz' },
  'connection.plate.N': small(),
  'connection.plate.B': small(),
  'connection.plate.thickness': small(),
  'connection.plate.Fy': steel(),
  'connection.anchors.diameter': small(),
  'connection.anchors.offset': small(),
  'connection.anchors.gauge': small(),
  'connection.anchors.embedment': small(),
  'connection.concrete.fc': { dimension: 'stress', US: 'psi', SI: 'MPa' },
  'connection.pier.length': small(),
  'connection.pier.width': small(),
  'connection.post.height': small(),
  'connection.weld.size': small(),
};

/** The unit description of a field name written the react-hook-form way ("loads.area.0.value"). */
export function fieldUnit(name: string): FieldUnit | undefined {
  return FIELD_UNITS[name.replace(/\.\d+(?=\.|$)/g, '.#')];
}

export function customaryUnit(name: string, system: UnitSystem): string | undefined {
  return fieldUnit(name)?.[system];
}

/** The units a field's list of conversions offers, by dimension. */
export const UNIT_CHOICES: Record<Dimension, readonly string[]> = {
  length: ['ft', 'in', 'm', 'mm'],
  force: ['lbf', 'kip', 'kN'],
  stress: ['ksi', 'psi', 'MPa'],
  areaLoad: ['psf', 'kPa'],
  lineLoad: ['lbf/ft', 'kip/ft', 'kN/m'],
  moment: ['kip ft', 'kN m'],
  frequency: ['Hz'],
  density: ['pcf', 'kN/m^3'],
};
