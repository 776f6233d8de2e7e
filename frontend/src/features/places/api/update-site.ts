import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { SiteDto, SiteUpdateInput } from '@shared/schemas/register.schema';
import { api } from '@/lib/api-client';
import { siteDetailKeys } from './place-keys';

export function updateSite({ id, input }: { id: string; input: SiteUpdateInput }): Promise<SiteDto> {
  return api.patch<{ data: SiteDto }>(`/api/sites/${encodeURIComponent(id)}`, input).then((body) => body.data);
}

export function useUpdateSite({ onSuccess }: { onSuccess?: (site: SiteDto) => void } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updateSite,
    onSuccess: (site) => {
      queryClient.setQueryData(siteDetailKeys.detail(site.id), site);
      onSuccess?.(site);
    },
  });
}
