import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { EquipmentDto, EquipmentUpdateInput } from '@shared/schemas/register.schema';
import { api } from '@/lib/api-client';
import { equipmentKeys, equipmentPositionKeys } from './place-keys';

export function updateEquipment({ id, input }: { id: string; input: EquipmentUpdateInput }): Promise<EquipmentDto> {
  return api.patch<{ data: EquipmentDto }>(`/api/equipment/${encodeURIComponent(id)}`, input).then((body) => body.data);
}

export function useUpdateEquipment({ onSuccess }: { onSuccess?: (equipment: EquipmentDto) => void } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updateEquipment,
    onSuccess: (equipment) => {
      void queryClient.invalidateQueries({ queryKey: equipmentKeys.lists() });
      // Position rows carry their equipment's name.
      void queryClient.invalidateQueries({ queryKey: equipmentPositionKeys.list(equipment.id) });
      onSuccess?.(equipment);
    },
  });
}
