import type { RegisterFilters, RegisterQuery } from '../hooks/use-register-search';

/**
 * Keys of the register's reads. They sit under each resource's root (`assemblies`,
 * `constructions`) so a change made anywhere refreshes them, with a segment of their own so they
 * never share an entry with another screen's shape of the same data.
 */
export const registerKeys = {
  all: ['assemblies'] as const,
  lists: () => [...registerKeys.all, 'register'] as const,
  list: (query: RegisterQuery) => [...registerKeys.lists(), 'page', query] as const,
  counts: (filters: RegisterFilters) => [...registerKeys.lists(), 'counts', filters] as const,
};

export const registerConstructionKeys = {
  all: ['constructions'] as const,
  lookup: () => [...registerConstructionKeys.all, 'register-lookup'] as const,
};
