import type { z } from 'zod';
import type { tagOutSchema } from '@shared/schemas/assemblies.schema';
import { type LifecycleAnswer, type LifecycleOptions, useLifecycleMutation } from './lifecycle-mutation';
import { submitOnce } from './submit-once';

/** The body as the form sends it: measurements as `{ value, unit }`, the key added by the submission. */
export type TagOutRequest = Omit<z.input<typeof tagOutSchema>, 'idempotencyKey'>;

export interface TagOutRequestVariables {
  assemblyId: string;
  input: TagOutRequest;
  idempotencyKey: string;
}

/** Tags an installed assembly out of use until it is replaced or removed. */
export function tagOutAssembly({ assemblyId, input, idempotencyKey }: TagOutRequestVariables): Promise<LifecycleAnswer> {
  return submitOnce<LifecycleAnswer>(`/api/assemblies/${encodeURIComponent(assemblyId)}/tag-out`, input, idempotencyKey);
}

export function useTagOutAssembly(options: LifecycleOptions<TagOutRequestVariables> = {}) {
  return useLifecycleMutation(tagOutAssembly, options);
}
