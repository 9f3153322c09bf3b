/** The admin feature's query keys; every invalidation goes through here. */
export const adminKeys = {
  all: ['admin'] as const,
  users: () => [...adminKeys.all, 'users'] as const,
  outbox: () => [...adminKeys.all, 'outbox'] as const,
  project: (projectId: number) => [...adminKeys.all, 'project', projectId] as const,
};
