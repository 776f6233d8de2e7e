import { useId } from 'react';
import { useParams } from 'react-router-dom';
import { useQueryClient } from '@tanstack/react-query';
import { ROLE_LABELS } from '@shared/roles';
import { paths } from '@/config/paths';
import { isApiError } from '@/lib/api-client';
import { AccessDenied, hasAbility, mayGrantAllSites, RequireAbility, useCurrentUser } from '@/lib/auth';
import { formatDateTime } from '@/lib/format';
import { ButtonLink, TextLink } from '@/components/ui/button';
import { Card, CardBody, CardHeader } from '@/components/ui/card';
import { ErrorState } from '@/components/ui/error-state';
import { PanelBoundary } from '@/components/ui/error-boundary';
import { SkeletonBlock } from '@/components/ui/skeleton';
import { auditKeys } from '@/features/audit/api/audit-keys';
import { AuditHistory } from '@/features/audit/components/audit-history';
import { useUser } from '@/features/users/api/get-user';
import { UserAccountActions } from '@/features/users/components/user-account-actions';
import { UserEditForm } from '@/features/users/components/user-edit-form';
import { UserStatusBadge } from '@/features/users/components/user-status-badge';
import { PageHeader } from '../page-header';
import { renderSitePicker } from './site-picker';

export function UserPage() {
  return (
    <RequireAbility action="users.read">
      <UserDetail />
    </RequireAbility>
  );
}

const backLink = <TextLink to={paths.users.list.getHref()}>← All users</TextLink>;

function UserDetail() {
  const { id = '' } = useParams();
  const me = useCurrentUser();
  const queryClient = useQueryClient();
  const user = useUser(id);
  const detailsId = useId();
  const accountId = useId();
  const historyId = useId();

  if (user.isPending) {
    return (
      <>
        {backLink}
        <SkeletonBlock label="Loading user…" lines={6} className="mt-4 max-w-2xl" />
      </>
    );
  }

  if (user.isError) {
    if (isApiError(user.error) && user.error.status === 403) return <AccessDenied />;
    if (isApiError(user.error) && user.error.status === 404) {
      return (
        <div className="flex flex-col items-start gap-4">
          <title>User not found · Ferrule</title>
          <h1 className="text-2xl font-bold text-ink-950">User not found</h1>
          <p className="text-ink-700">There is no user at this address, or they are outside the sites you can see.</p>
          <ButtonLink to={paths.users.list.getHref()}>Back to all users</ButtonLink>
        </div>
      );
    }
    return (
      <>
        {backLink}
        <ErrorState
          headingLevel={1}
          title="This user could not be loaded"
          error={user.error}
          onRetry={() => void user.refetch()}
          retrying={user.isFetching}
          className="mt-4"
        />
      </>
    );
  }

  const data = user.data;
  const refreshHistory = () => void queryClient.invalidateQueries({ queryKey: auditKeys.all });

  return (
    <>
      <PageHeader
        before={backLink}
        title={data.name}
        description={
          <div className="flex flex-wrap items-center gap-x-3 gap-y-1">
            <span className="break-all">{data.email}</span>
            <UserStatusBadge status={data.status} />
            <span>{ROLE_LABELS[data.role]}</span>
            <span className="text-sm text-ink-600">{data.lastSignInAt ? `Last signed in ${formatDateTime(data.lastSignInAt)}` : 'Has never signed in'}</span>
          </div>
        }
      />
      <div className="grid grid-cols-1 items-start gap-5 lg:grid-cols-[minmax(0,3fr)_minmax(0,2fr)]">
        <Card labelledBy={detailsId}>
          <CardHeader title="Details and access" titleId={detailsId} />
          <CardBody>
            <PanelBoundary title="The user's details could not be shown">
              <UserEditForm
                key={data.id}
                user={data}
                renderSitePicker={renderSitePicker}
                canGrantAllSites={mayGrantAllSites(me)}
                onSaved={refreshHistory}
              />
            </PanelBoundary>
          </CardBody>
        </Card>
        <div className="flex flex-col gap-5">
          <Card labelledBy={accountId}>
            <CardHeader title="Account" titleId={accountId} />
            <CardBody>
              <PanelBoundary title="Account actions could not be shown">
                <UserAccountActions user={data} onChanged={refreshHistory} />
              </PanelBoundary>
            </CardBody>
          </Card>
          {hasAbility(me, 'audit.read') ? (
            <Card labelledBy={historyId}>
              <CardHeader title="History" titleId={historyId} description="The latest changes to this account." />
              <CardBody>
                <PanelBoundary title="The history could not be shown">
                  <AuditHistory entityType="user" entityId={data.id} />
                </PanelBoundary>
              </CardBody>
            </Card>
          ) : null}
        </div>
      </div>
    </>
  );
}
