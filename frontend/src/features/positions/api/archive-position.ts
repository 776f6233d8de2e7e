import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { positionKeys } from './position-keys';

/** Archives an empty position; the server refuses while an assembly is in it. */
export function archivePosition(id: string): Promise<void> {
  return api.post<void>(`/api/positions/${encodeURIComponent(id)}/archive`);
}

export function useArchivePosition({ onSuccess }: { onSuccess?: () => void } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: archivePosition,
    onSuccess: async () => {
      await queryClient.invalidateQueries({ queryKey: positionKeys.all });
      onSuccess?.();
    },
  });
}
