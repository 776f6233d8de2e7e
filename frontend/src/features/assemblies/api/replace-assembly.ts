import type { z } from 'zod';
import type { replaceSchema } from '@shared/schemas/assemblies.schema';
import { type LifecycleAnswer, type LifecycleOptions, useLifecycleMutation } from './lifecycle-mutation';
import { submitOnce } from './submit-once';

export type ReplaceRequest = Omit<z.input<typeof replaceSchema>, 'idempotencyKey'>;

export interface ReplaceRequestVariables {
  /** The assembly taken out. */
  assemblyId: string;
  input: ReplaceRequest;
  idempotencyKey: string;
}

/**
 * Takes the installed assembly out with a reason and puts the new one in at the same position, in
 * one step. The answer is the new assembly, as installed.
 */
export function replaceAssembly({ assemblyId, input, idempotencyKey }: ReplaceRequestVariables): Promise<LifecycleAnswer> {
  return submitOnce<LifecycleAnswer>(`/api/assemblies/${encodeURIComponent(assemblyId)}/replace`, input, idempotencyKey);
}

export function useReplaceAssembly(options: Omit<LifecycleOptions<ReplaceRequestVariables>, 'alsoChanged'> = {}) {
  return useLifecycleMutation(replaceAssembly, { ...options, alsoChanged: (variables) => [variables.assemblyId] });
}
