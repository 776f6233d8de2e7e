import { queryOptions, useQuery } from '@tanstack/react-query';
import type { UserDto } from '@shared/schemas/users.schema';
import { api } from '@/lib/api-client';
import { userKeys } from './user-keys';

export function getUser(id: string, signal?: AbortSignal): Promise<UserDto> {
  return api.get<{ data: UserDto }>(`/api/users/${encodeURIComponent(id)}`, undefined, signal).then((body) => body.data);
}

export const userQueryOptions = (id: string) =>
  queryOptions({
    queryKey: userKeys.detail(id),
    queryFn: ({ signal }) => getUser(id, signal),
  });

export function useUser(id: string) {
  return useQuery(userQueryOptions(id));
}
