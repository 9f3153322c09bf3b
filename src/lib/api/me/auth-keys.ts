/** The auth feature's query keys; every invalidation goes through here. */
export const authKeys = {
  all: ['auth'] as const,
  me: () => [...authKeys.all, 'me'] as const,
};
