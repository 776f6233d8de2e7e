import { SELECTION_CHECK_LABELS, type CheckOutcome, type SelectionCheckCode } from '@shared/checks/types';
import type { EventKind, ProofTestMedium } from '@shared/schemas/assemblies.schema';
import { REMOVAL_REASON_DEFINITIONS, type RemovalReason } from '@shared/services/removal-reasons';
import type { BadgeTone } from '@/components/ui/badge';

export const CHECK_LABELS = SELECTION_CHECK_LABELS;

export const checkLabel = (code: string) => CHECK_LABELS[code as SelectionCheckCode] ?? code;

export const OUTCOME_LABELS: Record<CheckOutcome, string> = { pass: 'Pass', warn: 'Warning', fail: 'Fail' };

export const OUTCOME_TONES: Record<CheckOutcome, BadgeTone> = { pass: 'success', warn: 'accent', fail: 'danger' };

export const EVENT_KIND_LABELS: Record<EventKind, string> = {
  build: 'Built',
  proof_test: 'Proof test',
  install: 'Installed',
  tag_out: 'Tagged out',
  remove: 'Removed',
  return_to_stock: 'Back in stock',
  scrap: 'Scrapped',
  override: 'Checks overridden',
  inspection: 'Inspection',
  note: 'Note',
  void: 'Correction',
};

export const PROOF_TEST_MEDIUM_LABELS: Record<ProofTestMedium, string> = {
  water: 'Water',
  'water-glycol': 'Water-glycol',
  'hydraulic-oil': 'Hydraulic oil',
};

export function removalReasonLabel(code: string | null | undefined): string {
  if (!code) return 'No reason recorded';
  return REMOVAL_REASON_DEFINITIONS.find((r) => r.code === (code as RemovalReason))?.label ?? code;
}

export const LIFE_OUTCOME_LABELS: Record<string, string> = {
  failure: 'counts as a failure in life data',
  suspension: 'counts as a suspension in life data (still serviceable)',
};
