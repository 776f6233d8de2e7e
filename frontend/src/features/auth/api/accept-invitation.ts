import { useMutation } from '@tanstack/react-query';
import type { TokenPasswordInput } from '@shared/schemas/auth.schema';
import { api } from '@/lib/api-client';

export function acceptInvitation(input: TokenPasswordInput): Promise<void> {
  return api.post<void>('/api/auth/invitations/accept', input);
}

export function useAcceptInvitation() {
  return useMutation({ mutationFn: acceptInvitation });
}
