import { useState } from 'react';
import { useSearchParams } from 'react-router-dom';
import { paths } from '@/config/paths';
import { useAppMeta } from '@/lib/app-meta';
import { Alert } from '@/components/ui/alert';
import { ButtonLink } from '@/components/ui/button';
import { AuthCard } from '@/components/layouts/auth-layout';
import { SetupForm } from '@/features/auth/components/setup-form';

/** The first administrator of a production installation. */
export function SetupPage() {
  const [params] = useSearchParams();
  const meta = useAppMeta();
  const [done, setDone] = useState(false);

  if (done) {
    return (
      <AuthCard title="Ferrule is set up">
        <div className="flex flex-col gap-5">
          <Alert tone="success" title="Your administrator account is ready">
            Sign in with it, then invite the people who will use Ferrule.
          </Alert>
          <ButtonLink to={paths.auth.signIn.getHref()} variant="primary" size="lg">
            Sign in
          </ButtonLink>
        </div>
      </AuthCard>
    );
  }

  if (meta.data && !meta.data.needsSetup) {
    return (
      <AuthCard title="Ferrule is already set up" description="This installation has an administrator. Sign in, or ask an administrator for an invitation.">
        <ButtonLink to={paths.auth.signIn.getHref()} variant="primary">
          Go to sign in
        </ButtonLink>
      </AuthCard>
    );
  }

  return (
    <AuthCard title="Set up Ferrule" description="Create the first administrator of this installation. Everyone else is invited from inside Ferrule.">
      <SetupForm token={params.get('token') ?? ''} onDone={() => setDone(true)} />
    </AuthCard>
  );
}
