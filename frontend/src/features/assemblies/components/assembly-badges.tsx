import type { CheckOutcome } from '@shared/checks/types';
import type { AssemblyStatus } from '@shared/schemas/assemblies.schema';
import { AssemblyStatusBadge } from '@/components/ui/assembly-status-badge';
import { Badge } from '@/components/ui/badge';
import { OUTCOME_LABELS, OUTCOME_TONES } from './labels';

/** The assembly's status in words, the same badge the register shows. */
export function StatusBadge({ status, className }: { status: AssemblyStatus; className?: string }) {
  return <AssemblyStatusBadge status={status} className={className} />;
}

/** The outcome of the selection checks in words: "Checks: fail". */
export function OutcomeBadge({ outcome, overridden, className }: { outcome: CheckOutcome | null; overridden?: boolean; className?: string }) {
  if (!outcome) return null;
  return (
    <Badge tone={OUTCOME_TONES[outcome]} className={className}>
      Checks: {OUTCOME_LABELS[outcome].toLowerCase()}
      {overridden ? ', override in force' : ''}
    </Badge>
  );
}
