import type { z } from 'zod';
import type { overrideCreateSchema } from '@shared/schemas/assemblies.schema';
import { type LifecycleAnswer, type LifecycleOptions, useLifecycleMutation } from './lifecycle-mutation';
import { submitOnce } from './submit-once';

/** The body as the form sends it: measurements as `{ value, unit }`, the key added by the submission. */
export type OverrideRequest = Omit<z.input<typeof overrideCreateSchema>, 'idempotencyKey'>;

export interface OverrideRequestVariables {
  assemblyId: string;
  input: OverrideRequest;
  idempotencyKey: string;
}

/** Accepts failed selection checks of an installed assembly, with a reason and a date to review them. */
export function overrideChecks({ assemblyId, input, idempotencyKey }: OverrideRequestVariables): Promise<LifecycleAnswer> {
  return submitOnce<LifecycleAnswer>(`/api/assemblies/${encodeURIComponent(assemblyId)}/overrides`, input, idempotencyKey);
}

export function useOverrideChecks(options: LifecycleOptions<OverrideRequestVariables> = {}) {
  return useLifecycleMutation(overrideChecks, options);
}
