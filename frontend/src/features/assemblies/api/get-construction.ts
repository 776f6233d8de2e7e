import { queryOptions, useQuery } from '@tanstack/react-query';
import type { ConstructionDto } from '@shared/schemas/register.schema';
import { api } from '@/lib/api-client';
import { lookupKeys } from './lookup-keys';

/** One construction: its ratings, burst pressure and bend radius. */
export function getConstruction(id: string, signal?: AbortSignal): Promise<ConstructionDto> {
  return api.get<{ data: ConstructionDto }>(`/api/constructions/${encodeURIComponent(id)}`, undefined, signal).then((body) => body.data);
}

export const constructionQueryOptions = (id: string | null | undefined) =>
  queryOptions({
    queryKey: lookupKeys.constructions.detail(id ?? ''),
    queryFn: ({ signal }) => getConstruction(id!, signal),
    enabled: Boolean(id),
    staleTime: 5 * 60_000,
  });

export function useConstruction(id: string | null | undefined) {
  return useQuery(constructionQueryOptions(id));
}
