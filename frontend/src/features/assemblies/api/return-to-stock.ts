import type { z } from 'zod';
import type { returnToStockSchema } from '@shared/schemas/assemblies.schema';
import { type LifecycleAnswer, type LifecycleOptions, useLifecycleMutation } from './lifecycle-mutation';
import { submitOnce } from './submit-once';

/** The body as the form sends it: measurements as `{ value, unit }`, the key added by the submission. */
export type ReturnToStockRequest = Omit<z.input<typeof returnToStockSchema>, 'idempotencyKey'>;

export interface ReturnToStockRequestVariables {
  assemblyId: string;
  input: ReturnToStockRequest;
  idempotencyKey: string;
}

/** Puts a removed assembly back into stock: only after an inspection and a proof test passed since the removal. */
export function returnToStock({ assemblyId, input, idempotencyKey }: ReturnToStockRequestVariables): Promise<LifecycleAnswer> {
  return submitOnce<LifecycleAnswer>(`/api/assemblies/${encodeURIComponent(assemblyId)}/return-to-stock`, input, idempotencyKey);
}

export function useReturnToStock(options: LifecycleOptions<ReturnToStockRequestVariables> = {}) {
  return useLifecycleMutation(returnToStock, options);
}
