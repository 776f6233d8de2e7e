import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { UserDto } from '@shared/schemas/users.schema';
import { api } from '@/lib/api-client';
import { userKeys } from './user-keys';

/** Stops the user signing in and ends their sessions; their records stay. */
export function deactivateUser(id: string): Promise<UserDto> {
  return api.post<{ data: UserDto }>(`/api/users/${encodeURIComponent(id)}/deactivate`).then((body) => body.data);
}

export function useDeactivateUser({ onSuccess }: { onSuccess?: (user: UserDto) => void } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: deactivateUser,
    onSuccess: (user) => {
      queryClient.setQueryData(userKeys.detail(user.id), user);
      void queryClient.invalidateQueries({ queryKey: userKeys.lists() });
      void queryClient.invalidateQueries({ queryKey: userKeys.counts() });
      onSuccess?.(user);
    },
  });
}
