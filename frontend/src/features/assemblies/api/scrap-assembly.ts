import type { z } from 'zod';
import type { scrapSchema } from '@shared/schemas/assemblies.schema';
import { type LifecycleAnswer, type LifecycleOptions, useLifecycleMutation } from './lifecycle-mutation';
import { submitOnce } from './submit-once';

/** The body as the form sends it: measurements as `{ value, unit }`, the key added by the submission. */
export type ScrapRequest = Omit<z.input<typeof scrapSchema>, 'idempotencyKey'>;

export interface ScrapRequestVariables {
  assemblyId: string;
  input: ScrapRequest;
  idempotencyKey: string;
}

/** Scraps an assembly for good; its records stay. */
export function scrapAssembly({ assemblyId, input, idempotencyKey }: ScrapRequestVariables): Promise<LifecycleAnswer> {
  return submitOnce<LifecycleAnswer>(`/api/assemblies/${encodeURIComponent(assemblyId)}/scrap`, input, idempotencyKey);
}

export function useScrapAssembly(options: LifecycleOptions<ScrapRequestVariables> = {}) {
  return useLifecycleMutation(scrapAssembly, options);
}
