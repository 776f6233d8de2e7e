import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { SiteServiceDto } from '@shared/schemas/register.schema';
import { api } from '@/lib/api-client';
import { siteServiceKeys } from './site-service-keys';
import { replaceInList, servicePath } from './update-site-service';

/** Puts a service at a site back to the catalogue's defaults. */
export function resetSiteService({ siteId, serviceCode }: { siteId: string; serviceCode: string }): Promise<SiteServiceDto> {
  return api.post<{ data: SiteServiceDto }>(`${servicePath(siteId, serviceCode)}/reset`).then((body) => body.data);
}

export function useResetSiteService({ onSuccess }: { onSuccess?: (service: SiteServiceDto) => void } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: resetSiteService,
    onSuccess: (saved) => {
      queryClient.setQueryData<SiteServiceDto[]>(siteServiceKeys.list(saved.siteId), (list) => replaceInList(list, saved));
      void queryClient.invalidateQueries({ queryKey: siteServiceKeys.list(saved.siteId) });
      onSuccess?.(saved);
    },
  });
}
