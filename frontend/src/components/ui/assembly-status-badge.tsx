import { ASSEMBLY_STATUS_LABELS, type AssemblyStatus } from '@shared/schemas/assemblies.schema';
import { Badge, type BadgeTone } from './badge';

const TONES: Record<AssemblyStatus, BadgeTone> = {
  built: 'muted',
  in_stock: 'accent',
  installed: 'neutral',
  tagged_out: 'danger',
  removed: 'muted',
  scrapped: 'muted',
};

const isStatus = (value: string): value is AssemblyStatus => value in ASSEMBLY_STATUS_LABELS;

/** Where an assembly is in its life, in words: installed, tagged out, in stock … */
export function AssemblyStatusBadge({ status, className }: { status: AssemblyStatus | string; className?: string }) {
  if (!isStatus(status)) return <Badge className={className}>{status}</Badge>;
  return (
    <Badge tone={TONES[status]} className={className}>
      {ASSEMBLY_STATUS_LABELS[status]}
    </Badge>
  );
}
