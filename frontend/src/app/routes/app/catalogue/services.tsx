import { useEffect } from 'react';
import { useSearchParams } from 'react-router-dom';
import { hasAbility, RequireAbility, useCurrentUser } from '@/lib/auth';
import { PanelBoundary } from '@/components/ui/error-boundary';
import { EmptyState } from '@/components/ui/empty-state';
import { ErrorState } from '@/components/ui/error-state';
import { SelectField } from '@/components/ui/field';
import { SkeletonBlock } from '@/components/ui/skeleton';
import { CatalogueTabs } from '@/features/catalogue/components/catalogue-tabs';
import { SiteServicesPanel } from '@/features/catalogue/components/site-services-panel';
import { useSites } from '@/features/sites/api/get-sites';
import { PageHeader } from '../page-header';

export function ServicesPage() {
  return (
    <RequireAbility action="register.read">
      <Services />
    </RequireAbility>
  );
}

function Services() {
  const user = useCurrentUser();
  const sites = useSites();
  const [searchParams, setSearchParams] = useSearchParams();
  const asked = searchParams.get('siteId') ?? undefined;
  const site = sites.data?.find((s) => s.id === asked) ?? sites.data?.[0];

  // Opened without a site (or with one the user cannot see): show the first of theirs, and say so in the address.
  useEffect(() => {
    if (site && site.id !== asked) setSearchParams((previous) => ({ ...Object.fromEntries(previous), siteId: site.id }), { replace: true });
  }, [site, asked, setSearchParams]);

  let body;
  if (sites.isPending) body = <SkeletonBlock label="Loading your sites…" lines={4} />;
  else if (sites.isError) body = <ErrorState title="Your sites could not be loaded" error={sites.error} onRetry={() => void sites.refetch()} retrying={sites.isFetching} />;
  else if (!site) {
    body = (
      <EmptyState title="No sites to show">
        {user.allSites ? 'No site has been set up yet. Services are set per site once an administrator adds one.' : 'You have not been given any site. Ask an administrator for access to the sites you work at.'}
      </EmptyState>
    );
  } else {
    body = (
      <div className="flex flex-col gap-5">
        <div className="max-w-md">
          <SelectField
            label="Site"
            hint="Each site keeps its own settings of every service."
            options={sites.data.map((s) => ({ value: s.id, label: `${s.name} (${s.code})` }))}
            value={site.id}
            onChange={(event) => setSearchParams((previous) => ({ ...Object.fromEntries(previous), siteId: event.target.value }))}
          />
        </div>
        <PanelBoundary title="The services could not be shown">
          <SiteServicesPanel key={site.id} siteId={site.id} siteName={site.name} canEdit={hasAbility(user, 'service-settings.update')} />
        </PanelBoundary>
      </div>
    );
  }

  return (
    <>
      <PageHeader
        before={<CatalogueTabs siteId={site?.id} />}
        title="Services"
        description="What each hose does, and the rules that follow from it at a site: design factors by pressure, inspection intervals, conductivity, periodic tests. Every default names its source."
      />
      {body}
    </>
  );
}
