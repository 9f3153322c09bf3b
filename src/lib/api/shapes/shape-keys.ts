/** The shapes feature's query keys; every invalidation goes through here. */
export const shapeKeys = {
  all: ['shapes'] as const,
  list: () => [...shapeKeys.all, 'list'] as const,
};
