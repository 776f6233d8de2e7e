import { queryOptions, useQuery } from '@tanstack/react-query';
import type { ListResponse } from '@shared/schemas/common.schema';
import type { ConstructionDto } from '@shared/schemas/register.schema';
import { api } from '@/lib/api-client';
import { registerConstructionKeys } from './register-keys';

/** The most constructions the filter lists; the server allows 200 a page. */
export const CONSTRUCTION_OPTIONS_LIMIT = 200;

/** The plant's constructions by code, archived ones included: old assemblies are still built from them. */
export function getConstructionOptions(signal?: AbortSignal): Promise<ListResponse<ConstructionDto>> {
  return api.get<ListResponse<ConstructionDto>>('/api/constructions', { sort: 'code', archived: 'include', pageSize: CONSTRUCTION_OPTIONS_LIMIT }, signal);
}

export const constructionOptionsQueryOptions = () =>
  queryOptions({
    queryKey: registerConstructionKeys.lookup(),
    queryFn: ({ signal }) => getConstructionOptions(signal),
    staleTime: 5 * 60_000,
  });

export function useConstructionOptions() {
  return useQuery(constructionOptionsQueryOptions());
}
