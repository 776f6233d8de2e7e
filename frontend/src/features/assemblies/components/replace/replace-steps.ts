import { isRemovalReason, type RemovalReason } from '@shared/services/removal-reasons';

export const REPLACE_STEPS = ['reason', 'new', 'cautions', 'confirm'] as const;
export type ReplaceStep = (typeof REPLACE_STEPS)[number];

export const STEP_TITLES: Record<ReplaceStep, string> = {
  reason: 'Why did it come out?',
  new: 'Pick the new assembly',
  cautions: 'Before you disconnect',
  confirm: 'Confirm the replacement',
};

export interface ReplaceState {
  step: ReplaceStep;
  reason: RemovalReason | null;
  newAssemblyId: string | null;
}

const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;

/**
 * The flow's state from the address, so the back button, a reload and a detour to build a new
 * assembly all come back to the same step. A step whose earlier answers are missing falls back
 * to the first step that still needs one.
 */
export function parseReplaceState(params: URLSearchParams): ReplaceState {
  const reasonText = params.get('reason');
  const reason = isRemovalReason(reasonText) ? reasonText : null;
  const newText = params.get('new');
  const newAssemblyId = newText && UUID.test(newText) ? newText : null;
  const stepText = params.get('step');
  let step: ReplaceStep = (REPLACE_STEPS as readonly string[]).includes(stepText ?? '') ? (stepText as ReplaceStep) : reason && newAssemblyId ? 'cautions' : reason ? 'new' : 'reason';
  if (!reason) step = 'reason';
  else if (!newAssemblyId && (step === 'cautions' || step === 'confirm')) step = 'new';
  return { step, reason, newAssemblyId };
}

export function replaceStateToParams(state: Partial<ReplaceState>): URLSearchParams {
  const params = new URLSearchParams();
  if (state.step) params.set('step', state.step);
  if (state.reason) params.set('reason', state.reason);
  if (state.newAssemblyId) params.set('new', state.newAssemblyId);
  return params;
}
