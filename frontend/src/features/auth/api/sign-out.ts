import { useMutation } from '@tanstack/react-query';
import { api } from '@/lib/api-client';

export function signOut(): Promise<void> {
  return api.post<void>('/api/auth/sign-out');
}

/**
 * Ends this session. `onSuccess` should load the sign-in page afresh, which also drops
 * everything this user had in memory (plant phones and tablets are often shared).
 */
export function useSignOut({ onSuccess }: { onSuccess?: () => void } = {}) {
  return useMutation({ mutationFn: signOut, onSuccess: () => onSuccess?.() });
}
