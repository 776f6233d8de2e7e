import { api, isApiError } from '@/lib/api-client';

/** A fresh key for one form submission: the server does the work once per key. */
export function newSubmissionKey(): string {
  const random =
    typeof crypto !== 'undefined' && typeof crypto.randomUUID === 'function'
      ? crypto.randomUUID()
      : `${Date.now().toString(36)}-${Math.random().toString(36).slice(2)}-${Math.random().toString(36).slice(2)}`;
  return random.replace(/-/g, '');
}

/**
 * Posts a field submission with its key. When the answer is lost on the way back (no network),
 * it asks once more with the same key: the server either does it now or answers with what it
 * stored the first time, so the action is never done twice.
 */
export async function submitOnce<T>(path: string, body: object, idempotencyKey: string): Promise<T> {
  const payload = { ...body, idempotencyKey };
  try {
    return await api.post<T>(path, payload);
  } catch (error) {
    if (isApiError(error) && error.status === 0) return api.post<T>(path, payload);
    throw error;
  }
}

/** True when the outcome is not known: the request may or may not have reached the server. */
export function outcomeUnknown(error: unknown): boolean {
  return isApiError(error) && (error.status === 0 || error.status >= 500);
}
