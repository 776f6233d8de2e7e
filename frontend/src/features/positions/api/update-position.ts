import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { z } from 'zod';
import type { PositionDto, positionUpdateSchema } from '@shared/schemas/register.schema';
import { api } from '@/lib/api-client';
import { positionAssemblyKeys, positionKeys } from './position-keys';

/** What the edit form sends: the fields changed, quantities as typed with their unit, and why. */
export type PositionChange = z.input<typeof positionUpdateSchema>;

export function updatePosition({ id, input }: { id: string; input: PositionChange }): Promise<PositionDto> {
  return api.patch<{ data: PositionDto }>(`/api/positions/${encodeURIComponent(id)}`, input).then((body) => body.data);
}

export function useUpdatePosition({ onSuccess }: { onSuccess?: (position: PositionDto) => void } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updatePosition,
    onSuccess: async (position) => {
      queryClient.setQueryData(positionKeys.detail(position.id), position);
      void queryClient.invalidateQueries({ queryKey: positionKeys.all });
      // A change of design conditions recomputes the checks of the assembly in the position.
      await queryClient.invalidateQueries({ queryKey: positionAssemblyKeys.all });
      onSuccess?.(position);
    },
  });
}
