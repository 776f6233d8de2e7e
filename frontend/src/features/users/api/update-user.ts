import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { UserDto, UserUpdateInput } from '@shared/schemas/users.schema';
import { api } from '@/lib/api-client';
import { userKeys } from './user-keys';

export function updateUser({ id, input }: { id: string; input: UserUpdateInput }): Promise<UserDto> {
  return api.patch<{ data: UserDto }>(`/api/users/${encodeURIComponent(id)}`, input).then((body) => body.data);
}

export function useUpdateUser({ onSuccess }: { onSuccess?: (user: UserDto) => void } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updateUser,
    onSuccess: (user) => {
      queryClient.setQueryData(userKeys.detail(user.id), user);
      void queryClient.invalidateQueries({ queryKey: userKeys.lists() });
      onSuccess?.(user);
    },
  });
}
