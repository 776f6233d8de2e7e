import { useId, useState } from 'react';
import { useParams } from 'react-router-dom';
import type { PositionDto } from '@shared/schemas/register.schema';
import { paths } from '@/config/paths';
import { isApiError } from '@/lib/api-client';
import { hasAbility, useCurrentUser } from '@/lib/auth';
import { formatDay } from '@/lib/format';
import { Alert } from '@/components/ui/alert';
import { Button, ButtonLink, TextLink } from '@/components/ui/button';
import { Card, CardBody, CardHeader } from '@/components/ui/card';
import { PanelBoundary } from '@/components/ui/error-boundary';
import { ErrorState } from '@/components/ui/error-state';
import { PlusIcon } from '@/components/ui/icons';
import { SkeletonBlock } from '@/components/ui/skeleton';
import { usePosition } from '@/features/positions/api/get-position';
import { useReference } from '@/features/positions/api/get-reference';
import { ArchivePosition } from '@/features/positions/components/archive-position';
import { CurrentAssembly } from '@/features/positions/components/current-assembly';
import { DesignConditions } from '@/features/positions/components/design-conditions';
import { PositionEditForm } from '@/features/positions/components/position-edit-form';
import { PositionHistory } from '@/features/positions/components/position-history';
import { PageHeader } from '../page-header';

const backLink = <TextLink to={paths.register.getHref()}>← Register</TextLink>;

export function PositionPage() {
  const { id = '' } = useParams();
  const position = usePosition(id);

  if (position.isPending) {
    return (
      <>
        {backLink}
        <SkeletonBlock label="Loading the position…" lines={8} className="mt-4 max-w-3xl" />
      </>
    );
  }
  if (position.isError) {
    if (isApiError(position.error) && position.error.status === 404) {
      return (
        <div className="flex flex-col items-start gap-4">
          <title>Position not found · Ferrule</title>
          <h1 className="text-2xl font-bold text-ink-950">Position not found</h1>
          <p className="text-ink-700">There is no position at this address, or it is at a site you can't see.</p>
          <ButtonLink to={paths.register.getHref()}>Go to the register</ButtonLink>
        </div>
      );
    }
    return (
      <>
        {backLink}
        <ErrorState headingLevel={1} title="This position could not be loaded" error={position.error} onRetry={() => void position.refetch()} retrying={position.isFetching} className="mt-4" />
      </>
    );
  }
  return <PositionDetail key={position.data.id} position={position.data} />;
}

function PositionDetail({ position }: { position: PositionDto }) {
  const me = useCurrentUser();
  const reference = useReference();
  const [editing, setEditing] = useState(false);
  const [recomputedSince, setRecomputedSince] = useState<number | undefined>(undefined);
  const conditionsId = useId();
  const assemblyId = useId();
  const historyId = useId();
  const archiveId = useId();
  // The server grants the ability; the position's own abilities say whether this one can be changed.
  const canEdit = hasAbility(me, 'positions.edit') && position.abilities.update && !position.archivedAt;

  return (
    <>
      <PageHeader
        before={backLink}
        title={position.code}
        description={
          <div className="flex flex-col gap-1">
            <span className="text-lg font-semibold text-ink-900">{position.name}</span>
            <span className="flex flex-wrap gap-x-3 gap-y-1">
              <span>
                <span className="font-mono font-semibold text-ink-950">{position.equipmentAssetNumber}</span> {position.equipmentName}
              </span>
              <span aria-hidden="true">·</span>
              <span>{position.areaName}</span>
              <span aria-hidden="true">·</span>
              <span>{position.siteName}</span>
            </span>
          </div>
        }
        actions={
          <>
            <ButtonLink to={paths.register.getHref(new URLSearchParams({ siteId: position.siteId, equipmentId: position.equipmentId }))}>
              Assemblies on {position.equipmentAssetNumber}
            </ButtonLink>
            {hasAbility(me, 'positions.edit') ? (
              <ButtonLink to={paths.positions.create.getHref({ equipmentId: position.equipmentId })} icon={<PlusIcon />}>
                New position on {position.equipmentAssetNumber}
              </ButtonLink>
            ) : null}
          </>
        }
      />
      {position.archivedAt ? (
        <Alert className="mb-5" title={`Archived on ${formatDay(position.archivedAt)}`}>
          This position is no longer offered for installs. Its history is kept below.
        </Alert>
      ) : null}
      {/* On a phone the hose in the position comes first: it is what a fitter came for. */}
      <div className="grid grid-cols-1 items-start gap-5 xl:grid-cols-[minmax(0,3fr)_minmax(0,2fr)]">
        <Card labelledBy={conditionsId} className="xl:col-start-1 xl:row-span-2 xl:row-start-1">
          <CardHeader
            title={editing ? 'Edit design conditions' : 'Design conditions'}
            titleId={conditionsId}
            description={editing ? undefined : `Shown in your units: ${me.preferences.pressureUnit}, ${me.preferences.lengthUnit}, °${me.preferences.temperatureUnit}.`}
            actions={
              canEdit && !editing ? (
                <Button variant="secondary" onClick={() => setEditing(true)}>
                  Edit design conditions
                </Button>
              ) : undefined
            }
          />
          <CardBody>
            <PanelBoundary title="The design conditions could not be shown">
              {reference.isPending ? (
                <SkeletonBlock label="Loading the reference lists…" lines={6} />
              ) : reference.isError ? (
                <ErrorState title="The reference lists could not be loaded" error={reference.error} onRetry={() => void reference.refetch()} retrying={reference.isFetching} />
              ) : editing ? (
                <PositionEditForm
                  position={position}
                  reference={reference.data}
                  units={me.preferences}
                  onCancel={() => setEditing(false)}
                  onSaved={(_saved, designChanged, submittedAt) => {
                    setEditing(false);
                    if (designChanged && position.currentAssembly) setRecomputedSince(submittedAt);
                  }}
                />
              ) : (
                <DesignConditions position={position} reference={reference.data} units={me.preferences} />
              )}
            </PanelBoundary>
          </CardBody>
        </Card>
        <Card labelledBy={assemblyId} className="order-first xl:order-none xl:col-start-2 xl:row-start-1">
          <CardHeader title="Assembly in this position" titleId={assemblyId} />
          <CardBody>
            <PanelBoundary title="The assembly could not be shown">
              <CurrentAssembly position={position} recomputedSince={recomputedSince} />
            </PanelBoundary>
          </CardBody>
        </Card>
        {hasAbility(me, 'positions.edit') ? (
          <Card labelledBy={archiveId} className="xl:col-start-2 xl:row-start-2">
            <CardHeader title="Archive" titleId={archiveId} level={2} />
            <CardBody>
              <PanelBoundary title="The archive action could not be shown">
                <ArchivePosition position={position} />
              </PanelBoundary>
            </CardBody>
          </Card>
        ) : null}
        <Card labelledBy={historyId} className="xl:col-span-2 xl:row-start-3">
          <CardHeader title="History" titleId={historyId} description="Every assembly that has been in this position, newest first: how long it lasted and how it came out." />
          <CardBody>
            <PanelBoundary title="The history could not be shown">
              <PositionHistory positionId={position.id} reference={reference.data} />
            </PanelBoundary>
          </CardBody>
        </Card>
      </div>
    </>
  );
}
