import type { AssemblyDto } from '@shared/schemas/assemblies.schema';
import { describeError } from '@/lib/api-client';
import { Alert } from '@/components/ui/alert';
import { SkeletonBlock } from '@/components/ui/skeleton';
import { usePreviewChecks } from '../hooks/use-preview-checks';
import { OutcomeBadge } from './assembly-badges';
import { CheckResultList, outcomeCounts } from './check-results';

/** The selection checks of an assembly at a position before it goes in, as this device works them out. */
export function PreviewChecks({ assembly, positionId }: { assembly: AssemblyDto | undefined; positionId: string | null }) {
  const preview = usePreviewChecks(assembly, positionId);
  if (preview.state === 'pending') return <SkeletonBlock label="Running the selection checks…" lines={3} />;
  if (preview.state === 'unavailable') {
    return (
      <Alert tone="info" title="The checks could not be run here">
        {describeError(preview.error)} The server runs them when you confirm and refuses the install if a check fails.
      </Alert>
    );
  }
  const { summary } = preview;
  const fails = summary.results.filter((r) => r.outcome !== 'pass');
  return (
    <section aria-label="Selection checks before install" className="flex flex-col gap-3">
      <p className="flex flex-wrap items-center gap-2">
        <OutcomeBadge outcome={summary.outcome} />
        <span className="text-ink-800">{outcomeCounts(summary.results)}</span>
      </p>
      {fails.length ? <CheckResultList results={fails} showSources={false} /> : <p className="text-ink-800">Every check passes at this position.</p>}
      {summary.blocksInstall ? (
        <p className="font-semibold text-danger-800">
          {summary.allFailsOverridable
            ? 'With a failed check the server refuses it, unless a reliability engineer or administrator accepts the fail with a reason.'
            : 'A failed allowable-pressure or proof-test check cannot be overridden: choose another assembly.'}
        </p>
      ) : null}
      <p className="text-sm text-ink-600">Worked out on this device; the server checks again when you confirm, and its answer decides.</p>
    </section>
  );
}
