import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { UserDto, UserInviteInput } from '@shared/schemas/users.schema';
import { api } from '@/lib/api-client';
import { userKeys } from './user-keys';

/** Creates the user and e-mails them an invitation to choose a password. */
export function inviteUser(input: UserInviteInput): Promise<UserDto> {
  return api.post<{ data: UserDto }>('/api/users', input).then((body) => body.data);
}

export function useInviteUser({ onSuccess }: { onSuccess?: (user: UserDto) => void } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: inviteUser,
    onSuccess: (user) => {
      queryClient.setQueryData(userKeys.detail(user.id), user);
      void queryClient.invalidateQueries({ queryKey: userKeys.lists() });
      void queryClient.invalidateQueries({ queryKey: userKeys.counts() });
      onSuccess?.(user);
    },
  });
}
