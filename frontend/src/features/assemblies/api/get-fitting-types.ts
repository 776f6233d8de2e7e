import { queryOptions, useQuery } from '@tanstack/react-query';
import type { ListResponse } from '@shared/schemas/common.schema';
import type { FittingTypeDto } from '@shared/schemas/register.schema';
import { api } from '@/lib/api-client';
import { lookupKeys } from './lookup-keys';

/** The fitting types of the catalogue, by code (a plant keeps a few dozen at most). */
export function getFittingTypes(signal?: AbortSignal): Promise<ListResponse<FittingTypeDto>> {
  return api.get<ListResponse<FittingTypeDto>>('/api/fitting-types', { sort: 'code', pageSize: 200 }, signal);
}

export const fittingTypesQueryOptions = () =>
  queryOptions({
    queryKey: lookupKeys.fittingTypes.list(),
    queryFn: ({ signal }) => getFittingTypes(signal),
    staleTime: 5 * 60_000,
  });

export function useFittingTypes() {
  return useQuery(fittingTypesQueryOptions());
}
