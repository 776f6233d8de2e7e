import { queryOptions, useQuery } from '@tanstack/react-query';
import type { EquipmentDto } from '@shared/schemas/register.schema';
import { api } from '@/lib/api-client';
import { lookupKeys } from './lookup-keys';

/** One piece of equipment: whether it has an hour meter, and its latest reading. */
export function getEquipment(id: string, signal?: AbortSignal): Promise<EquipmentDto> {
  return api.get<{ data: EquipmentDto }>(`/api/equipment/${encodeURIComponent(id)}`, undefined, signal).then((body) => body.data);
}

export const equipmentQueryOptions = (id: string | null | undefined) =>
  queryOptions({
    queryKey: lookupKeys.equipment.detail(id ?? ''),
    queryFn: ({ signal }) => getEquipment(id!, signal),
    enabled: Boolean(id),
  });

export function useEquipment(id: string | null | undefined) {
  return useQuery(equipmentQueryOptions(id));
}
