import { queryOptions, useQuery } from '@tanstack/react-query';
import type { PositionLifeDto } from '@shared/schemas/assemblies.schema';
import { api } from '@/lib/api-client';
import { positionKeys } from './position-keys';

/** Every assembly that has been at the position, newest first, with its life there. */
export function getPositionHistory(id: string, signal?: AbortSignal): Promise<PositionLifeDto[]> {
  return api.get<{ data: PositionLifeDto[] }>(`/api/positions/${encodeURIComponent(id)}/history`, undefined, signal).then((body) => body.data);
}

export const positionHistoryQueryOptions = (id: string) =>
  queryOptions({
    queryKey: positionKeys.history(id),
    queryFn: ({ signal }) => getPositionHistory(id, signal),
  });

export function usePositionHistory(id: string) {
  return useQuery(positionHistoryQueryOptions(id));
}
