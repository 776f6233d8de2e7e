import { useNavigate, useSearchParams } from 'react-router-dom';
import { paths } from '@/config/paths';
import { RequireAbility, useCurrentUser } from '@/lib/auth';
import { TextLink } from '@/components/ui/button';
import { PanelBoundary } from '@/components/ui/error-boundary';
import { ErrorState } from '@/components/ui/error-state';
import { SkeletonBlock } from '@/components/ui/skeleton';
import { useReference } from '@/features/positions/api/get-reference';
import { PositionCreateForm } from '@/features/positions/components/position-create-form';
import { useSites } from '@/features/sites/api/get-sites';
import { PageHeader } from '../page-header';

export function NewPositionPage() {
  return (
    <RequireAbility action="positions.edit">
      <NewPosition />
    </RequireAbility>
  );
}

function NewPosition() {
  const me = useCurrentUser();
  const navigate = useNavigate();
  const [searchParams] = useSearchParams();
  const sites = useSites();
  const reference = useReference();
  const equipmentId = searchParams.get('equipmentId') ?? '';
  const back = () => navigate(-1);

  let body;
  if (sites.isPending || reference.isPending) {
    body = <SkeletonBlock label="Loading the form…" lines={8} className="max-w-3xl" />;
  } else if (sites.isError || reference.isError) {
    const failed = sites.isError ? sites : reference;
    body = (
      <ErrorState
        title={sites.isError ? 'Your sites could not be loaded' : 'The reference lists could not be loaded'}
        error={failed.error}
        onRetry={() => void failed.refetch()}
        retrying={failed.isFetching}
      />
    );
  } else {
    body = (
      <PositionCreateForm
        sites={sites.data}
        reference={reference.data}
        units={me.preferences}
        initialEquipmentId={/^[0-9a-f-]{36}$/i.test(equipmentId) ? equipmentId : undefined}
        onCreated={(position) => navigate(paths.positions.detail.getHref(position.id), { replace: true })}
        onCancel={back}
      />
    );
  }

  return (
    <>
      <PageHeader
        before={<TextLink to={paths.register.getHref()}>← Register</TextLink>}
        title="New position"
        description="A hose point on a piece of equipment, with the conditions every hose fitted there must meet."
      />
      <div className="max-w-4xl">
        <PanelBoundary title="The new position form could not be shown">{body}</PanelBoundary>
      </div>
    </>
  );
}
