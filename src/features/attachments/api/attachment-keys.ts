/** The attachments feature's query keys; every invalidation goes through here. */
export const attachmentKeys = {
  all: ['attachments'] as const,
  list: (cantileverId: number) => [...attachmentKeys.all, 'list', cantileverId] as const,
};
