import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { EquipmentCreateInput, EquipmentDto } from '@shared/schemas/register.schema';
import { api } from '@/lib/api-client';
import { equipmentKeys } from './place-keys';

export function createEquipment(input: EquipmentCreateInput): Promise<EquipmentDto> {
  return api.post<{ data: EquipmentDto }>('/api/equipment', input).then((body) => body.data);
}

export function useCreateEquipment({ onSuccess }: { onSuccess?: (equipment: EquipmentDto) => void } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createEquipment,
    onSuccess: (equipment) => {
      void queryClient.invalidateQueries({ queryKey: equipmentKeys.lists() });
      onSuccess?.(equipment);
    },
  });
}
