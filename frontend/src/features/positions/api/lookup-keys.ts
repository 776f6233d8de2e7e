import type { AreaListQuery, EquipmentListQuery } from '@shared/schemas/register.schema';

/**
 * Keys of the lists the position screens and the register's pickers read. Each sits under its
 * resource's root so a change anywhere refreshes it, with a segment of its own so it never shares
 * an entry with another screen's shape of the same data.
 */
export const referenceKeys = {
  all: ['reference'] as const,
  lookup: () => [...referenceKeys.all, 'places-lookup'] as const,
};

export const areaKeys = {
  all: ['areas'] as const,
  list: (query: Partial<AreaListQuery>) => [...areaKeys.all, 'places-lookup', query] as const,
};

export const equipmentKeys = {
  all: ['equipment'] as const,
  list: (query: Partial<EquipmentListQuery>) => [...equipmentKeys.all, 'places-lookup', 'list', query] as const,
  detail: (id: string) => [...equipmentKeys.all, 'places-lookup', 'detail', id] as const,
};

export const siteServiceKeys = {
  all: ['site-services'] as const,
  list: (siteId: string) => [...siteServiceKeys.all, 'places-lookup', siteId] as const,
};
