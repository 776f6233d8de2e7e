import { SELECTION_CHECK_LABELS, type SelectionCheckCode } from '@shared/checks/types';
import { Link } from 'react-router-dom';
import type { CheckOutcome, CheckResult } from '@shared/checks/types';
import type { PositionDto } from '@shared/schemas/register.schema';
import { formatTagCode } from '@shared/tags/tag-code';
import { paths } from '@/config/paths';
import { formatDate, formatDay } from '@/lib/format';
import { Alert } from '@/components/ui/alert';
import { AssemblyStatusBadge } from '@/components/ui/assembly-status-badge';
import { ButtonLink } from '@/components/ui/button';
import { CheckOutcomeBadge, CHECK_OUTCOME_LABELS } from '@/components/ui/check-outcome-badge';
import { EmptyState } from '@/components/ui/empty-state';
import { ErrorState } from '@/components/ui/error-state';
import { SkeletonBlock } from '@/components/ui/skeleton';
import { Spinner } from '@/components/ui/spinner';
import { usePositionAssembly } from '../api/get-position-assembly';

const ORDER: Record<CheckOutcome, number> = { fail: 0, warn: 1, pass: 2 };

/** Today's calendar date where the reader is, as `2026-12-01`. */
function todayIso(now = new Date()): string {
  const pad = (n: number) => String(n).padStart(2, '0');
  return `${now.getFullYear()}-${pad(now.getMonth() + 1)}-${pad(now.getDate())}`;
}

interface CurrentAssemblyProps {
  position: PositionDto;
  /** When the design conditions were last saved here: the checks shown are then said to be recomputed. */
  recomputedSince?: number;
}

/** The assembly in the position now, with its selection checks against these design conditions. */
export function CurrentAssembly({ position, recomputedSince }: CurrentAssemblyProps) {
  const current = position.currentAssembly;
  if (!current) {
    const spares = paths.register.getHref(new URLSearchParams({ siteId: position.siteId, sizeCode: position.sizeCode, status: 'in_stock' }));
    return (
      <EmptyState title="No assembly in this position" action={position.archivedAt ? undefined : <ButtonLink to={spares}>Find a spare of this size in stock</ButtonLink>}>
        {position.archivedAt ? 'The position is archived and empty.' : 'The position is empty. Install an assembly that passes its checks for these design conditions.'}
      </EmptyState>
    );
  }
  return <InstalledAssembly id={current.id} number={current.number} status={current.status} outcome={current.checkOutcome} recomputedSince={recomputedSince} />;
}

