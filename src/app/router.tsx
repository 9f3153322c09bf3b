import type { QueryClient } from '@tanstack/react-query';
import { lazy, Suspense, type ComponentType, type LazyExoticComponent } from 'react';
import { createBrowserRouter, Navigate } from 'react-router-dom';
import { paths, routePatterns } from '../config/paths';
import { RequireAuth } from '../features/auth/components/require-auth';
import { Loading } from '../components/ui/status';
import { AppLayout } from '../components/layouts/app-layout';
import { RouteError } from './routes/route-error';
import { deskLoader } from './routes/design-desk-loader';

const SignInRoute = lazy(() => import('./routes/sign-in'));
const ProjectsRoute = lazy(() => import('./routes/projects'));
const ProjectRoute = lazy(() => import('./routes/project'));
const DesignDeskRoute = lazy(() => import('./routes/design-desk'));
const ShapesRoute = lazy(() => import('./routes/shapes'));
const HistoryRoute = lazy(() => import('./routes/history'));
const CompareRoute = lazy(() => import('./routes/compare'));
const ReviewRoute = lazy(() => import('./routes/review'));
const ReachStudyRoute = lazy(() => import('./routes/reach-study'));
const RevisionRoute = lazy(() => import('./routes/revision'));
const TeamRoute = lazy(() => import('./routes/team'));
const AccountRoute = lazy(() => import('./routes/account'));
const OutboxRoute = lazy(() => import('./routes/outbox'));
const NotFoundRoute = lazy(() => import('./routes/not-found'));

function page(Component: LazyExoticComponent<ComponentType>) {
  return (
    <Suspense fallback={<Loading />}>
      <Component />
    </Suspense>
  );
}

/**
 * Every route is split into its own chunk; the sign-in chunk carries no engine and no charts. The
 * desk's loader fills the query cache (`ensureQueryData`) before the desk renders.
 */
export function createAppRouter(queryClient: QueryClient) {
  return createBrowserRouter([
    { path: routePatterns.signIn, element: page(SignInRoute), errorElement: <RouteError /> },
    {
      element: <RequireAuth />,
      errorElement: <RouteError />,
      children: [
        {
          element: <AppLayout />,
          children: [
            { index: true, element: <Navigate to={paths.projects} replace /> },
            { path: routePatterns.projects, element: page(ProjectsRoute) },
            { path: routePatterns.project, element: page(ProjectRoute) },
            {
              path: routePatterns.desk,
              loader: deskLoader(queryClient),
              hydrateFallbackElement: <Loading label="Opening the design desk…" />,
              element: page(DesignDeskRoute),
            },
            { path: routePatterns.history, element: page(HistoryRoute) },
            { path: routePatterns.compare, element: page(CompareRoute) },
            { path: routePatterns.review, element: page(ReviewRoute) },
            { path: routePatterns.study, element: page(ReachStudyRoute) },
            { path: routePatterns.revision, element: page(RevisionRoute) },
            { path: routePatterns.shapes, element: page(ShapesRoute) },
            { path: routePatterns.account, element: page(AccountRoute) },
            { path: routePatterns.team, element: page(TeamRoute) },
            { path: routePatterns.outbox, element: page(OutboxRoute) },
            { path: '*', element: page(NotFoundRoute) },
          ],
        },
      ],
    },
  ]);
}
