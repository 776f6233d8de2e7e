import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { userKeys } from './user-keys';

/** E-mails the invitation again, with a fresh link. */
export function resendInvite(id: string): Promise<void> {
  return api.post<unknown>(`/api/users/${encodeURIComponent(id)}/resend-invite`).then(() => undefined);
}

export function useResendInvite({ onSuccess }: { onSuccess?: () => void } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: resendInvite,
    onSuccess: (_data, id) => {
      void queryClient.invalidateQueries({ queryKey: userKeys.detail(id) });
      onSuccess?.();
    },
  });
}
