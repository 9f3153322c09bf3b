/** Every client route path in one place. */
export const paths = {
  signIn: '/sign-in',
  projects: '/projects',
  project: (projectId: number | string) => `/projects/${projectId}`,
  desk: (cantileverId: number | string) => `/cantilevers/${cantileverId}`,
  history: (cantileverId: number | string) => `/cantilevers/${cantileverId}/history`,
  compare: (cantileverId: number | string, a?: number | string, b?: number | string) =>
    `/cantilevers/${cantileverId}/compare${a && b ? `?a=${a}&b=${b}` : ''}`,
  review: (revisionId: number | string) => `/revisions/${revisionId}/review`,
  /** Any revision, read-only, in the desk's layout. */
  revision: (revisionId: number | string) => `/revisions/${revisionId}`,
  /** The reach study of a cantilever (a sweep of two inputs). */
  study: (cantileverId: number | string) => `/cantilevers/${cantileverId}/study`,
  shapes: '/shapes',
  account: '/account',
  team: '/admin/team',
  outbox: '/admin/outbox',
} as const;

/** Route patterns for React Router, matching `paths`. */
export const routePatterns = {
  signIn: '/sign-in',
  projects: '/projects',
  project: '/projects/:projectId',
  desk: '/cantilevers/:cantileverId',
  history: '/cantilevers/:cantileverId/history',
  compare: '/cantilevers/:cantileverId/compare',
  review: '/revisions/:revisionId/review',
  revision: '/revisions/:revisionId',
  study: '/cantilevers/:cantileverId/study',
  shapes: '/shapes',
  account: '/account',
  team: '/admin/team',
  outbox: '/admin/outbox',
} as const;
