import type { ShapeRecord } from '../../../shared/engine/shapes/types';

const PROPS: { key: keyof ShapeRecord; label: string; unit: string }[] = [
  { key: 'W', label: 'Nominal weight', unit: 'lb/ft' },
  { key: 'A', label: 'Area A', unit: 'in²' },
  { key: 'd', label: 'Depth d', unit: 'in' },
  { key: 'Ht', label: 'Height Ht', unit: 'in' },
  { key: 'B', label: 'Width B', unit: 'in' },
  { key: 'OD', label: 'Outside diameter', unit: 'in' },
  { key: 'bf', label: 'Flange width bf', unit: 'in' },
  { key: 'tf', label: 'Flange thickness tf', unit: 'in' },
  { key: 'tw', label: 'Web thickness tw', unit: 'in' },
  { key: 'tdes', label: 'Design wall thickness', unit: 'in' },
  { key: 'Ix', label: 'Ix', unit: 'in⁴' },
  { key: 'Zx', label: 'Zx', unit: 'in³' },
  { key: 'Sx', label: 'Sx', unit: 'in³' },
  { key: 'rx', label: 'rx', unit: 'in' },
  { key: 'Iy', label: 'Iy', unit: 'in⁴' },
  { key: 'ry', label: 'ry', unit: 'in' },
  { key: 'J', label: 'Torsion constant J', unit: 'in⁴' },
  { key: 'Cw', label: 'Warping constant Cw', unit: 'in⁶' },
  { key: 'rts', label: 'rts', unit: 'in' },
  { key: 'ho', label: 'Flange centroid distance ho', unit: 'in' },
];

/** Every property of one shape, with units. */
export function ShapeDetail({ shape }: { shape: ShapeRecord }) {
  return (
    <div>
      <h2 className="font-mono text-lg font-semibold">{shape.label}</h2>
      <p className="text-xs text-concrete-600">
        {shape.custom ? 'Imported by a user' : 'Published shapes table'} · family {shape.family}
      </p>
      <dl className="mt-2 grid grid-cols-[1fr_auto] gap-x-3 gap-y-0.5 text-sm">
        {PROPS.filter((p) => typeof shape[p.key] === 'number').map((p) => (
          <div key={p.key} className="contents">
            <dt className="text-concrete-600">{p.label}</dt>
            <dd className="num text-right font-mono">
              {String(shape[p.key])} <span className="text-xs text-concrete-500">{p.unit}</span>
            </dd>
          </div>
        ))}
      </dl>
    </div>
  );
}
