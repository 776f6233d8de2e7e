import { useId } from 'react';
import type { MeDto } from '@shared/schemas/auth.schema';
import { countOf, formatDate } from '@/lib/format';
import { Card, CardBody, CardHeader } from '@/components/ui/card';
import { EmptyState } from '@/components/ui/empty-state';
import { ErrorState } from '@/components/ui/error-state';
import { SkeletonBlock } from '@/components/ui/skeleton';
import { useSites } from '../api/get-sites';

/** The sites the user works in, and when their access ends if it does. */
export function MySitesCard({ user }: { user: Pick<MeDto, 'allSites' | 'accessExpiresOn'> }) {
  const titleId = useId();
  const sites = useSites();

  return (
    <Card labelledBy={titleId}>
      <CardHeader
        title="Your sites"
        titleId={titleId}
        description={user.allSites ? 'Every site, including sites added later.' : sites.data ? countOf(sites.data.length, 'site') : undefined}
      />
      <CardBody className="flex flex-col gap-3">
        {sites.isPending ? (
          <SkeletonBlock label="Loading your sites…" lines={3} />
        ) : sites.isError ? (
          <ErrorState title="Your sites could not be loaded" error={sites.error} onRetry={() => void sites.refetch()} retrying={sites.isFetching} />
        ) : sites.data.length === 0 ? (
          <EmptyState title="No sites yet">
            {user.allSites
              ? 'No site has been set up in Ferrule yet. Sites appear here as soon as an administrator adds them.'
              : 'You have not been given any site. Ask an administrator at your plant for access to the sites you work at.'}
          </EmptyState>
        ) : (
          <ul className="divide-y divide-ink-100">
            {sites.data.map((site) => (
              <li key={site.id} className="flex items-baseline gap-3 py-2.5">
                <span className="min-w-16 font-mono text-sm font-semibold text-ink-700">{site.code}</span>
                <span className="font-semibold text-ink-950">{site.name}</span>
              </li>
            ))}
          </ul>
        )}
        {user.accessExpiresOn ? (
          <p className="text-sm text-ink-700">
            Your access ends on <strong className="font-semibold text-ink-950">{formatDate(user.accessExpiresOn)}</strong>.
          </p>
        ) : null}
      </CardBody>
    </Card>
  );
}
