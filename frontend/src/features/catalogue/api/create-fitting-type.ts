import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { z } from 'zod';
import type { FittingTypeDto, fittingTypeCreateSchema } from '@shared/schemas/register.schema';
import { api } from '@/lib/api-client';
import { fittingTypeKeys } from './fitting-type-keys';

/** What the client sends: each size's rating and crimp dimensions as `{ value, unit }`. */
export type FittingTypeCreateBody = z.input<typeof fittingTypeCreateSchema>;

export function createFittingType(input: FittingTypeCreateBody): Promise<FittingTypeDto> {
  return api.post<{ data: FittingTypeDto }>('/api/fitting-types', input).then((body) => body.data);
}

export function useCreateFittingType({ onSuccess }: { onSuccess?: (fitting: FittingTypeDto) => void } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createFittingType,
    onSuccess: (fitting) => {
      queryClient.setQueryData(fittingTypeKeys.detail(fitting.id), fitting);
      void queryClient.invalidateQueries({ queryKey: fittingTypeKeys.lists() });
      onSuccess?.(fitting);
    },
  });
}
