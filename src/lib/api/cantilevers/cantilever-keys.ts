/** The cantilevers feature's query keys; every invalidation goes through here. */
export const cantileverKeys = {
  all: ['cantilevers'] as const,
  detail: (cantileverId: number) => [...cantileverKeys.all, 'detail', cantileverId] as const,
};
