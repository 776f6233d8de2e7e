import type { AssemblyDto, OverrideDto } from '@shared/schemas/assemblies.schema';
import { formatDate, formatDateTime } from '@/lib/format';
import { Badge } from '@/components/ui/badge';
import { EmptyState } from '@/components/ui/empty-state';
import { OutcomeBadge } from './assembly-badges';
import { CheckResultList, outcomeCounts } from './check-results';
import { todayIso } from './form-values';
import { checkLabel } from './labels';

/** The selection checks of the assembly at its position: each outcome, its sentence and sources. */
export function AssemblyChecks({ assembly }: { assembly: AssemblyDto }) {
  const results = assembly.checkResults;
  if (!assembly.position || !results) {
    return (
      <EmptyState title="Not checked at a position">
        The selection checks compare an assembly with the position it is installed at. They run when it is installed, and again whenever
        the position, construction or service changes.
      </EmptyState>
    );
  }
  const overridden = new Set(assembly.overrides.map((o) => o.checkCode));
  return (
    <div className="flex flex-col gap-4">
      <p className="flex flex-wrap items-center gap-2 text-ink-800">
        <OutcomeBadge outcome={assembly.checkOutcome} overridden={assembly.overridden} />
        <span>{outcomeCounts(results)}</span>
      </p>
      <CheckResultList results={results} overridden={overridden} wide />
    </div>
  );
}

/** Failed checks a competent person accepted: which, why, who, and when they are to be looked at again. */
export function OverridesPanel({ overrides }: { overrides: OverrideDto[] }) {
  const today = todayIso();
  // One override of several checks is stored as one row per check with the same reason.
  const groups = new Map<string, OverrideDto[]>();
  for (const o of overrides) {
    const key = `${o.reason}|${o.reviewOn}|${o.actorName ?? ''}|${o.createdAt.slice(0, 16)}`;
    groups.set(key, [...(groups.get(key) ?? []), o]);
  }
  return (
    <ul className="flex flex-col gap-3" aria-label="Overrides in force">
      {[...groups.values()].map((group) => {
        const first = group[0]!;
        const reviewPassed = first.reviewOn < today;
        return (
          <li key={first.id} className="flex flex-col gap-1.5 rounded-[var(--radius-control)] border-2 border-copper-700 bg-copper-50 px-4 py-3">
            <p className="flex flex-wrap items-center gap-2">
              <Badge tone="inverse">Override</Badge>
              <span className="font-bold text-ink-950">{group.map((o) => checkLabel(o.checkCode)).join(', ')}</span>
            </p>
            <p className="text-ink-950">“{first.reason}”</p>
            <p className="text-sm text-ink-700">
              Accepted by {first.actorName ?? 'a former user'} on {formatDateTime(first.createdAt)} ·{' '}
              <span className={reviewPassed ? 'font-bold text-danger-800' : 'font-semibold text-ink-900'}>
                review {reviewPassed ? 'was due' : 'by'} {formatDate(first.reviewOn)}
              </span>
            </p>
          </li>
        );
      })}
    </ul>
  );
}
