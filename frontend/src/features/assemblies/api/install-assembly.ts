import type { z } from 'zod';
import type { installSchema } from '@shared/schemas/assemblies.schema';
import { type LifecycleAnswer, type LifecycleOptions, useLifecycleMutation } from './lifecycle-mutation';
import { submitOnce } from './submit-once';

/** The body as the form sends it: measurements as `{ value, unit }`, the key added by the submission. */
export type InstallRequest = Omit<z.input<typeof installSchema>, 'idempotencyKey'>;

export interface InstallRequestVariables {
  assemblyId: string;
  input: InstallRequest;
  idempotencyKey: string;
}

/** Installs an assembly from stock at a position, after the selection checks (and any override of them). */
export function installAssembly({ assemblyId, input, idempotencyKey }: InstallRequestVariables): Promise<LifecycleAnswer> {
  return submitOnce<LifecycleAnswer>(`/api/assemblies/${encodeURIComponent(assemblyId)}/install`, input, idempotencyKey);
}

export function useInstallAssembly(options: LifecycleOptions<InstallRequestVariables> = {}) {
  return useLifecycleMutation(installAssembly, options);
}
