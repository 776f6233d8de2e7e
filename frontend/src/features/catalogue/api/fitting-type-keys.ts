import type { FittingTypeListQuery } from '@shared/schemas/register.schema';

export const fittingTypeKeys = {
  all: ['fitting-types'] as const,
  lists: () => [...fittingTypeKeys.all, 'list'] as const,
  list: (query: FittingTypeListQuery) => [...fittingTypeKeys.lists(), query] as const,
  details: () => [...fittingTypeKeys.all, 'detail'] as const,
  detail: (id: string) => [...fittingTypeKeys.details(), id] as const,
};
