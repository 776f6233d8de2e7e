import { queryOptions, useQuery } from '@tanstack/react-query';
import type { ListResponse } from '@shared/schemas/common.schema';
import type { EquipmentDto } from '@shared/schemas/register.schema';
import { api } from '@/lib/api-client';
import { lookupKeys } from './lookup-keys';

/** The equipment of one site, by asset number, for choosing where a hose is. */
export function getEquipmentList(siteId: string, signal?: AbortSignal): Promise<ListResponse<EquipmentDto>> {
  return api.get<ListResponse<EquipmentDto>>('/api/equipment', { siteId, sort: 'assetNumber', pageSize: 200 }, signal);
}

export const equipmentListQueryOptions = (siteId: string | undefined) =>
  queryOptions({
    queryKey: lookupKeys.equipment.list({ siteId }),
    queryFn: ({ signal }) => getEquipmentList(siteId!, signal),
    enabled: Boolean(siteId),
    staleTime: 5 * 60_000,
  });

export function useEquipmentList(siteId: string | undefined) {
  return useQuery(equipmentListQueryOptions(siteId));
}
