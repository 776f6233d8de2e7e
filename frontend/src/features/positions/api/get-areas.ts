import { queryOptions, useQuery } from '@tanstack/react-query';
import type { ListResponse } from '@shared/schemas/common.schema';
import type { AreaDto } from '@shared/schemas/register.schema';
import { api } from '@/lib/api-client';
import { areaKeys } from './lookup-keys';

/** The most a picker lists at once; the server allows 200 a page. */
export const PICKER_PAGE_SIZE = 200;

/** The areas of one site (or of all the user's sites), by code, for a picker. */
export function getAreas(siteId: string | undefined, signal?: AbortSignal): Promise<ListResponse<AreaDto>> {
  return api.get<ListResponse<AreaDto>>('/api/areas', { siteId, sort: 'code', pageSize: PICKER_PAGE_SIZE }, signal);
}

export const areasQueryOptions = (siteId: string | undefined) =>
  queryOptions({
    queryKey: areaKeys.list({ siteId }),
    queryFn: ({ signal }) => getAreas(siteId, signal),
    staleTime: 5 * 60_000,
  });

export function useAreas(siteId: string | undefined, { enabled = true }: { enabled?: boolean } = {}) {
  return useQuery({ ...areasQueryOptions(siteId), enabled });
}
