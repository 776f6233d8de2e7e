import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { ServiceSettingsInput, SiteServiceDto } from '@shared/schemas/register.schema';
import { api } from '@/lib/api-client';
import { siteServiceKeys } from './site-service-keys';

const servicePath = (siteId: string, serviceCode: string) => `/api/sites/${encodeURIComponent(siteId)}/services/${encodeURIComponent(serviceCode)}`;

/** Stores a service's settings at a site; the server recomputes the checks of the assemblies in that service there. */
export function updateSiteService({ siteId, serviceCode, settings }: { siteId: string; serviceCode: string; settings: ServiceSettingsInput }): Promise<SiteServiceDto> {
  return api.put<{ data: SiteServiceDto }>(servicePath(siteId, serviceCode), settings).then((body) => body.data);
}

/** Puts one service in the cached list of its site, as the server answered it. */
export function replaceInList(list: SiteServiceDto[] | undefined, saved: SiteServiceDto): SiteServiceDto[] | undefined {
  return list?.map((s) => (s.serviceCode === saved.serviceCode ? saved : s));
}

export function useUpdateSiteService({ onSuccess }: { onSuccess?: (service: SiteServiceDto) => void } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updateSiteService,
    onSuccess: (saved) => {
      queryClient.setQueryData<SiteServiceDto[]>(siteServiceKeys.list(saved.siteId), (list) => replaceInList(list, saved));
      void queryClient.invalidateQueries({ queryKey: siteServiceKeys.list(saved.siteId) });
      onSuccess?.(saved);
    },
  });
}

export { servicePath };
