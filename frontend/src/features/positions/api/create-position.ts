import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { z } from 'zod';
import type { PositionDto, positionCreateSchema } from '@shared/schemas/register.schema';
import { api } from '@/lib/api-client';
import { positionKeys } from './position-keys';

/** A new position: its equipment, code and name, and the design conditions as typed with their units. */
export type NewPosition = z.input<typeof positionCreateSchema>;

export function createPosition(input: NewPosition): Promise<PositionDto> {
  return api.post<{ data: PositionDto }>('/api/positions', input).then((body) => body.data);
}

export function useCreatePosition({ onSuccess }: { onSuccess?: (position: PositionDto) => void } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createPosition,
    onSuccess: (position) => {
      queryClient.setQueryData(positionKeys.detail(position.id), position);
      void queryClient.invalidateQueries({ queryKey: positionKeys.all });
      onSuccess?.(position);
    },
  });
}
