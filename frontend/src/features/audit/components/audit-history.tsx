import { formatDateTime } from '@/lib/format';
import { EmptyState } from '@/components/ui/empty-state';
import { ErrorState } from '@/components/ui/error-state';
import { SkeletonBlock } from '@/components/ui/skeleton';
import { useAuditEntries } from '../api/get-audit-entries';

const SHOWN = 10;

/** The latest changes to one record: when, who, and what. */
export function AuditHistory({ entityType, entityId }: { entityType: string; entityId: string }) {
  const entries = useAuditEntries({ entityType, entityId, page: 1, pageSize: SHOWN });

  if (entries.isPending) return <SkeletonBlock label="Loading history…" lines={4} />;
  if (entries.isError) {
    return <ErrorState title="History could not be loaded" error={entries.error} onRetry={() => void entries.refetch()} retrying={entries.isFetching} />;
  }
  if (entries.data.data.length === 0) {
    return <EmptyState title="No history yet">Changes to this record will be listed here, with who made them and when.</EmptyState>;
  }

  const { total } = entries.data.pagination;
  return (
    <div className="flex flex-col gap-3">
      <ol className="flex flex-col">
        {entries.data.data.map((entry) => (
          <li key={entry.id} className="relative border-l-2 border-ink-200 pb-4 pl-5 last:pb-0">
            <span aria-hidden="true" className="absolute top-1.5 -left-[7px] size-3 rounded-full border-2 border-white bg-copper-600" />
            <p className="font-semibold text-ink-950">{entry.summary}</p>
            <p className="text-sm text-ink-600">
              <time dateTime={entry.at}>{formatDateTime(entry.at)}</time>
              {' · '}
              {entry.actorName ?? 'Ferrule'}
            </p>
          </li>
        ))}
      </ol>
      {total > entries.data.data.length ? (
        <p className="text-sm text-ink-700">
          The latest {entries.data.data.length} of {total.toLocaleString()} changes.
        </p>
      ) : null}
    </div>
  );
}
