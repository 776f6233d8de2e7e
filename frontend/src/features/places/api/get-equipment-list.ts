import { infiniteQueryOptions, useInfiniteQuery } from '@tanstack/react-query';
import type { ListResponse } from '@shared/schemas/common.schema';
import type { ArchivedFilter, EquipmentDto } from '@shared/schemas/register.schema';
import { api } from '@/lib/api-client';
import { equipmentKeys, nextPageOf, TREE_PAGE_SIZE } from './place-keys';

export function getEquipmentList(query: { areaId: string; archived: ArchivedFilter; page: number }, signal?: AbortSignal): Promise<ListResponse<EquipmentDto>> {
  return api.get<ListResponse<EquipmentDto>>(
    '/api/equipment',
    { areaId: query.areaId, archived: query.archived, sort: 'assetNumber', page: query.page, pageSize: TREE_PAGE_SIZE },
    signal,
  );
}

export const equipmentListQueryOptions = (areaId: string, archived: ArchivedFilter) =>
  infiniteQueryOptions({
    queryKey: equipmentKeys.list(areaId, archived),
    queryFn: ({ pageParam, signal }) => getEquipmentList({ areaId, archived, page: pageParam }, signal),
    initialPageParam: 1,
    getNextPageParam: nextPageOf,
  });

/** The equipment of one area, a page at a time. */
export function useEquipmentList(areaId: string, archived: ArchivedFilter) {
  return useInfiniteQuery(equipmentListQueryOptions(areaId, archived));
}
