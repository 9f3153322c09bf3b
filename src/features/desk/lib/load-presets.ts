/**
 * Common deck loads offered as one-click presets, each with where the number comes from. Values the
 * team remembers rather than read from the code text say so ("from memory"); dead loads of finishes
 * are example values from common practice, with no code source.
 */
import type { UnitSystem } from '../../../../shared/engine/units';
import type { LoadCase } from '../../../../shared/schemas/member';
import { customaryUnit } from './field-units';
import { rewriteQuantity } from './quantity-text';

export interface LoadPreset {
  id: string;
  /** What the load is, without its value (the value is shown in the desk's unit system). */
  label: string;
  kind: 'area' | 'point-at-tip';
  case: LoadCase;
  /** US value as a quantity string; for point-at-tip presets with `perLength`, multiplied by the spacing. */
  value: string;
  perLength?: boolean;
  source: string;
}

export const LOAD_PRESETS: readonly LoadPreset[] = [
  {
    id: 'deck-live',
    label: 'Residential deck live load',
    kind: 'area',
    case: 'L',
    value: '60 psf',
    source: '1.5 × 40 psf for the residential area served, ASCE 7-16 Table 4.3-1 [from memory]',
  },
  {
    id: 'guard-line',
    label: 'Guard rail along the tip',
    kind: 'point-at-tip',
    case: 'L',
    value: '50 lbf/ft',
    perLength: true,
    source:
      'Guard top-rail load 50 lb/ft, IBC 1607.8.1 [from memory]; need not act together with the 200 lb load',
  },
  {
    id: 'guard-point',
    label: 'Guard rail concentrated at the tip',
    kind: 'point-at-tip',
    case: 'L',
    value: '200 lbf',
    source: 'Guard concentrated load 200 lb, IBC 1607.8.1 [from memory]',
  },
  {
    id: 'wood-deck',
    label: 'Wood decking and joists',
    kind: 'area',
    case: 'D',
    value: '10 psf',
    source: 'Example value, common practice, no source',
  },
  {
    id: 'tile-deck',
    label: 'Tile on mortar bed over sheathing',
    kind: 'area',
    case: 'D',
    value: '25 psf',
    source: 'Example value, common practice, no source',
  },
];

/** A preset's value written in the desk's unit system: "60 psf" or "2.873 kPa", "50 lbf/ft × spacing". */
export function presetValueText(preset: LoadPreset, system: UnitSystem): string {
  if (preset.kind === 'area') {
    return (
      rewriteQuantity(preset.value, 'areaLoad', customaryUnit('loads.area.0.value', system) ?? 'psf') ??
      preset.value
    );
  }
  if (preset.perLength) {
    const line = rewriteQuantity(
      preset.value,
      'lineLoad',
      customaryUnit('loads.line.0.value', system) ?? 'lbf/ft',
    );
    return `${line ?? preset.value} × spacing, at the tip`;
  }
  const point = rewriteQuantity(preset.value, 'force', customaryUnit('loads.point.0.value', system) ?? 'lbf');
  return `${point ?? preset.value} at the tip`;
}
