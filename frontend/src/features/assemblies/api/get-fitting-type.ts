import { queryOptions, useQuery } from '@tanstack/react-query';
import type { FittingTypeDto } from '@shared/schemas/register.schema';
import { api } from '@/lib/api-client';
import { lookupKeys } from './lookup-keys';

/** One fitting type with its sizes, ratings and crimp specifications. */
export function getFittingType(id: string, signal?: AbortSignal): Promise<FittingTypeDto> {
  return api.get<{ data: FittingTypeDto }>(`/api/fitting-types/${encodeURIComponent(id)}`, undefined, signal).then((body) => body.data);
}

export const fittingTypeQueryOptions = (id: string | null | undefined) =>
  queryOptions({
    queryKey: lookupKeys.fittingTypes.detail(id ?? ''),
    queryFn: ({ signal }) => getFittingType(id!, signal),
    enabled: Boolean(id),
    staleTime: 5 * 60_000,
  });

export function useFittingType(id: string | null | undefined) {
  return useQuery(fittingTypeQueryOptions(id));
}