function InstalledAssembly({ id, number, status, outcome, recomputedSince }: { id: string; number: string; status: string; outcome: CheckOutcome | null; recomputedSince?: number }) {
  const assembly = usePositionAssembly(id);
  const data = assembly.data;
  const recomputing = recomputedSince !== undefined && assembly.isFetching;
  const recomputed = recomputedSince !== undefined && !assembly.isFetching && data !== undefined && assembly.dataUpdatedAt >= recomputedSince;

  return (
    <div className="flex flex-col gap-4">
      <div className="flex flex-wrap items-center gap-x-4 gap-y-2">
        <Link
          to={paths.assemblies.detail.getHref(id)}
          className="inline-flex min-h-11 items-center font-mono text-2xl font-bold tracking-wide text-copper-700 underline decoration-2 underline-offset-4 hover:text-copper-800"
        >
          {formatTagCode(number)}
        </Link>
        <AssemblyStatusBadge status={data?.status ?? status} className="text-base" />
        <CheckOutcomeBadge outcome={data ? data.checkOutcome : outcome} overridden={data ? data.overrides.length > 0 : false} size="lg" />
      </div>
      {recomputing ? <Spinner label="Recomputing the checks against the new design conditions…" className="text-ink-700" /> : null}
      {recomputed ? (
        <Alert tone="success" title="Checks recomputed">
          The assembly's checks were run again against the new design conditions. Now: {data.checkOutcome ? CHECK_OUTCOME_LABELS[data.checkOutcome] : 'not checked'}.
        </Alert>
      ) : null}
      {assembly.isPending ? (
        <SkeletonBlock label="Loading the assembly's checks…" lines={4} />
      ) : assembly.isError ? (
        <ErrorState title="The assembly's checks could not be loaded" error={assembly.error} onRetry={() => void assembly.refetch()} retrying={assembly.isFetching} />
      ) : (
        <>
          <dl className="grid grid-cols-[repeat(auto-fit,minmax(9rem,1fr))] gap-3">
            <div>
              <dt className="text-sm font-semibold text-ink-600">Construction</dt>
              <dd className="text-ink-950">
                <span className="font-mono font-semibold">{assembly.data.construction.code}</span> {assembly.data.construction.name}
              </dd>
            </div>
            <div>
              <dt className="text-sm font-semibold text-ink-600">Installed</dt>
              <dd className="text-ink-950">
                {assembly.data.installedAt ? formatDay(assembly.data.installedAt) : '—'}
                {assembly.data.installedAtEstimated ? ' (estimated)' : ''}
              </dd>
            </div>
            <div>
              <dt className="text-sm font-semibold text-ink-600">Next inspection</dt>
              <dd className="flex flex-wrap items-center gap-2 text-ink-950">
                {assembly.data.nextInspectionDue ? formatDate(assembly.data.nextInspectionDue) : 'Not scheduled'}
                {assembly.data.nextInspectionDue && assembly.data.nextInspectionDue < todayIso() ? (
                  <span className="rounded-sm bg-danger-700 px-1.5 text-sm font-bold text-white">Overdue</span>
                ) : null}
              </dd>
            </div>
          </dl>
          <CheckList results={assembly.data.checkResults} />
          {assembly.data.overrides.length ? (
            <div className="rounded-[var(--radius-control)] border-2 border-ink-700 bg-ink-50 px-4 py-3">
              <p className="font-bold text-ink-950">Overridden checks</p>
              <ul className="mt-1 flex flex-col gap-1">
                {assembly.data.overrides.map((o) => (
                  <li key={o.id} className="text-ink-900">
                    <span className="font-semibold">{SELECTION_CHECK_LABELS[o.checkCode as SelectionCheckCode] ?? o.checkCode}</span>: {o.reason}
                    <span className="text-ink-700">
                      {' '}
                      — {o.actorName ?? 'someone'}, review by {formatDate(o.reviewOn)}
                    </span>
                  </li>
                ))}
              </ul>
            </div>
          ) : null}
        </>
      )}
    </div>
  );
}

function CheckList({ results }: { results: CheckResult[] | null }) {
  if (!results || results.length === 0) return <p className="text-ink-700">No checks are recorded for this assembly here.</p>;
  const sorted = [...results].sort((a, b) => ORDER[a.outcome] - ORDER[b.outcome]);
  const concerns = sorted.filter((r) => r.outcome !== 'pass');
  const passes = sorted.filter((r) => r.outcome === 'pass');
  const row = (result: CheckResult) => (
    <li key={result.check} className="flex flex-col gap-1 px-3 py-2">
      <CheckOutcomeBadge outcome={result.outcome} />
      <span className="text-ink-900">{result.sentence}</span>
    </li>
  );
  return (
    <div className="flex flex-col gap-3">
      {concerns.length ? (
        <ul className="flex flex-col divide-y divide-ink-100 rounded-[var(--radius-control)] border border-ink-200" aria-label="Checks that need attention">
          {concerns.map(row)}
        </ul>
      ) : null}
      {passes.length ? (
        <details className="group rounded-[var(--radius-control)] border border-ink-200">
          <summary className="flex min-h-11 cursor-pointer items-center gap-2 px-3 font-semibold text-ink-900 hover:bg-ink-50">
            <span aria-hidden="true" className="inline-block transition-transform group-open:rotate-90">
              ›
            </span>
            {concerns.length ? `${passes.length} other ${passes.length === 1 ? 'check passes' : 'checks pass'}` : `All ${passes.length} checks pass`}
          </summary>
          <ul className="flex flex-col divide-y divide-ink-100 border-t border-ink-200" aria-label="Checks that pass">
            {passes.map(row)}
          </ul>
        </details>
      ) : null}
    </div>
  );
}
