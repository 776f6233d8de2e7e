import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { constructionKeys } from './construction-keys';

/** Takes a construction out of the pickers; assemblies built from it keep it. */
export function archiveConstruction(id: string): Promise<void> {
  return api.post<void>(`/api/constructions/${encodeURIComponent(id)}/archive`);
}

export function useArchiveConstruction({ onSuccess }: { onSuccess?: () => void } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: archiveConstruction,
    onSuccess: (_data, id) => {
      void queryClient.invalidateQueries({ queryKey: constructionKeys.detail(id) });
      void queryClient.invalidateQueries({ queryKey: constructionKeys.lists() });
      onSuccess?.();
    },
  });
}
