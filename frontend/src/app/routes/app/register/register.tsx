import { hasAbility, useCurrentUser } from '@/lib/auth';
import { paths } from '@/config/paths';
import { ButtonLink } from '@/components/ui/button';
import { PanelBoundary } from '@/components/ui/error-boundary';
import { PlusIcon } from '@/components/ui/icons';
import { useReference } from '@/features/positions/api/get-reference';
import { PlaceSelects } from '@/features/positions/components/place-selects';
import { RegisterPanel } from '@/features/register/components/register-panel';
import type { RenderPlaceFilters } from '@/features/register/components/register-filters';
import { useSites } from '@/features/sites/api/get-sites';
import { ExportCsvButton } from '@/features/csv/components/export-csv-button';
import { useLocation } from 'react-router-dom';
import { PageHeader } from '../page-header';

export function RegisterPage() {
  const me = useCurrentUser();
  const { search } = useLocation();
  const sites = useSites();
  const reference = useReference();
  // Until the list of sites arrives, the user's own list from sign-in fills the site filter.
  const siteList = sites.data ?? me.sites;
  const renderPlaceFilters: RenderPlaceFilters = (props) => <PlaceSelects sites={siteList} {...props} />;
  const build = hasAbility(me, 'assemblies.build') ? (
    <ButtonLink to={paths.assemblies.create.getHref()} variant="primary" icon={<PlusIcon />}>
      Build an assembly
    </ButtonLink>
  ) : undefined;

  return (
    <>
      <PageHeader title="Register" description="Every assembly: where it is, how its checks stand and when its next inspection is due." />
      <PanelBoundary title="The register could not be shown">
        <RegisterPanel
          units={me.preferences} reference={reference.data} referenceFailed={reference.isError} renderPlaceFilters={renderPlaceFilters}
          emptyAction={build}
          toolbarActions={hasAbility(me, 'register.export') ? <ExportCsvButton search={search} /> : undefined}
        />
      </PanelBoundary>
    </>
  );
}
