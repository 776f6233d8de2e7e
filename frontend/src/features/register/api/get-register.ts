import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import type { AssemblyListItemDto } from '@shared/schemas/assemblies.schema';
import type { ListResponse } from '@shared/schemas/common.schema';
import { api, type QueryParams } from '@/lib/api-client';
import type { RegisterQuery } from '../hooks/use-register-search';
import { registerKeys } from './register-keys';

/** The register's query as the API reads it: the statuses as one comma list. */
export function registerParams(query: RegisterQuery): QueryParams {
  return {
    q: query.q,
    siteId: query.siteId,
    areaId: query.areaId,
    equipmentId: query.equipmentId,
    positionId: query.positionId,
    serviceCode: query.serviceCode,
    constructionId: query.constructionId,
    sizeCode: query.sizeCode,
    status: query.status?.length ? query.status.join(',') : undefined,
    checkOutcome: query.checkOutcome,
    due: query.due,
    sort: query.sort,
    dir: query.dir,
    page: query.page,
    pageSize: query.pageSize,
  };
}

/** One page of the register, searched, filtered and sorted by the server. */
export function getRegister(query: RegisterQuery, signal?: AbortSignal): Promise<ListResponse<AssemblyListItemDto>> {
  return api.get<ListResponse<AssemblyListItemDto>>('/api/assemblies', registerParams(query), signal);
}

export const registerQueryOptions = (query: RegisterQuery) =>
  queryOptions({
    queryKey: registerKeys.list(query),
    queryFn: ({ signal }) => getRegister(query, signal),
    // The rows of the last view stay on screen while the next sort or filter loads.
    placeholderData: keepPreviousData,
  });

export function useRegister(query: RegisterQuery) {
  return useQuery(registerQueryOptions(query));
}
