import { useMutation } from '@tanstack/react-query';
import type { TokenPasswordInput } from '@shared/schemas/auth.schema';
import { api } from '@/lib/api-client';

export function completePasswordReset(input: TokenPasswordInput): Promise<void> {
  return api.post<void>('/api/auth/password-reset/complete', input);
}

export function useCompletePasswordReset() {
  return useMutation({ mutationFn: completePasswordReset });
}
