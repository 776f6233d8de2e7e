import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { equipmentKeys } from './place-keys';

/** Archives equipment whose positions are all archived; the server refuses equipment still in use. */
export function archiveEquipment(id: string): Promise<void> {
  return api.post<void>(`/api/equipment/${encodeURIComponent(id)}/archive`);
}

export function useArchiveEquipment({ onSuccess }: { onSuccess?: () => void } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: archiveEquipment,
    onSuccess: () => {
      void queryClient.invalidateQueries({ queryKey: equipmentKeys.lists() });
      onSuccess?.();
    },
  });
}
