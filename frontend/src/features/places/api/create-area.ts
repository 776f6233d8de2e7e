import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { AreaCreateInput, AreaDto } from '@shared/schemas/register.schema';
import { api } from '@/lib/api-client';
import { areaKeys } from './place-keys';

export function createArea(input: AreaCreateInput): Promise<AreaDto> {
  return api.post<{ data: AreaDto }>('/api/areas', input).then((body) => body.data);
}

export function useCreateArea({ onSuccess }: { onSuccess?: (area: AreaDto) => void } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createArea,
    onSuccess: (area) => {
      void queryClient.invalidateQueries({ queryKey: areaKeys.lists() });
      onSuccess?.(area);
    },
  });
}
