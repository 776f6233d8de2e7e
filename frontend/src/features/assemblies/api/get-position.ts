import { queryOptions, useQuery } from '@tanstack/react-query';
import type { PositionDto } from '@shared/schemas/register.schema';
import { api } from '@/lib/api-client';
import { lookupKeys } from './lookup-keys';

/** One position with its design conditions and the assembly in it now. */
export function getPosition(id: string, signal?: AbortSignal): Promise<PositionDto> {
  return api.get<{ data: PositionDto }>(`/api/positions/${encodeURIComponent(id)}`, undefined, signal).then((body) => body.data);
}

export const positionQueryOptions = (id: string | null | undefined) =>
  queryOptions({
    queryKey: lookupKeys.positions.detail(id ?? ''),
    queryFn: ({ signal }) => getPosition(id!, signal),
    enabled: Boolean(id),
  });

export function usePosition(id: string | null | undefined) {
  return useQuery(positionQueryOptions(id));
}
