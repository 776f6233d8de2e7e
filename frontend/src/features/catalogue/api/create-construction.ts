import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { z } from 'zod';
import type { ConstructionDto, constructionCreateSchema } from '@shared/schemas/register.schema';
import { api } from '@/lib/api-client';
import { constructionKeys } from './construction-keys';

/** What the client sends: quantities as `{ value, unit }`; the server converts them to kPa, mm and °C. */
export type ConstructionCreateBody = z.input<typeof constructionCreateSchema>;

export function createConstruction(input: ConstructionCreateBody): Promise<ConstructionDto> {
  return api.post<{ data: ConstructionDto }>('/api/constructions', input).then((body) => body.data);
}

export function useCreateConstruction({ onSuccess }: { onSuccess?: (construction: ConstructionDto) => void } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createConstruction,
    onSuccess: (construction) => {
      queryClient.setQueryData(constructionKeys.detail(construction.id), construction);
      void queryClient.invalidateQueries({ queryKey: constructionKeys.lists() });
      onSuccess?.(construction);
    },
  });
}
