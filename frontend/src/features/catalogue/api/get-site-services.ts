import { queryOptions, useQuery } from '@tanstack/react-query';
import type { ListResponse } from '@shared/schemas/common.schema';
import type { SiteServiceDto } from '@shared/schemas/register.schema';
import { api } from '@/lib/api-client';
import { siteServiceKeys } from './site-service-keys';

/** Every service of the catalogue with its settings at one site, in the catalogue's order. */
export function getSiteServices(siteId: string, signal?: AbortSignal): Promise<SiteServiceDto[]> {
  return api.get<ListResponse<SiteServiceDto>>('/api/services', { siteId }, signal).then((body) => body.data);
}

export const siteServicesQueryOptions = (siteId: string) =>
  queryOptions({
    queryKey: siteServiceKeys.list(siteId),
    queryFn: ({ signal }) => getSiteServices(siteId, signal),
  });

export function useSiteServices(siteId: string | undefined) {
  return useQuery({ ...siteServicesQueryOptions(siteId ?? ''), enabled: Boolean(siteId) });
}
