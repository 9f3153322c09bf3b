/** The revisions feature's query keys; every invalidation goes through here. */
export const revisionKeys = {
  all: ['revisions'] as const,
  lists: () => [...revisionKeys.all, 'list'] as const,
  list: (cantileverId: number) => [...revisionKeys.lists(), cantileverId] as const,
  details: () => [...revisionKeys.all, 'detail'] as const,
  detail: (revisionId: number) => [...revisionKeys.details(), revisionId] as const,
};
