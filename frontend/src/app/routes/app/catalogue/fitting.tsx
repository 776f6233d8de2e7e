import { useId } from 'react';
import { useParams } from 'react-router-dom';
import { FITTING_STYLE_LABELS } from '@shared/schemas/register.schema';
import { paths } from '@/config/paths';
import { isApiError } from '@/lib/api-client';
import { RequireAbility } from '@/lib/auth';
import { formatDateTime } from '@/lib/format';
import { Badge } from '@/components/ui/badge';
import { ButtonLink, TextLink } from '@/components/ui/button';
import { Card, CardBody, CardHeader } from '@/components/ui/card';
import { PanelBoundary } from '@/components/ui/error-boundary';
import { ErrorState } from '@/components/ui/error-state';
import { SkeletonBlock } from '@/components/ui/skeleton';
import { useFittingType } from '@/features/catalogue/api/get-fitting-type';
import { FittingSizesTable } from '@/features/catalogue/components/fitting-sizes-table';
import { FittingTypeActions } from '@/features/catalogue/components/fitting-type-actions';
import { PropertyList } from '@/features/catalogue/components/property-list';
import { PageHeader } from '../page-header';

export function FittingTypePage() {
  return (
    <RequireAbility action="register.read">
      <FittingTypeDetail />
    </RequireAbility>
  );
}

const backLink = <TextLink to={paths.catalogue.fittings.getHref()}>← All fitting types</TextLink>;

function FittingTypeDetail() {
  const { id = '' } = useParams();
  const fitting = useFittingType(id);
  const detailsId = useId();
  const sizesId = useId();

  if (fitting.isPending) {
    return (
      <>
        {backLink}
        <SkeletonBlock label="Loading fitting type…" lines={6} className="mt-4 max-w-3xl" />
      </>
    );
  }
  if (fitting.isError) {
    if (isApiError(fitting.error) && fitting.error.status === 404) {
      return (
        <div className="flex flex-col items-start gap-4">
          <title>Fitting type not found · Ferrule</title>
          <h1 className="text-2xl font-bold text-ink-950">Fitting type not found</h1>
          <p className="text-ink-700">There is no fitting type at this address. It may have been mistyped.</p>
          <ButtonLink to={paths.catalogue.fittings.getHref()}>Back to all fitting types</ButtonLink>
        </div>
      );
    }
    return (
      <>
        {backLink}
        <ErrorState headingLevel={1} title="This fitting type could not be loaded" error={fitting.error} onRetry={() => void fitting.refetch()} retrying={fitting.isFetching} className="mt-4" />
      </>
    );
  }

  const f = fitting.data;
  return (
    <>
      <PageHeader
        before={backLink}
        title={f.code}
        description={
          <div className="flex flex-wrap items-center gap-x-3 gap-y-1">
            <span className="text-lg text-ink-900">{f.name}</span>
            {f.archivedAt ? <Badge tone="muted">Archived {formatDateTime(f.archivedAt)}</Badge> : null}
          </div>
        }
        actions={<FittingTypeActions fittingType={f} />}
      />
      <div className="grid grid-cols-1 items-start gap-5 lg:grid-cols-[minmax(0,2fr)_minmax(0,3fr)]">
        <Card labelledBy={detailsId}>
          <CardHeader title="Details" titleId={detailsId} />
          <CardBody>
            <PropertyList
              items={[
                { label: 'Style', value: FITTING_STYLE_LABELS[f.style] ?? f.style },
                { label: 'Material', value: f.material },
              ]}
            />
            {f.notes ? <p className="mt-4 whitespace-pre-line text-ink-900">{f.notes}</p> : null}
          </CardBody>
        </Card>
        <Card labelledBy={sizesId}>
          <CardHeader
            title="Ratings by size"
            titleId={sizesId}
            description="As the fitting maker rates them, in your units. Crimp to the fitting maker's chart for the hose in use."
          />
          <CardBody>
            <PanelBoundary title="The sizes could not be shown">
              <FittingSizesTable fittingType={f} />
            </PanelBoundary>
          </CardBody>
        </Card>
      </div>
    </>
  );
}
