import { queryOptions, useQuery } from '@tanstack/react-query';
import type { FittingTypeDto } from '@shared/schemas/register.schema';
import { api } from '@/lib/api-client';
import { fittingTypeKeys } from './fitting-type-keys';

export function getFittingType(id: string, signal?: AbortSignal): Promise<FittingTypeDto> {
  return api.get<{ data: FittingTypeDto }>(`/api/fitting-types/${encodeURIComponent(id)}`, undefined, signal).then((body) => body.data);
}

export const fittingTypeQueryOptions = (id: string) =>
  queryOptions({
    queryKey: fittingTypeKeys.detail(id),
    queryFn: ({ signal }) => getFittingType(id, signal),
  });

export function useFittingType(id: string) {
  return useQuery(fittingTypeQueryOptions(id));
}
