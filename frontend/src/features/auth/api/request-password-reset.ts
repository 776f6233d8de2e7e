import { useMutation } from '@tanstack/react-query';
import type { ResetRequestInput } from '@shared/schemas/auth.schema';
import { api } from '@/lib/api-client';

/** The server answers the same whether or not the account exists. */
export function requestPasswordReset(input: ResetRequestInput): Promise<{ message: string }> {
  return api.post<{ data: { message: string } }>('/api/auth/password-reset', input).then((body) => body.data);
}

export function useRequestPasswordReset() {
  return useMutation({ mutationFn: requestPasswordReset });
}
