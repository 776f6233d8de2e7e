import { queryOptions, useQuery } from '@tanstack/react-query';
import type { ListResponse } from '@shared/schemas/common.schema';
import type { AssemblyListItemDto } from '@shared/schemas/assemblies.schema';
import { api } from '@/lib/api-client';

/** The register's filters behind each count, as query strings the register page understands. */
export const COUNT_FILTERS = {
  installed: { status: 'installed,tagged_out' },
  failing: { status: 'installed,tagged_out', checkOutcome: 'fail' },
  warning: { status: 'installed,tagged_out', checkOutcome: 'warn' },
  overdue: { status: 'installed,tagged_out', due: 'overdue', sort: 'nextInspectionDue' },
  dueSoon: { status: 'installed,tagged_out', due: 'within-7-days', sort: 'nextInspectionDue' },
  taggedOut: { status: 'tagged_out' },
} as const satisfies Record<string, Record<string, string>>;

export type RegisterCounts = Record<keyof typeof COUNT_FILTERS, number>;

/** How many assemblies each filter holds, from the totals of one-row pages. */
export async function getRegisterCounts(signal?: AbortSignal): Promise<RegisterCounts> {
  const entries = await Promise.all(
    Object.entries(COUNT_FILTERS).map(async ([name, filter]) => {
      const body = await api.get<ListResponse<AssemblyListItemDto>>('/api/assemblies', { ...filter, page: 1, pageSize: 1 }, signal);
      return [name, body.pagination.total] as const;
    }),
  );
  return Object.fromEntries(entries) as RegisterCounts;
}

export const registerCountsQueryOptions = () =>
  queryOptions({
    queryKey: ['overview', 'register-counts'] as const,
    queryFn: ({ signal }) => getRegisterCounts(signal),
    staleTime: 60_000,
  });

export function useRegisterCounts() {
  return useQuery(registerCountsQueryOptions());
}
