import { queryOptions, useQuery } from '@tanstack/react-query';
import type { ConstructionDto } from '@shared/schemas/register.schema';
import { api } from '@/lib/api-client';
import { constructionKeys } from './construction-keys';

export function getConstruction(id: string, signal?: AbortSignal): Promise<ConstructionDto> {
  return api.get<{ data: ConstructionDto }>(`/api/constructions/${encodeURIComponent(id)}`, undefined, signal).then((body) => body.data);
}

export const constructionQueryOptions = (id: string) =>
  queryOptions({
    queryKey: constructionKeys.detail(id),
    queryFn: ({ signal }) => getConstruction(id, signal),
  });

export function useConstruction(id: string) {
  return useQuery(constructionQueryOptions(id));
}
