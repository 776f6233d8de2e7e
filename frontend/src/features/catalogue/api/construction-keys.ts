import type { ConstructionListQuery } from '@shared/schemas/register.schema';

export const constructionKeys = {
  all: ['constructions'] as const,
  lists: () => [...constructionKeys.all, 'list'] as const,
  list: (query: ConstructionListQuery) => [...constructionKeys.lists(), query] as const,
  details: () => [...constructionKeys.all, 'detail'] as const,
  detail: (id: string) => [...constructionKeys.details(), id] as const,
};
