import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import type { ListResponse } from '@shared/schemas/common.schema';
import type { ConstructionDto, ConstructionListQuery } from '@shared/schemas/register.schema';
import { api } from '@/lib/api-client';
import { constructionKeys } from './construction-keys';

/** One page of constructions, searched, filtered and sorted by the server. */
export function getConstructions(query: ConstructionListQuery, signal?: AbortSignal): Promise<ListResponse<ConstructionDto>> {
  return api.get<ListResponse<ConstructionDto>>(
    '/api/constructions',
    {
      q: query.q,
      sizeCode: query.sizeCode,
      tubeCompound: query.tubeCompound,
      archived: query.archived,
      sort: query.sort,
      dir: query.dir,
      page: query.page,
      pageSize: query.pageSize,
    },
    signal,
  );
}

export const constructionsQueryOptions = (query: ConstructionListQuery) =>
  queryOptions({
    queryKey: constructionKeys.list(query),
    queryFn: ({ signal }) => getConstructions(query, signal),
    placeholderData: keepPreviousData,
  });

export function useConstructions(query: ConstructionListQuery) {
  return useQuery(constructionsQueryOptions(query));
}
