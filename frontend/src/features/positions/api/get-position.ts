import { queryOptions, useQuery } from '@tanstack/react-query';
import type { PositionDto } from '@shared/schemas/register.schema';
import { api } from '@/lib/api-client';
import { positionKeys } from './position-keys';

export function getPosition(id: string, signal?: AbortSignal): Promise<PositionDto> {
  return api.get<{ data: PositionDto }>(`/api/positions/${encodeURIComponent(id)}`, undefined, signal).then((body) => body.data);
}

export const positionQueryOptions = (id: string) =>
  queryOptions({
    queryKey: positionKeys.detail(id),
    queryFn: ({ signal }) => getPosition(id, signal),
  });

export function usePosition(id: string) {
  return useQuery(positionQueryOptions(id));
}
