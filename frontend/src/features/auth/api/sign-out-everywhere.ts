import { useMutation } from '@tanstack/react-query';
import { api } from '@/lib/api-client';

export function signOutEverywhere(): Promise<void> {
  return api.post<void>('/api/auth/sign-out-everywhere');
}

/** Ends every session of the user, on every device, this one included; `onSuccess` as for `useSignOut`. */
export function useSignOutEverywhere({ onSuccess }: { onSuccess?: () => void } = {}) {
  return useMutation({ mutationFn: signOutEverywhere, onSuccess: () => onSuccess?.() });
}
