import { queryOptions, useQuery } from '@tanstack/react-query';
import type { ListResponse } from '@shared/schemas/common.schema';
import type { EquipmentDto } from '@shared/schemas/register.schema';
import { api } from '@/lib/api-client';
import { PICKER_PAGE_SIZE } from './get-areas';
import { equipmentKeys } from './lookup-keys';

/** The equipment of a site or area, by asset number, for a picker. */
export function getEquipmentList(query: { siteId?: string; areaId?: string }, signal?: AbortSignal): Promise<ListResponse<EquipmentDto>> {
  return api.get<ListResponse<EquipmentDto>>('/api/equipment', { siteId: query.siteId, areaId: query.areaId, sort: 'assetNumber', pageSize: PICKER_PAGE_SIZE }, signal);
}

export const equipmentListQueryOptions = (query: { siteId?: string; areaId?: string }) =>
  queryOptions({
    queryKey: equipmentKeys.list({ siteId: query.siteId, areaId: query.areaId }),
    queryFn: ({ signal }) => getEquipmentList(query, signal),
    staleTime: 5 * 60_000,
  });

export function useEquipmentList(query: { siteId?: string; areaId?: string }, { enabled = true }: { enabled?: boolean } = {}) {
  return useQuery({ ...equipmentListQueryOptions(query), enabled });
}

export function getEquipment(id: string, signal?: AbortSignal): Promise<EquipmentDto> {
  return api.get<{ data: EquipmentDto }>(`/api/equipment/${encodeURIComponent(id)}`, undefined, signal).then((body) => body.data);
}

export const equipmentQueryOptions = (id: string) =>
  queryOptions({
    queryKey: equipmentKeys.detail(id),
    queryFn: ({ signal }) => getEquipment(id, signal),
    enabled: id !== '',
  });

export function useEquipment(id: string) {
  return useQuery(equipmentQueryOptions(id));
}
