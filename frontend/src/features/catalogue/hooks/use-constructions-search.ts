import { constructionListQuerySchema, type ConstructionListQuery } from '@shared/schemas/register.schema';
import { useListSearch } from './use-list-search';

const KEYS = ['q', 'sizeCode', 'tubeCompound', 'archived', 'sort', 'dir', 'page', 'pageSize'] as const;
const FILTERS = ['q', 'sizeCode', 'tubeCompound', 'archived'] as const satisfies ReadonlyArray<keyof ConstructionListQuery>;

/** The constructions list's search, filters, sort and page, kept in the address. */
export function useConstructionsSearch() {
  return useListSearch<ConstructionListQuery>(constructionListQuerySchema, KEYS, FILTERS);
}
