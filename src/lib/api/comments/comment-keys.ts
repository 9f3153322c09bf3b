/** The comment threads' query keys (one thread per revision); every invalidation goes through here. */
export const commentKeys = {
  all: ['comments'] as const,
  list: (revisionId: number) => [...commentKeys.all, 'list', revisionId] as const,
};
