import type { z } from 'zod';
import type { proofTestSchema } from '@shared/schemas/assemblies.schema';
import { type LifecycleAnswer, type LifecycleOptions, useLifecycleMutation } from './lifecycle-mutation';
import { submitOnce } from './submit-once';

/** The body as the form sends it: measurements as `{ value, unit }`, the key added by the submission. */
export type ProofTestRequest = Omit<z.input<typeof proofTestSchema>, 'idempotencyKey'>;

export interface ProofTestRequestVariables {
  assemblyId: string;
  input: ProofTestRequest;
  idempotencyKey: string;
}

/** Records a hydrostatic proof test; a pass at the required pressure puts a newly built assembly into stock. */
export function recordProofTest({ assemblyId, input, idempotencyKey }: ProofTestRequestVariables): Promise<LifecycleAnswer> {
  return submitOnce<LifecycleAnswer>(`/api/assemblies/${encodeURIComponent(assemblyId)}/proof-tests`, input, idempotencyKey);
}

export function useRecordProofTest(options: LifecycleOptions<ProofTestRequestVariables> = {}) {
  return useLifecycleMutation(recordProofTest, options);
}
