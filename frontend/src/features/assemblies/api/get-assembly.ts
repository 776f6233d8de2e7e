import { queryOptions, useQuery } from '@tanstack/react-query';
import type { AssemblyDto } from '@shared/schemas/assemblies.schema';
import { api } from '@/lib/api-client';
import { assemblyKeys } from './assembly-keys';

/** One assembly with the cautions the server shows before any removal-type action. */
export interface AssemblyWithCautions {
  assembly: AssemblyDto;
  cautions: string[];
}

export function getAssembly(id: string, signal?: AbortSignal): Promise<AssemblyWithCautions> {
  return api
    .get<{ data: AssemblyDto; cautions?: string[] }>(`/api/assemblies/${encodeURIComponent(id)}`, undefined, signal)
    .then((body) => ({ assembly: body.data, cautions: body.cautions ?? [] }));
}

export const assemblyQueryOptions = (id: string) =>
  queryOptions({
    queryKey: assemblyKeys.detail(id),
    queryFn: ({ signal }) => getAssembly(id, signal),
    enabled: id !== '',
  });

export function useAssembly(id: string) {
  return useQuery(assemblyQueryOptions(id));
}
