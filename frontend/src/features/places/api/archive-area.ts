import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { areaKeys } from './place-keys';

/** Archives an area whose equipment is all archived; the server refuses one still in use. */
export function archiveArea(id: string): Promise<void> {
  return api.post<void>(`/api/areas/${encodeURIComponent(id)}/archive`);
}

export function useArchiveArea({ onSuccess }: { onSuccess?: () => void } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: archiveArea,
    onSuccess: () => {
      void queryClient.invalidateQueries({ queryKey: areaKeys.lists() });
      onSuccess?.();
    },
  });
}
