import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { MeDto, SignInInput } from '@shared/schemas/auth.schema';
import { api } from '@/lib/api-client';
import { meKeys } from '@/lib/query-keys';

export function signIn(input: SignInInput): Promise<MeDto> {
  return api.post<{ data: MeDto }>('/api/auth/sign-in', input).then((body) => body.data);
}

export function useSignIn({ onSuccess }: { onSuccess?: (me: MeDto) => void } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: signIn,
    onSuccess: (me) => {
      // Whatever an earlier user left in the cache is not this user's to see.
      queryClient.removeQueries({ predicate: (query) => query.queryKey[0] !== 'meta' });
      queryClient.setQueryData(meKeys.all, me);
      onSuccess?.(me);
    },
  });
}
