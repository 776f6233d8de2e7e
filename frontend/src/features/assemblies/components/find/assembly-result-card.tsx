import { Link } from 'react-router-dom';
import type { AssemblyListItemDto } from '@shared/schemas/assemblies.schema';
import { formatTagCode } from '@shared/tags/tag-code';
import { paths } from '@/config/paths';
import { OutcomeBadge, StatusBadge } from '../assembly-badges';

/** One assembly found, as a large link to its page. */
export function AssemblyResultCard({ assembly }: { assembly: AssemblyListItemDto }) {
  return (
    <Link
      to={paths.assemblies.detail.getHref(assembly.id)}
      className="flex min-h-20 flex-col gap-1 rounded-[var(--radius-card)] border-2 border-ink-300 bg-white px-4 py-3 shadow-sm hover:border-copper-700 hover:bg-copper-50"
    >
      <span className="flex flex-wrap items-center justify-between gap-2">
        <span className="font-mono text-2xl font-bold tracking-wider text-ink-950">{formatTagCode(assembly.number)}</span>
        <StatusBadge status={assembly.status} />
      </span>
      <span className="text-ink-900">
        <span className="font-mono font-semibold">{assembly.construction.code}</span> {assembly.construction.name}
      </span>
      <span className="text-ink-700">
        {assembly.position ? (
          <>
            <span className="font-mono font-semibold">{assembly.position.code}</span> {assembly.position.name}, {assembly.position.equipmentName} · {assembly.siteName}
          </>
        ) : (
          `Not installed · ${assembly.siteName}`
        )}
      </span>
      {assembly.checkOutcome ? (
        <span>
          <OutcomeBadge outcome={assembly.checkOutcome} overridden={assembly.overridden} />
        </span>
      ) : null}
      <span className="sr-only">Open</span>
    </Link>
  );
}
