import { useId } from 'react';
import { paths } from '@/config/paths';
import { countOf } from '@/lib/format';
import { ButtonLink } from '@/components/ui/button';
import { Card, CardBody, CardHeader } from '@/components/ui/card';
import { EmptyState } from '@/components/ui/empty-state';
import { ErrorState } from '@/components/ui/error-state';
import { SkeletonBlock } from '@/components/ui/skeleton';
import { useUserCounts } from '../api/get-user-counts';
import { STATUS_LABELS } from './user-labels';

/** How many people use Ferrule, by status, with the way into user administration. */
export function UsersSummaryCard() {
  const titleId = useId();
  const counts = useUserCounts();

  return (
    <Card labelledBy={titleId}>
      <CardHeader title="Users" titleId={titleId} description={counts.data ? countOf(counts.data.total, 'user') : undefined} />
      <CardBody className="flex flex-col gap-4">
        {counts.isPending ? (
          <SkeletonBlock label="Loading user counts…" lines={2} />
        ) : counts.isError ? (
          <ErrorState title="User counts could not be loaded" error={counts.error} onRetry={() => void counts.refetch()} retrying={counts.isFetching} />
        ) : counts.data.total === 0 ? (
          <EmptyState title="No users yet">Invite the people who work with your plant's hoses from user administration.</EmptyState>
        ) : (
          <dl className="grid grid-cols-2 gap-3 sm:grid-cols-4">
            {(['active', 'invited', 'expired', 'inactive'] as const).map((status) => (
              <div key={status} className="flex flex-col rounded-[var(--radius-control)] bg-ink-50 px-3 py-2">
                <dt className="text-sm text-ink-600">{STATUS_LABELS[status]}</dt>
                <dd className="text-2xl font-bold text-ink-950">{counts.data[status].toLocaleString()}</dd>
              </div>
            ))}
          </dl>
        )}
        <ButtonLink to={paths.users.list.getHref()} className="self-start">
          Manage users
        </ButtonLink>
      </CardBody>
    </Card>
  );
}
