import { fittingTypeListQuerySchema, type FittingTypeListQuery } from '@shared/schemas/register.schema';
import { useListSearch } from './use-list-search';

const KEYS = ['q', 'style', 'archived', 'sort', 'dir', 'page', 'pageSize'] as const;
const FILTERS = ['q', 'style', 'archived'] as const satisfies ReadonlyArray<keyof FittingTypeListQuery>;

/** The fitting types list's search, filters, sort and page, kept in the address. */
export function useFittingTypesSearch() {
  return useListSearch<FittingTypeListQuery>(fittingTypeListQuerySchema, KEYS, FILTERS);
}
