import type { CompatibilityRating } from '@shared/checks/compatibility';
import { COMMON_PRACTICE, FROM_MEMORY } from '@shared/checks/compatibility';
import type { ElectricalProperty, Reinforcement } from '@shared/checks/types';
import type { ConductivityRequirement, PeriodicTestKind } from '@shared/services/service-catalogue';

export const REINFORCEMENT_LABELS: Record<Reinforcement, string> = {
  textile: 'Textile plies',
  'textile-helical-wire': 'Textile with helical wire',
  'steel-wire-braid': 'Steel wire braid',
  'steel-wire-spiral': 'Steel wire spiral',
  none: 'None',
};

export const ELECTRICAL_LABELS: Record<ElectricalProperty, string> = {
  none: 'Not conductive',
  conductive: 'Conductive',
  'static-dissipative': 'Static-dissipative',
};

export const CONDUCTIVITY_LABELS: Record<ConductivityRequirement, string> = {
  none: 'Not required',
  conductive: 'Conductive hose required',
  'static-dissipative': 'Static-dissipative hose required',
};

export const PERIODIC_TEST_LABELS: Record<PeriodicTestKind, string> = {
  pressure: 'Pressure test',
  continuity: 'Electrical continuity test',
};

export const RATING_WORDS: Record<CompatibilityRating, string> = {
  suitable: 'Suitable',
  limited: 'Limited',
  unsuitable: 'Not suitable',
};

export const labelOf = <K extends string>(labels: Record<K, string>, value: string | null | undefined): string | null =>
  value == null ? null : ((labels as Record<string, string>)[value] ?? value);

/** How sure the table is of a cell: a published text, common practice, or memory that needs confirming. */
export type SourceKind = 'citation' | 'common-practice' | 'from-memory';

export function sourceKind(source: string): SourceKind {
  const s = source.trim().toLowerCase();
  if (s === FROM_MEMORY) return 'from-memory';
  if (s === COMMON_PRACTICE || s.startsWith(`${COMMON_PRACTICE}:`) || s.startsWith(`${COMMON_PRACTICE};`)) return 'common-practice';
  return 'citation';
}

/** "common practice: no static build-up…" → "Common practice: no static build-up…". */
export const sentenceCase = (text: string) => (text ? text[0]!.toUpperCase() + text.slice(1) : text);

/** "1 month", "18 months". */
export const months = (n: number) => `${n} ${n === 1 ? 'month' : 'months'}`;
/** "1 day", "90 days". */
export const days = (n: number) => `${n} ${n === 1 ? 'day' : 'days'}`;
