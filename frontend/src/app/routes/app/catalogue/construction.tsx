import { useId } from 'react';
import { useParams } from 'react-router-dom';
import { paths } from '@/config/paths';
import { isApiError } from '@/lib/api-client';
import { hasAbility, RequireAbility, useCurrentUser } from '@/lib/auth';
import { formatDateTime } from '@/lib/format';
import { Badge } from '@/components/ui/badge';
import { ButtonLink, TextLink } from '@/components/ui/button';
import { Card, CardBody, CardHeader } from '@/components/ui/card';
import { PanelBoundary } from '@/components/ui/error-boundary';
import { ErrorState } from '@/components/ui/error-state';
import { SkeletonBlock } from '@/components/ui/skeleton';
import { useConstruction } from '@/features/catalogue/api/get-construction';
import { CompatibilityTable } from '@/features/catalogue/components/compatibility-table';
import { ConstructionActions } from '@/features/catalogue/components/construction-actions';
import { ConstructionProperties } from '@/features/catalogue/components/construction-properties';
import { PageHeader } from '../page-header';

export function ConstructionPage() {
  return (
    <RequireAbility action="register.read">
      <ConstructionDetail />
    </RequireAbility>
  );
}

const backLink = <TextLink to={paths.catalogue.constructions.getHref()}>← All constructions</TextLink>;

function ConstructionDetail() {
  const { id = '' } = useParams();
  const user = useCurrentUser();
  const construction = useConstruction(id);
  const propertiesId = useId();
  const compatibilityId = useId();

  if (construction.isPending) {
    return (
      <>
        {backLink}
        <SkeletonBlock label="Loading construction…" lines={8} className="mt-4 max-w-3xl" />
      </>
    );
  }

  if (construction.isError) {
    if (isApiError(construction.error) && construction.error.status === 404) {
      return (
        <div className="flex flex-col items-start gap-4">
          <title>Construction not found · Ferrule</title>
          <h1 className="text-2xl font-bold text-ink-950">Construction not found</h1>
          <p className="text-ink-700">There is no construction at this address. It may have been mistyped.</p>
          <ButtonLink to={paths.catalogue.constructions.getHref()}>Back to all constructions</ButtonLink>
        </div>
      );
    }
    return (
      <>
        {backLink}
        <ErrorState
          headingLevel={1}
          title="This construction could not be loaded"
          error={construction.error}
          onRetry={() => void construction.refetch()}
          retrying={construction.isFetching}
          className="mt-4"
        />
      </>
    );
  }

  const c = construction.data;
  const canBuild = hasAbility(user, 'assemblies.build') && !c.archivedAt;

  return (
    <>
      <PageHeader
        before={backLink}
        title={c.code}
        description={
          <div className="flex flex-wrap items-center gap-x-3 gap-y-1">
            <span className="text-lg text-ink-900">{c.name}</span>
            {c.archivedAt ? <Badge tone="muted">Archived {formatDateTime(c.archivedAt)}</Badge> : null}
            <span className="text-sm text-ink-600">Last changed {formatDateTime(c.updatedAt)}</span>
          </div>
        }
        actions={
          <>
            {canBuild ? (
              <ButtonLink variant="secondary" to={paths.assemblies.create.getHref({ constructionId: c.id })}>
                Build an assembly
              </ButtonLink>
            ) : null}
            <ConstructionActions construction={c} />
          </>
        }
      />
      <div className="flex flex-col gap-5">
        <Card labelledBy={propertiesId}>
          <CardHeader title="Properties" titleId={propertiesId} description="In your units, from the maker's data as recorded here." />
          <CardBody>
            <PanelBoundary title="The properties could not be shown">
              <ConstructionProperties construction={c} />
            </PanelBoundary>
          </CardBody>
        </Card>
        <Card labelledBy={compatibilityId}>
          <CardHeader
            title="Compatibility with media"
            titleId={compatibilityId}
            description={c.tubeCompound ? `What Ferrule's table says about the ${c.tubeCompound} tube, medium by medium.` : undefined}
          />
          <CardBody>
            <PanelBoundary title="The compatibility table could not be shown">
              <CompatibilityTable tubeCompound={c.tubeCompound} />
            </PanelBoundary>
          </CardBody>
        </Card>
      </div>
    </>
  );
}
