import type { z } from 'zod';
import type { assemblyBuildSchema } from '@shared/schemas/assemblies.schema';
import { type LifecycleAnswer, type LifecycleOptions, useLifecycleMutation } from './lifecycle-mutation';
import { submitOnce } from './submit-once';

export type BuildRequest = Omit<z.input<typeof assemblyBuildSchema>, 'idempotencyKey'>;

export interface BuildRequestVariables {
  input: BuildRequest;
  idempotencyKey: string;
}

/** Records a newly built assembly and gives it its tag code; it waits for a proof test before stock. */
export function buildAssembly({ input, idempotencyKey }: BuildRequestVariables): Promise<LifecycleAnswer> {
  return submitOnce<LifecycleAnswer>('/api/assemblies', input, idempotencyKey);
}

export function useBuildAssembly(options: LifecycleOptions<BuildRequestVariables> = {}) {
  return useLifecycleMutation(buildAssembly, options);
}
