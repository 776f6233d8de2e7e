import { queryOptions, useQuery } from '@tanstack/react-query';
import type { AssemblyDto } from '@shared/schemas/assemblies.schema';
import { api } from '@/lib/api-client';
import { positionAssemblyKeys } from './position-keys';

/** The assembly now in a position, with its stored check results. */
export function getPositionAssembly(id: string, signal?: AbortSignal): Promise<AssemblyDto> {
  return api.get<{ data: AssemblyDto }>(`/api/assemblies/${encodeURIComponent(id)}`, undefined, signal).then((body) => body.data);
}

export const positionAssemblyQueryOptions = (id: string) =>
  queryOptions({
    queryKey: positionAssemblyKeys.detail(id),
    queryFn: ({ signal }) => getPositionAssembly(id, signal),
  });

export function usePositionAssembly(id: string) {
  return useQuery(positionAssemblyQueryOptions(id));
}
