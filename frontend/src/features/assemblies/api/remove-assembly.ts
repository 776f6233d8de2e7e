import type { z } from 'zod';
import type { removeSchema } from '@shared/schemas/assemblies.schema';
import { type LifecycleAnswer, type LifecycleOptions, useLifecycleMutation } from './lifecycle-mutation';
import { submitOnce } from './submit-once';

/** The body as the form sends it: measurements as `{ value, unit }`, the key added by the submission. */
export type RemoveRequest = Omit<z.input<typeof removeSchema>, 'idempotencyKey'>;

export interface RemoveRequestVariables {
  assemblyId: string;
  input: RemoveRequest;
  idempotencyKey: string;
}

/** Takes an assembly out of its position, with the reason that decides how its life counts. */
export function removeAssembly({ assemblyId, input, idempotencyKey }: RemoveRequestVariables): Promise<LifecycleAnswer> {
  return submitOnce<LifecycleAnswer>(`/api/assemblies/${encodeURIComponent(assemblyId)}/remove`, input, idempotencyKey);
}

export function useRemoveAssembly(options: LifecycleOptions<RemoveRequestVariables> = {}) {
  return useLifecycleMutation(removeAssembly, options);
}
