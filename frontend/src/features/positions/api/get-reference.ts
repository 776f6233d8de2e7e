import { queryOptions, useQuery } from '@tanstack/react-query';
import type { ReferenceDto } from '@shared/schemas/register.schema';
import { api } from '@/lib/api-client';
import { referenceKeys } from './lookup-keys';

/** Size classes, media, criticality levels, removal reasons and the service catalogue, as the server has them. */
export function getReference(signal?: AbortSignal): Promise<ReferenceDto> {
  return api.get<{ data: ReferenceDto }>('/api/reference', undefined, signal).then((body) => body.data);
}

export const referenceQueryOptions = () =>
  queryOptions({
    queryKey: referenceKeys.lookup(),
    queryFn: ({ signal }) => getReference(signal),
    // The lists change only when the server is upgraded.
    staleTime: 60 * 60_000,
    gcTime: 2 * 60 * 60_000,
  });

export function useReference() {
  return useQuery(referenceQueryOptions());
}
