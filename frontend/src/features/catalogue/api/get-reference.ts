import { queryOptions, useQuery } from '@tanstack/react-query';
import type { ReferenceDto } from '@shared/schemas/register.schema';
import { api } from '@/lib/api-client';
import { referenceKeys } from './reference-keys';

/** Size classes, media, tube compounds, the compatibility table and the service catalogue, as the server has them. */
export function getReference(signal?: AbortSignal): Promise<ReferenceDto> {
  return api.get<{ data: ReferenceDto }>('/api/reference', undefined, signal).then((body) => body.data);
}

export const referenceQueryOptions = () =>
  queryOptions({
    queryKey: referenceKeys.all,
    queryFn: ({ signal }) => getReference(signal),
    // The lists change only when the server is upgraded.
    staleTime: 60 * 60_000,
  });

export function useReference() {
  return useQuery(referenceQueryOptions());
}
