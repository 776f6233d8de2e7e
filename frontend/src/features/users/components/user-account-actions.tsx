import { useState } from 'react';
import type { UserDto } from '@shared/schemas/users.schema';
import { describeError } from '@/lib/api-client';
import { Alert } from '@/components/ui/alert';
import { Button } from '@/components/ui/button';
import { Dialog, DialogActions } from '@/components/ui/dialog';
import { useToast } from '@/components/ui/toast';
import { useDeactivateUser } from '../api/deactivate-user';
import { useReactivateUser } from '../api/reactivate-user';
import { useResendInvite } from '../api/resend-invite';

/** Deactivate, reactivate or re-invite one user, as the server's abilities allow. */
export function UserAccountActions({ user, onChanged }: { user: UserDto; onChanged?: () => void }) {
  const toast = useToast();
  const [confirming, setConfirming] = useState(false);

  const deactivate = useDeactivateUser({
    onSuccess: (saved) => {
      setConfirming(false);
      toast.show({ title: `${saved.name} is deactivated`, description: 'They can no longer sign in.' });
      onChanged?.();
    },
  });
  const reactivate = useReactivateUser({
    onSuccess: (saved) => {
      toast.show({ title: `${saved.name} is active again` });
      onChanged?.();
    },
  });
  const resend = useResendInvite({
    onSuccess: () => {
      toast.show({ title: `Invitation sent again to ${user.email}` });
      onChanged?.();
    },
  });

  const { abilities } = user;
  const none = !abilities.deactivate && !abilities.reactivate && !abilities.resendInvite;

  return (
    <div className="flex flex-col gap-4">
      {none ? <p className="text-ink-700">There is nothing you can change about this account's access.</p> : null}

      {abilities.resendInvite ? (
        <div className="flex flex-col items-start gap-2">
          <p className="text-ink-700">{user.name} has not accepted the invitation yet. Sending it again gives them a fresh link.</p>
          <Button
            variant="secondary"
            loading={resend.isPending}
            onClick={() => resend.mutate(user.id, { onError: (error) => toast.show({ tone: 'error', title: 'The invitation was not sent', description: describeError(error) }) })}
          >
            Resend invitation
          </Button>
        </div>
      ) : null}

      {abilities.reactivate ? (
        <div className="flex flex-col items-start gap-2">
          <p className="text-ink-700">{user.name} is deactivated and cannot sign in.</p>
          <Button
            variant="secondary"
            loading={reactivate.isPending}
            onClick={() => reactivate.mutate(user.id, { onError: (error) => toast.show({ tone: 'error', title: 'The user was not reactivated', description: describeError(error) }) })}
          >
            Reactivate user
          </Button>
        </div>
      ) : null}

      {abilities.deactivate ? (
        <div className="flex flex-col items-start gap-2">
          <p className="text-ink-700">Deactivating stops {user.name} signing in. Their records and history stay.</p>
          <Button
            variant="danger"
            onClick={() => {
              deactivate.reset();
              setConfirming(true);
            }}
          >
            Deactivate user
          </Button>
        </div>
      ) : null}

      <Dialog
        open={confirming}
        onClose={() => setConfirming(false)}
        role="alertdialog"
        size="sm"
        title={`Deactivate ${user.name}?`}
        description="They can no longer sign in, and any session they have open ends. Everything they recorded stays. You can reactivate them later."
      >
        {deactivate.isError ? <Alert tone="danger">{describeError(deactivate.error)}</Alert> : null}
        <DialogActions>
          <Button variant="secondary" onClick={() => setConfirming(false)} data-autofocus>
            Cancel
          </Button>
          <Button variant="danger" loading={deactivate.isPending} onClick={() => deactivate.mutate(user.id)}>
            Deactivate
          </Button>
        </DialogActions>
      </Dialog>
    </div>
  );
}
