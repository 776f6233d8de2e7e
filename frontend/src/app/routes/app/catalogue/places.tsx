import { useSearchParams } from 'react-router-dom';
import { useQueryClient } from '@tanstack/react-query';
import { RequireAbility } from '@/lib/auth';
import { PanelBoundary } from '@/components/ui/error-boundary';
import { ErrorState } from '@/components/ui/error-state';
import { SkeletonBlock } from '@/components/ui/skeleton';
import { PlacesTree } from '@/features/places/components/places-tree';
import { useSites } from '@/features/sites/api/get-sites';
import { siteKeys } from '@/features/sites/api/site-keys';
import { PageHeader } from '../page-header';

export function PlacesPage() {
  return (
    <RequireAbility action="register.read">
      <Places />
    </RequireAbility>
  );
}

function Places() {
  const sites = useSites();
  const queryClient = useQueryClient();
  const [searchParams] = useSearchParams();

  return (
    <>
      <PageHeader
        title="Sites and equipment"
        description="Where the hoses are: each site's areas, the equipment in them, and the hose positions on each piece of equipment."
      />
      <PanelBoundary title="The sites could not be shown">
        {sites.isPending ? (
          <SkeletonBlock label="Loading your sites…" lines={4} />
        ) : sites.isError ? (
          <ErrorState title="Your sites could not be loaded" error={sites.error} onRetry={() => void sites.refetch()} retrying={sites.isFetching} />
        ) : (
          <PlacesTree
            sites={sites.data}
            initialSiteId={searchParams.get('siteId') ?? undefined}
            onSitesChanged={() => void queryClient.invalidateQueries({ queryKey: siteKeys.all })}
          />
        )}
      </PanelBoundary>
    </>
  );
}
