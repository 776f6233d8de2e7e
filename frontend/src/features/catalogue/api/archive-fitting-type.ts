import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { fittingTypeKeys } from './fitting-type-keys';

/** Takes a fitting type out of the pickers; assemblies that have it keep it. */
export function archiveFittingType(id: string): Promise<void> {
  return api.post<void>(`/api/fitting-types/${encodeURIComponent(id)}/archive`);
}

export function useArchiveFittingType({ onSuccess }: { onSuccess?: () => void } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: archiveFittingType,
    onSuccess: (_data, id) => {
      void queryClient.invalidateQueries({ queryKey: fittingTypeKeys.detail(id) });
      void queryClient.invalidateQueries({ queryKey: fittingTypeKeys.lists() });
      onSuccess?.();
    },
  });
}
