import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import type { ListResponse } from '@shared/schemas/common.schema';
import type { PositionDto } from '@shared/schemas/register.schema';
import { api } from '@/lib/api-client';
import { lookupKeys } from './lookup-keys';

export interface PositionSearch {
  siteId?: string;
  equipmentId?: string;
  q?: string;
  occupied?: 'yes' | 'no';
  page?: number;
  pageSize?: number;
}

/** Positions to choose from: a site's or a piece of equipment's, optionally only the empty ones. */
export function getPositions(query: PositionSearch, signal?: AbortSignal): Promise<ListResponse<PositionDto>> {
  return api.get<ListResponse<PositionDto>>(
    '/api/positions',
    { siteId: query.siteId, equipmentId: query.equipmentId, q: query.q, occupied: query.occupied, sort: 'code', page: query.page, pageSize: query.pageSize ?? 50 },
    signal,
  );
}

export const positionsQueryOptions = (query: PositionSearch, enabled = true) =>
  queryOptions({
    queryKey: lookupKeys.positions.list({ ...query }),
    queryFn: ({ signal }) => getPositions(query, signal),
    placeholderData: keepPreviousData,
    enabled,
  });

export function usePositions(query: PositionSearch, { enabled = true }: { enabled?: boolean } = {}) {
  return useQuery(positionsQueryOptions(query, enabled));
}
