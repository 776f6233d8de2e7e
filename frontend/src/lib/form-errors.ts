import type { FieldValues, Path, UseFormSetError } from 'react-hook-form';
import { describeError, isApiError } from './api-client';

/**
 * Puts a failed request's message on the form: on the named field when the server named one the
 * form shows, otherwise as the form's own message (`errors.root.server`).
 */
export function applyServerError<T extends FieldValues>(
  error: unknown,
  setError: UseFormSetError<T>,
  fields: readonly Path<T>[],
): void {
  if (isApiError(error) && error.field && (fields as readonly string[]).includes(error.field)) {
    setError(error.field as Path<T>, { type: 'server', message: error.message }, { shouldFocus: true });
    return;
  }
  setError('root.server', { type: 'server', message: describeError(error) });
}
