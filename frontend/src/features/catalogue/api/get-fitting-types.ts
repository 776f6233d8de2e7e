import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import type { ListResponse } from '@shared/schemas/common.schema';
import type { FittingTypeDto, FittingTypeListQuery } from '@shared/schemas/register.schema';
import { api } from '@/lib/api-client';
import { fittingTypeKeys } from './fitting-type-keys';

/** One page of fitting types, searched, filtered and sorted by the server. */
export function getFittingTypes(query: FittingTypeListQuery, signal?: AbortSignal): Promise<ListResponse<FittingTypeDto>> {
  return api.get<ListResponse<FittingTypeDto>>(
    '/api/fitting-types',
    { q: query.q, style: query.style, archived: query.archived, sort: query.sort, dir: query.dir, page: query.page, pageSize: query.pageSize },
    signal,
  );
}

export const fittingTypesQueryOptions = (query: FittingTypeListQuery) =>
  queryOptions({
    queryKey: fittingTypeKeys.list(query),
    queryFn: ({ signal }) => getFittingTypes(query, signal),
    placeholderData: keepPreviousData,
  });

export function useFittingTypes(query: FittingTypeListQuery) {
  return useQuery(fittingTypesQueryOptions(query));
}
