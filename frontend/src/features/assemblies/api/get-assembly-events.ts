import { queryOptions, useQuery } from '@tanstack/react-query';
import type { AssemblyEventDto } from '@shared/schemas/assemblies.schema';
import { api } from '@/lib/api-client';
import { assemblyKeys } from './assembly-keys';

/** Everything recorded on one assembly, newest first; voided events stay, marked with their void. */
export function getAssemblyEvents(id: string, signal?: AbortSignal): Promise<AssemblyEventDto[]> {
  return api.get<{ data: AssemblyEventDto[] }>(`/api/assemblies/${encodeURIComponent(id)}/events`, undefined, signal).then((body) => body.data);
}

export const assemblyEventsQueryOptions = (id: string) =>
  queryOptions({
    queryKey: assemblyKeys.events(id),
    queryFn: ({ signal }) => getAssemblyEvents(id, signal),
  });

export function useAssemblyEvents(id: string) {
  return useQuery(assemblyEventsQueryOptions(id));
}
