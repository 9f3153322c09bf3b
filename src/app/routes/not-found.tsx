import { Link } from 'react-router-dom';
import { paths } from '../../config/paths';

export default function NotFoundRoute() {
  return (
    <section className="p-8">
      <h1 className="text-lg font-semibold">Nothing here</h1>
      <p className="mt-2 text-sm text-concrete-600">This address does not lead to a screen of Reachline.</p>
      <Link className="mt-4 inline-block text-oxide-600 underline" to={paths.projects}>
        Back to Projects
      </Link>
    </section>
  );
}
