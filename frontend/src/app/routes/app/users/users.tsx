import { useState } from 'react';
import { hasAbility, mayGrantAllSites, RequireAbility, useCurrentUser } from '@/lib/auth';
import { Button } from '@/components/ui/button';
import { PanelBoundary } from '@/components/ui/error-boundary';
import { PlusIcon } from '@/components/ui/icons';
import { InviteUserDialog } from '@/features/users/components/invite-user-dialog';
import { UsersPanel } from '@/features/users/components/users-panel';
import { PageHeader } from '../page-header';
import { renderSitePicker } from './site-picker';

export function UsersPage() {
  return (
    <RequireAbility action="users.list">
      <UsersAdministration />
    </RequireAbility>
  );
}

function UsersAdministration() {
  const user = useCurrentUser();
  const [inviting, setInviting] = useState(false);
  const canInvite = hasAbility(user, 'users.invite');
  const inviteButton = canInvite ? (
    <Button onClick={() => setInviting(true)} icon={<PlusIcon />}>
      Invite user
    </Button>
  ) : undefined;

  return (
    <>
      <PageHeader title="Users" description="Who can sign in to Ferrule, in which role, and at which sites." actions={inviteButton} />
      <PanelBoundary title="The list of users could not be shown">
        <UsersPanel inviteAction={inviteButton} />
      </PanelBoundary>
      {canInvite ? (
        <InviteUserDialog
          open={inviting}
          onClose={() => setInviting(false)}
          renderSitePicker={renderSitePicker}
          canGrantAllSites={mayGrantAllSites(user)}
        />
      ) : null}
    </>
  );
}
