import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import type { ListResponse } from '@shared/schemas/common.schema';
import type { ConstructionDto } from '@shared/schemas/register.schema';
import { api } from '@/lib/api-client';
import { lookupKeys } from './lookup-keys';

/** Constructions of the catalogue matching a search, by code; archived ones are left out. */
export function getConstructions(q: string, signal?: AbortSignal): Promise<ListResponse<ConstructionDto>> {
  return api.get<ListResponse<ConstructionDto>>('/api/constructions', { q, sort: 'code', pageSize: 30 }, signal);
}

export const constructionsQueryOptions = (q: string) =>
  queryOptions({
    queryKey: lookupKeys.constructions.list({ q }),
    queryFn: ({ signal }) => getConstructions(q, signal),
    placeholderData: keepPreviousData,
  });

export function useConstructions(q: string) {
  return useQuery(constructionsQueryOptions(q));
}
