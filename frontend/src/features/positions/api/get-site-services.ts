import { queryOptions, useQuery } from '@tanstack/react-query';
import type { SiteServiceDto } from '@shared/schemas/register.schema';
import { api } from '@/lib/api-client';
import { siteServiceKeys } from './lookup-keys';

/** The services at one site with the settings in force there (intervals, tests, conductivity). */
export function getSiteServices(siteId: string, signal?: AbortSignal): Promise<SiteServiceDto[]> {
  return api.get<{ data: SiteServiceDto[] }>('/api/services', { siteId }, signal).then((body) => body.data);
}

export const siteServicesQueryOptions = (siteId: string) =>
  queryOptions({
    queryKey: siteServiceKeys.list(siteId),
    queryFn: ({ signal }) => getSiteServices(siteId, signal),
    enabled: siteId !== '',
    staleTime: 5 * 60_000,
  });

export function useSiteServices(siteId: string) {
  return useQuery(siteServicesQueryOptions(siteId));
}
