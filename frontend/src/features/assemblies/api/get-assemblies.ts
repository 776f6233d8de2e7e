import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import type { AssemblyListItemDto } from '@shared/schemas/assemblies.schema';
import type { ListResponse } from '@shared/schemas/common.schema';
import { api } from '@/lib/api-client';
import { assemblyKeys, type AssemblySearch } from './assembly-keys';

/** A page of the register: by tag code or free text, by site, status or size. */
export function getAssemblies(query: AssemblySearch, signal?: AbortSignal): Promise<ListResponse<AssemblyListItemDto>> {
  return api.get<ListResponse<AssemblyListItemDto>>(
    '/api/assemblies',
    {
      q: query.q,
      siteId: query.siteId,
      status: query.status?.join(','),
      sizeCode: query.sizeCode,
      positionId: query.positionId,
      page: query.page,
      pageSize: query.pageSize ?? 20,
    },
    signal,
  );
}

export const assembliesQueryOptions = (query: AssemblySearch, enabled = true) =>
  queryOptions({
    queryKey: assemblyKeys.list(query),
    queryFn: ({ signal }) => getAssemblies(query, signal),
    placeholderData: keepPreviousData,
    enabled,
  });

export function useAssemblies(query: AssemblySearch, { enabled = true }: { enabled?: boolean } = {}) {
  return useQuery(assembliesQueryOptions(query, enabled));
}
