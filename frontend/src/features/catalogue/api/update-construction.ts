import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { z } from 'zod';
import type { ConstructionDto, constructionUpdateSchema } from '@shared/schemas/register.schema';
import { api } from '@/lib/api-client';
import { constructionKeys } from './construction-keys';

/** Only the fields that changed; quantities as `{ value, unit }`. */
export type ConstructionUpdateBody = z.input<typeof constructionUpdateSchema>;

/** Saves a change; the server recomputes the checks of the assemblies built from this construction. */
export function updateConstruction({ id, input }: { id: string; input: ConstructionUpdateBody }): Promise<ConstructionDto> {
  return api.patch<{ data: ConstructionDto }>(`/api/constructions/${encodeURIComponent(id)}`, input).then((body) => body.data);
}

export function useUpdateConstruction({ onSuccess }: { onSuccess?: (construction: ConstructionDto) => void } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updateConstruction,
    onSuccess: (construction) => {
      queryClient.setQueryData(constructionKeys.detail(construction.id), construction);
      void queryClient.invalidateQueries({ queryKey: constructionKeys.lists() });
      onSuccess?.(construction);
    },
  });
}
