import { queryOptions, useQuery } from '@tanstack/react-query';
import type { SiteSummary } from '@shared/schemas/auth.schema';
import { api } from '@/lib/api-client';
import { siteKeys } from './site-keys';

/** The sites the signed-in user may see. */
export function getSites(signal?: AbortSignal): Promise<SiteSummary[]> {
  return api.get<{ data: SiteSummary[] }>('/api/sites', undefined, signal).then((body) => body.data);
}

export const sitesQueryOptions = () =>
  queryOptions({
    queryKey: siteKeys.list(),
    queryFn: ({ signal }) => getSites(signal),
    staleTime: 5 * 60_000,
  });

export function useSites() {
  return useQuery(sitesQueryOptions());
}
