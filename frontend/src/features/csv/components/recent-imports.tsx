import { Link } from 'react-router-dom';
import { IMPORT_KIND_LABELS } from '@shared/schemas/csv.schema';
import { paths } from '@/config/paths';
import { formatDateTime } from '@/lib/format';
import { Card, CardBody, CardHeader } from '@/components/ui/card';
import { EmptyState } from '@/components/ui/empty-state';
import { ErrorState } from '@/components/ui/error-state';
import { SkeletonBlock } from '@/components/ui/skeleton';
import { useImports } from '../api/get-imports';
import { ImportStatusBadge } from './import-values';

/** The signed-in user's last imports, each opening its check or result. */
export function RecentImports() {
  const imports = useImports();
  let body;
  if (imports.isPending) body = <SkeletonBlock label="Loading your recent imports…" lines={4} />;
  else if (imports.isError) body = <ErrorState title="Your recent imports could not be loaded" error={imports.error} onRetry={() => void imports.refetch()} retrying={imports.isFetching} />;
  else if (imports.data.length === 0) body = <EmptyState title="No imports yet">Files you upload are listed here, with their checks and results.</EmptyState>;
  else {
    body = (
      <ul className="-my-2 flex flex-col divide-y divide-ink-100">
        {imports.data.map((job) => (
          <li key={job.id} className="py-2">
            <Link to={paths.importCsv.getHref(job.id)} className="-mx-2 flex min-h-11 flex-col gap-1 rounded-[var(--radius-control)] px-2 py-2 hover:bg-ink-50">
              <span className="flex flex-wrap items-center justify-between gap-2">
                <span className="font-semibold text-copper-700 underline decoration-2 underline-offset-4 [overflow-wrap:anywhere]">{job.fileName}</span>
                <ImportStatusBadge status={job.status} errorCount={job.errorCount} />
              </span>
              <span className="text-sm text-ink-700">
                {IMPORT_KIND_LABELS[job.kind]}
                {job.siteName ? ` · ${job.siteName}` : ''} · {job.totalRows.toLocaleString()} {job.totalRows === 1 ? 'row' : 'rows'} · {formatDateTime(job.createdAt)}
              </span>
            </Link>
          </li>
        ))}
      </ul>
    );
  }
  return (
    <Card labelledBy="recent-imports">
      <CardHeader titleId="recent-imports" title="Your recent imports" />
      <CardBody>{body}</CardBody>
    </Card>
  );
}
