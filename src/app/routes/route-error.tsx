import { isRouteErrorResponse, Link, useRouteError } from 'react-router-dom';
import { paths } from '../../config/paths';

/** Shown when a route fails to load or throws; plain words and a way back. */
export function RouteError() {
  const error = useRouteError();
  const text = isRouteErrorResponse(error)
    ? `${error.status} ${error.statusText}`
    : error instanceof Error
      ? error.message
      : 'Something went wrong.';
  return (
    <main className="mx-auto max-w-xl p-8">
      <h1 className="text-lg font-semibold">This screen could not be shown</h1>
      <p role="alert" className="mt-2 text-sm text-util-over">
        {text}
      </p>
      <Link className="mt-4 inline-block text-oxide-600 underline" to={paths.projects}>
        Back to Projects
      </Link>
    </main>
  );
}
