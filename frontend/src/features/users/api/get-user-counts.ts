import { queryOptions, useQuery } from '@tanstack/react-query';
import type { UserStatus } from '@shared/schemas/users.schema';
import { userKeys } from './user-keys';
import { getUsers } from './get-users';

export type UserCounts = Record<UserStatus, number> & { total: number };

const STATUSES: UserStatus[] = ['active', 'invited', 'expired', 'inactive'];

/** How many users there are in each status, read from the totals of one-row pages. */
export async function getUserCounts(signal?: AbortSignal): Promise<UserCounts> {
  const totals = await Promise.all(
    STATUSES.map((status) =>
      getUsers({ status, page: 1, pageSize: 1, sort: 'name', dir: 'asc' }, signal).then((response) => response.pagination.total),
    ),
  );
  const [active = 0, invited = 0, expired = 0, inactive = 0] = totals;
  return { active, invited, expired, inactive, total: active + invited + expired + inactive };
}

export const userCountsQueryOptions = () =>
  queryOptions({
    queryKey: userKeys.counts(),
    queryFn: ({ signal }) => getUserCounts(signal),
  });

export function useUserCounts() {
  return useQuery(userCountsQueryOptions());
}
