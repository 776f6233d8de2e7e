import { infiniteQueryOptions, useInfiniteQuery } from '@tanstack/react-query';
import type { ListResponse } from '@shared/schemas/common.schema';
import type { PositionDto } from '@shared/schemas/register.schema';
import { api } from '@/lib/api-client';
import { equipmentPositionKeys, nextPageOf, TREE_PAGE_SIZE } from './place-keys';

export function getEquipmentPositions(query: { equipmentId: string; page: number }, signal?: AbortSignal): Promise<ListResponse<PositionDto>> {
  return api.get<ListResponse<PositionDto>>('/api/positions', { equipmentId: query.equipmentId, sort: 'code', page: query.page, pageSize: TREE_PAGE_SIZE }, signal);
}

export const equipmentPositionsQueryOptions = (equipmentId: string) =>
  infiniteQueryOptions({
    queryKey: equipmentPositionKeys.list(equipmentId),
    queryFn: ({ pageParam, signal }) => getEquipmentPositions({ equipmentId, page: pageParam }, signal),
    initialPageParam: 1,
    getNextPageParam: nextPageOf,
  });

/** The hose positions on one piece of equipment, a page at a time. */
export function useEquipmentPositions(equipmentId: string) {
  return useInfiniteQuery(equipmentPositionsQueryOptions(equipmentId));
}
