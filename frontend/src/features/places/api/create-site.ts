import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { SiteCreateInput, SiteDto } from '@shared/schemas/register.schema';
import { api } from '@/lib/api-client';
import { siteDetailKeys } from './place-keys';

/** Adds a site; the server gives it every service of the catalogue at its defaults. */
export function createSite(input: SiteCreateInput): Promise<SiteDto> {
  return api.post<{ data: SiteDto }>('/api/sites', input).then((body) => body.data);
}

export function useCreateSite({ onSuccess }: { onSuccess?: (site: SiteDto) => void } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createSite,
    onSuccess: (site) => {
      queryClient.setQueryData(siteDetailKeys.detail(site.id), site);
      onSuccess?.(site);
    },
  });
}
