import type { FieldValues, Path, UseFormSetError } from 'react-hook-form';
import { describeError, isApiError } from '@/lib/api-client';

/**
 * Puts a failed request's message on the form: on the field the server named when the form shows
 * it (a quantity's `maxTemp.value` lands on `maxTemp`), otherwise as the form's own message.
 */
export function applyPositionServerError<T extends FieldValues>(error: unknown, setError: UseFormSetError<T>, fields: readonly string[]): void {
  const field = isApiError(error) && error.field ? error.field.split('.')[0] : undefined;
  if (isApiError(error) && field && fields.includes(field)) {
    setError(field as Path<T>, { type: 'server', message: error.message }, { shouldFocus: true });
    return;
  }
  setError('root.server', { type: 'server', message: describeError(error) });
}
