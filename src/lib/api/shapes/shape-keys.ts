/** The shapes feature's query keys; every invalidation goes through here. */
export const shapeKeys = {
  all: ['shapes'] as const,
  /** The shapes one project sees (its own, the organisation's, the published table); no project: the organisation's. */
  list: (projectId?: number) => [...shapeKeys.all, 'list', projectId ?? 'organisation'] as const,
};
