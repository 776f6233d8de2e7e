import { useNavigate, useSearchParams } from 'react-router-dom';
import { paths, safeNextPath } from '@/config/paths';
import { RequireAbility, useCurrentUser } from '@/lib/auth';
import { TextLink } from '@/components/ui/button';
import { EmptyState } from '@/components/ui/empty-state';
import { PanelBoundary } from '@/components/ui/error-boundary';
import { AssemblyBuildForm } from '@/features/assemblies/components/build/assembly-build-form';
import { PageHeader } from '../page-header';

export function NewAssemblyPage() {
  return (
    <RequireAbility action="assemblies.build">
      <NewAssembly />
    </RequireAbility>
  );
}

function NewAssembly() {
  const me = useCurrentUser();
  const navigate = useNavigate();
  const [params] = useSearchParams();
  const next = params.get('next');
  const safeNext = next ? safeNextPath(next) : null;
  const back = safeNext && safeNext !== paths.home.getHref() ? safeNext : paths.find.getHref();

  return (
    <div className="mx-auto max-w-4xl">
      <PageHeader
        before={<TextLink to={back}>{safeNext ? '← Back to the replacement' : '← Find a hose'}</TextLink>}
        title="Build an assembly"
        description="It gets its tag code when it is saved, and goes into stock once a proof test passes."
      />
      {me.sites.length === 0 ? (
        <EmptyState title="No site to store it at">Your account has no sites. Ask an administrator to give you access to your site.</EmptyState>
      ) : (
        <PanelBoundary title="The build form could not be shown">
          <AssemblyBuildForm
            sites={me.sites}
            defaultSiteId={params.get('siteId') ?? undefined}
            defaultConstructionId={params.get('constructionId') ?? undefined}
            onCancel={() => navigate(back)}
            onBuilt={(answer) => {
              const query = new URLSearchParams({ built: '1' });
              if (safeNext && safeNext !== paths.home.getHref()) query.set('next', safeNext);
              navigate(`${paths.assemblies.detail.getHref(answer.data.id)}?${query.toString()}`);
            }}
          />
        </PanelBoundary>
      )}
    </div>
  );
}
