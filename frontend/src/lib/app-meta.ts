import { queryOptions, useQuery } from '@tanstack/react-query';
import type { AppMetaDto } from '@shared/schemas/auth.schema';
import { api } from './api-client';
import { metaKeys } from './query-keys';

export function getAppMeta(signal?: AbortSignal): Promise<AppMetaDto> {
  return api.get<{ data: AppMetaDto }>('/api/meta', undefined, signal).then((body) => body.data);
}

export const appMetaQueryOptions = () =>
  queryOptions({
    queryKey: metaKeys.all,
    queryFn: ({ signal }) => getAppMeta(signal),
    staleTime: 10 * 60_000,
  });

export function useAppMeta() {
  return useQuery(appMetaQueryOptions());
}
