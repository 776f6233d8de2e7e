import { useSearchParams } from 'react-router-dom';
import { paths } from '@/config/paths';
import { Alert } from '@/components/ui/alert';
import { ButtonLink } from '@/components/ui/button';
import { AuthCard } from '@/components/layouts/auth-layout';
import { useAcceptInvitation } from '@/features/auth/api/accept-invitation';
import { NewPasswordForm } from '@/features/auth/components/new-password-form';

export function AcceptInvitePage() {
  const [params] = useSearchParams();
  const token = params.get('token') ?? '';
  const accept = useAcceptInvitation();

  if (!token) {
    return (
      <AuthCard title="This invitation link is incomplete" description="The address has no invitation token. Open the link from the invitation e-mail again.">
        <ButtonLink to={paths.auth.signIn.getHref()}>Go to sign in</ButtonLink>
      </AuthCard>
    );
  }

  return (
    <AuthCard title="Accept your invitation" description="Choose the password you will sign in to Ferrule with.">
      <NewPasswordForm
        token={token}
        ariaLabel="Accept your invitation"
        submitLabel="Set password and finish"
        onSubmit={(input) => accept.mutateAsync(input)}
        done={
          <div className="flex flex-col gap-5">
            <Alert tone="success" title="Your account is ready">
              Sign in with the e-mail address the invitation was sent to and your new password.
            </Alert>
            <ButtonLink to={paths.auth.signIn.getHref()} variant="primary" size="lg">
              Sign in
            </ButtonLink>
          </div>
        }
        invalidToken={
          <div className="flex flex-col gap-5">
            <Alert tone="danger" title="This invitation has expired or has already been used">
              Ask your administrator to send the invitation again. If you have already set your password, sign in.
            </Alert>
            <ButtonLink to={paths.auth.signIn.getHref()} variant="primary">
              Go to sign in
            </ButtonLink>
          </div>
        }
      />
    </AuthCard>
  );
}
