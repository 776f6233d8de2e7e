import { useId, useState } from 'react';
import { paths } from '@/config/paths';
import { describeError } from '@/lib/api-client';
import { useCurrentUser } from '@/lib/auth';
import { Alert } from '@/components/ui/alert';
import { Button } from '@/components/ui/button';
import { Card, CardBody, CardHeader } from '@/components/ui/card';
import { Dialog, DialogActions } from '@/components/ui/dialog';
import { PanelBoundary } from '@/components/ui/error-boundary';
import { useSignOutEverywhere } from '@/features/auth/api/sign-out-everywhere';
import { PreferencesForm } from '@/features/preferences/components/preferences-form';
import { PageHeader } from './page-header';

export function PreferencesPage() {
  const user = useCurrentUser();
  const unitsId = useId();
  const sessionsId = useId();

  return (
    <>
      <PageHeader title="Preferences" description="How Ferrule shows values to you, and where you are signed in." />
      <div className="flex max-w-3xl flex-col gap-5">
        <Card labelledBy={unitsId}>
          <CardHeader title="Units" titleId={unitsId} description="Pressures, lengths and temperatures are shown in these units. What is recorded does not change." />
          <CardBody>
            <PanelBoundary title="Your units could not be shown">
              <PreferencesForm preferences={user.preferences} />
            </PanelBoundary>
          </CardBody>
        </Card>
        <Card labelledBy={sessionsId}>
          <CardHeader title="Sessions" titleId={sessionsId} />
          <CardBody>
            <SignOutEverywhere />
          </CardBody>
        </Card>
      </div>
    </>
  );
}

function SignOutEverywhere() {
  const [confirming, setConfirming] = useState(false);
  const signOut = useSignOutEverywhere({ onSuccess: () => window.location.assign(paths.auth.signIn.getHref()) });

  return (
    <div className="flex flex-col items-start gap-3">
      <p className="text-ink-700">Lost a phone, or signed in on a shared tablet? Sign out everywhere ends every session you have, this one included.</p>
      <Button
        variant="secondary"
        onClick={() => {
          signOut.reset();
          setConfirming(true);
        }}
      >
        Sign out everywhere
      </Button>
      <Dialog
        open={confirming}
        onClose={() => setConfirming(false)}
        role="alertdialog"
        size="sm"
        title="Sign out everywhere?"
        description="Every device you are signed in on, this one included, will need your password again."
      >
        {signOut.isError ? <Alert tone="danger">{describeError(signOut.error)}</Alert> : null}
        <DialogActions>
          <Button variant="secondary" onClick={() => setConfirming(false)} data-autofocus>
            Cancel
          </Button>
          <Button variant="danger" loading={signOut.isPending} onClick={() => signOut.mutate()}>
            Sign out everywhere
          </Button>
        </DialogActions>
      </Dialog>
    </div>
  );
}
