import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import type { RegisterFilters } from '../hooks/use-register-search';
import { getRegister } from './get-register';
import { registerKeys } from './register-keys';

/** Of what the filters hold: how many fail their checks and how many are overdue for inspection. */
export interface RegisterCounts {
  fail: number;
  overdue: number;
}

const totalOf = (filters: RegisterFilters, signal?: AbortSignal) =>
  getRegister({ ...filters, sort: 'number', dir: 'asc', page: 1, pageSize: 1 }, signal).then((response) => response.pagination.total);

/** Read from the totals of one-row pages of the same filters. */
export async function getRegisterCounts(filters: RegisterFilters, signal?: AbortSignal): Promise<RegisterCounts> {
  // A filter on another outcome holds no fails; any "due" filter already holds every overdue one.
  const fail = filters.checkOutcome && filters.checkOutcome !== 'fail' ? Promise.resolve(0) : totalOf({ ...filters, checkOutcome: 'fail' }, signal);
  const overdue = totalOf({ ...filters, due: 'overdue' }, signal);
  const [failCount, overdueCount] = await Promise.all([fail, overdue]);
  return { fail: failCount, overdue: overdueCount };
}

export const registerCountsQueryOptions = (filters: RegisterFilters) =>
  queryOptions({
    queryKey: registerKeys.counts(filters),
    queryFn: ({ signal }) => getRegisterCounts(filters, signal),
    placeholderData: keepPreviousData,
  });

export function useRegisterCounts(filters: RegisterFilters) {
  return useQuery(registerCountsQueryOptions(filters));
}
