import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { AreaDto, AreaUpdateInput } from '@shared/schemas/register.schema';
import { api } from '@/lib/api-client';
import { areaKeys, equipmentKeys } from './place-keys';

export function updateArea({ id, input }: { id: string; input: AreaUpdateInput }): Promise<AreaDto> {
  return api.patch<{ data: AreaDto }>(`/api/areas/${encodeURIComponent(id)}`, input).then((body) => body.data);
}

export function useUpdateArea({ onSuccess }: { onSuccess?: (area: AreaDto) => void } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updateArea,
    onSuccess: (area) => {
      void queryClient.invalidateQueries({ queryKey: areaKeys.lists() });
      // Equipment rows carry their area's name.
      void queryClient.invalidateQueries({ queryKey: equipmentKeys.lists() });
      onSuccess?.(area);
    },
  });
}
