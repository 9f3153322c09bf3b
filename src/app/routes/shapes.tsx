import { useMe } from '../../lib/api/me/get-me';
import { ShapesBrowser } from '../../components/shapes/shapes-browser';
import { ShapeImport } from '../../features/shapes/components/shape-import';

export default function ShapesRoute() {
  const me = useMe();
  const mayImport = me.data ? me.data.role !== 'admin' : false;
  return (
    <section className="mx-auto flex max-w-7xl flex-col gap-4 p-6">
      <div>
        <h1 className="text-xl font-semibold">Shapes</h1>
        <p className="text-sm text-concrete-600">
          The open shapes table and the shapes your team imported. Values are in US customary units.
        </p>
      </div>
      <ShapesBrowser />
      {mayImport ? (
        <ShapeImport />
      ) : (
        <p className="text-sm text-concrete-600">Architects, fabricators and engineers can import shapes.</p>
      )}
    </section>
  );
}
