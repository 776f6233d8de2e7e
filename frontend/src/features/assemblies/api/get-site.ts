import { queryOptions, useQuery } from '@tanstack/react-query';
import type { SiteDto } from '@shared/schemas/register.schema';
import { api } from '@/lib/api-client';
import { lookupKeys } from './lookup-keys';

/** One site: its currency and default units. */
export function getSite(id: string, signal?: AbortSignal): Promise<SiteDto> {
  return api.get<{ data: SiteDto }>(`/api/sites/${encodeURIComponent(id)}`, undefined, signal).then((body) => body.data);
}

export const siteQueryOptions = (id: string | null | undefined) =>
  queryOptions({
    queryKey: lookupKeys.sites.detail(id ?? ''),
    queryFn: ({ signal }) => getSite(id!, signal),
    enabled: Boolean(id),
    staleTime: 10 * 60_000,
  });

export function useSite(id: string | null | undefined) {
  return useQuery(siteQueryOptions(id));
}
