import { queryOptions, useQuery } from '@tanstack/react-query';
import type { ImportJobSummaryDto } from '@shared/schemas/csv.schema';
import { api } from '@/lib/api-client';
import { importKeys } from './import-keys';

/** The signed-in user's recent imports, newest first. */
export function getImports(signal?: AbortSignal): Promise<ImportJobSummaryDto[]> {
  return api.get<{ data: ImportJobSummaryDto[] }>('/api/imports', undefined, signal).then((body) => body.data);
}

export const importsQueryOptions = () =>
  queryOptions({
    queryKey: importKeys.lists(),
    queryFn: ({ signal }) => getImports(signal),
  });

export function useImports() {
  return useQuery(importsQueryOptions());
}
