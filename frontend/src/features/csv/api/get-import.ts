import { queryOptions, useQuery } from '@tanstack/react-query';
import type { ImportJobDto, ImportStatus } from '@shared/schemas/csv.schema';
import { api } from '@/lib/api-client';
import { importKeys } from './import-keys';

/** How often a running import is asked about, ms. */
export const IMPORT_POLL_MS = 1000;

export const isRunning = (status: ImportStatus | undefined) => status === 'checking' || status === 'writing';

export function getImport(id: string, signal?: AbortSignal): Promise<ImportJobDto> {
  return api.get<{ data: ImportJobDto }>(`/api/imports/${encodeURIComponent(id)}`, undefined, signal).then((body) => body.data);
}

/** One import; asked about again every second while the server checks or writes it. */
export const importQueryOptions = (id: string) =>
  queryOptions({
    queryKey: importKeys.detail(id),
    queryFn: ({ signal }) => getImport(id, signal),
    refetchInterval: (query) => (isRunning(query.state.data?.status) ? IMPORT_POLL_MS : false),
    refetchIntervalInBackground: true,
  });

export function useImport(id: string) {
  return useQuery(importQueryOptions(id));
}
