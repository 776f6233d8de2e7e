import { queryOptions, useQuery } from '@tanstack/react-query';
import type { SiteServiceDto } from '@shared/schemas/register.schema';
import { api } from '@/lib/api-client';
import { lookupKeys } from './lookup-keys';

/** The services of one site with the settings in force there (design factors, conductivity …). */
export function getSiteServices(siteId: string, signal?: AbortSignal): Promise<SiteServiceDto[]> {
  return api.get<{ data: SiteServiceDto[] }>('/api/services', { siteId }, signal).then((body) => body.data);
}

export const siteServicesQueryOptions = (siteId: string | null | undefined) =>
  queryOptions({
    queryKey: lookupKeys.services.list(siteId ?? ''),
    queryFn: ({ signal }) => getSiteServices(siteId!, signal),
    enabled: Boolean(siteId),
    staleTime: 5 * 60_000,
  });

export function useSiteServices(siteId: string | null | undefined) {
  return useQuery(siteServicesQueryOptions(siteId));
}
