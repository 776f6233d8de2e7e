import type { AssemblyListQuery } from '@shared/schemas/assemblies.schema';

/** The subset of the register query the assembly pickers and searches send. */
export type AssemblySearch = Partial<Pick<AssemblyListQuery, 'q' | 'siteId' | 'status' | 'sizeCode' | 'positionId' | 'page' | 'pageSize'>>;

export const assemblyKeys = {
  all: ['assemblies'] as const,
  lists: () => [...assemblyKeys.all, 'list'] as const,
  list: (query: AssemblySearch) => [...assemblyKeys.lists(), query] as const,
  details: () => [...assemblyKeys.all, 'detail'] as const,
  detail: (id: string) => [...assemblyKeys.details(), id] as const,
  events: (id: string) => [...assemblyKeys.detail(id), 'events'] as const,
};
