import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import type { ListResponse } from '@shared/schemas/common.schema';
import type { UserDto, UserListQuery } from '@shared/schemas/users.schema';
import { api } from '@/lib/api-client';
import { userKeys } from './user-keys';

/** One page of users, searched, filtered and sorted by the server. */
export function getUsers(query: UserListQuery, signal?: AbortSignal): Promise<ListResponse<UserDto>> {
  return api.get<ListResponse<UserDto>>(
    '/api/users',
    { q: query.q, role: query.role, status: query.status, sort: query.sort, dir: query.dir, page: query.page, pageSize: query.pageSize },
    signal,
  );
}

export const usersQueryOptions = (query: UserListQuery) =>
  queryOptions({
    queryKey: userKeys.list(query),
    queryFn: ({ signal }) => getUsers(query, signal),
    // The rows of the last page stay on screen while the next sort or filter loads.
    placeholderData: keepPreviousData,
  });

export function useUsers(query: UserListQuery) {
  return useQuery(usersQueryOptions(query));
}
