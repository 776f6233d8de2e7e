import { infiniteQueryOptions, useInfiniteQuery } from '@tanstack/react-query';
import type { ListResponse } from '@shared/schemas/common.schema';
import type { ArchivedFilter, AreaDto } from '@shared/schemas/register.schema';
import { api } from '@/lib/api-client';
import { areaKeys, nextPageOf, TREE_PAGE_SIZE } from './place-keys';

export function getAreas(query: { siteId: string; archived: ArchivedFilter; page: number }, signal?: AbortSignal): Promise<ListResponse<AreaDto>> {
  return api.get<ListResponse<AreaDto>>('/api/areas', { siteId: query.siteId, archived: query.archived, sort: 'code', page: query.page, pageSize: TREE_PAGE_SIZE }, signal);
}

export const areasQueryOptions = (siteId: string, archived: ArchivedFilter) =>
  infiniteQueryOptions({
    queryKey: areaKeys.list(siteId, archived),
    queryFn: ({ pageParam, signal }) => getAreas({ siteId, archived, page: pageParam }, signal),
    initialPageParam: 1,
    getNextPageParam: nextPageOf,
  });

/** The areas of one site, a page at a time. */
export function useAreas(siteId: string, archived: ArchivedFilter) {
  return useInfiniteQuery(areasQueryOptions(siteId, archived));
}
