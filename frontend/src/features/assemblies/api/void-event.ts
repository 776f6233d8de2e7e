import type { z } from 'zod';
import type { voidEventSchema } from '@shared/schemas/assemblies.schema';
import { type LifecycleAnswer, type LifecycleOptions, useLifecycleMutation } from './lifecycle-mutation';
import { submitOnce } from './submit-once';

export type VoidRequest = Omit<z.input<typeof voidEventSchema>, 'idempotencyKey'>;

export interface VoidRequestVariables {
  eventId: string;
  input: VoidRequest;
  idempotencyKey: string;
}

/** Voids a proof test, inspection or note with a reason. The event stays in the history, struck through. */
export function voidEvent({ eventId, input, idempotencyKey }: VoidRequestVariables): Promise<LifecycleAnswer> {
  return submitOnce<LifecycleAnswer>(`/api/events/${encodeURIComponent(eventId)}/void`, input, idempotencyKey);
}

export function useVoidEvent(options: LifecycleOptions<VoidRequestVariables> = {}) {
  return useLifecycleMutation(voidEvent, options);
}
