import type { FieldValues, UseFormSetError, Path } from 'react-hook-form';
import { useQueryClient } from '@tanstack/react-query';
import { describeError, isApiError } from '@/lib/api-client';
import { applyServerError } from '@/lib/form-errors';
import { Alert } from '@/components/ui/alert';
import { Button } from '@/components/ui/button';
import { assemblyKeys } from '../api/assembly-keys';
import { outcomeUnknown } from '../api/submit-once';
import { submittedEarlier } from './form-values';

export const NO_ANSWER =
  'No answer from the server, even after trying again. Press again when you have signal: this submission is never recorded twice.';
export const SAVED_EARLIER = 'An earlier try of this form reached the server before the connection dropped, and it was saved. Reload to see it.';

/**
 * Puts a refused or lost submission on its form: a field the server named on that field; a lost
 * answer, a conflict or anything else as the form's own message, its code kept as the type.
 */
export function applySubmissionError<T extends FieldValues>(error: unknown, setError: UseFormSetError<T>, fields: readonly Path<T>[]): void {
  if (outcomeUnknown(error)) {
    setError('root.server', { type: 'no_answer', message: NO_ANSWER });
    return;
  }
  if (submittedEarlier(error)) {
    setError('root.server', { type: 'conflict', message: SAVED_EARLIER });
    return;
  }
  if (isApiError(error) && error.status === 409 && !(error.field && (fields as readonly string[]).includes(error.field))) {
    setError('root.server', { type: 'conflict', message: describeError(error) });
    return;
  }
  applyServerError(error, setError, fields);
}

/** The form's own message; after a conflict, a way to load the assembly as it is now. */
export function ServerMessage({ error, assemblyId, onReload }: { error: { type?: string | number; message?: string } | undefined; assemblyId?: string; onReload?: () => void }) {
  const queryClient = useQueryClient();
  if (!error?.message) return null;
  const conflict = error.type === 'conflict';
  return (
    <Alert tone="danger" title={error.type === 'no_answer' ? 'Not saved yet' : conflict ? 'Not done' : undefined}>
      <p>{error.message}</p>
      {conflict && assemblyId ? (
        <Button
          variant="secondary"
          className="mt-2"
          onClick={() => {
            void queryClient.invalidateQueries({ queryKey: assemblyKeys.detail(assemblyId) });
            void queryClient.invalidateQueries({ queryKey: assemblyKeys.lists() });
            onReload?.();
          }}
        >
          Reload the assembly
        </Button>
      ) : null}
    </Alert>
  );
}
