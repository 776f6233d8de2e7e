export const siteServiceKeys = {
  all: ['site-services'] as const,
  lists: () => [...siteServiceKeys.all, 'list'] as const,
  list: (siteId: string) => [...siteServiceKeys.lists(), siteId] as const,
};
