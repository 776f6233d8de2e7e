import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { z } from 'zod';
import type { FittingTypeDto, fittingTypeUpdateSchema } from '@shared/schemas/register.schema';
import { api } from '@/lib/api-client';
import { fittingTypeKeys } from './fitting-type-keys';

/** Only the fields that changed; `sizes`, when sent, replaces the whole list. */
export type FittingTypeUpdateBody = z.input<typeof fittingTypeUpdateSchema>;

export function updateFittingType({ id, input }: { id: string; input: FittingTypeUpdateBody }): Promise<FittingTypeDto> {
  return api.patch<{ data: FittingTypeDto }>(`/api/fitting-types/${encodeURIComponent(id)}`, input).then((body) => body.data);
}

export function useUpdateFittingType({ onSuccess }: { onSuccess?: (fitting: FittingTypeDto) => void } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updateFittingType,
    onSuccess: (fitting) => {
      queryClient.setQueryData(fittingTypeKeys.detail(fitting.id), fitting);
      void queryClient.invalidateQueries({ queryKey: fittingTypeKeys.lists() });
      onSuccess?.(fitting);
    },
  });
}
