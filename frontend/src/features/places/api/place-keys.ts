import type { ArchivedFilter } from '@shared/schemas/register.schema';

/** A site's settings (the list of sites is the sites feature's). */
export const siteDetailKeys = {
  all: ['site-details'] as const,
  detail: (id: string) => [...siteDetailKeys.all, id] as const,
};

export const areaKeys = {
  all: ['areas'] as const,
  lists: () => [...areaKeys.all, 'list'] as const,
  list: (siteId: string, archived: ArchivedFilter) => [...areaKeys.lists(), { siteId, archived }] as const,
};

export const equipmentKeys = {
  all: ['equipment'] as const,
  lists: () => [...equipmentKeys.all, 'list'] as const,
  list: (areaId: string, archived: ArchivedFilter) => [...equipmentKeys.lists(), { areaId, archived }] as const,
};

/** Positions as the sites tree lists them under a piece of equipment. */
export const equipmentPositionKeys = {
  all: ['equipment-positions'] as const,
  list: (equipmentId: string) => [...equipmentPositionKeys.all, equipmentId] as const,
};

/** Rows per request of a branch of the tree; more load when asked for. */
export const TREE_PAGE_SIZE = 100;

/** The next page of a branch, or undefined when every row is loaded. */
export function nextPageOf(last: { pagination: { page: number; pageSize: number; total: number } }): number | undefined {
  const { page, pageSize, total } = last.pagination;
  return page * pageSize < total ? page + 1 : undefined;
}
