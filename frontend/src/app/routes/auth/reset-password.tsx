import { useSearchParams } from 'react-router-dom';
import { paths } from '@/config/paths';
import { Alert } from '@/components/ui/alert';
import { ButtonLink, TextLink } from '@/components/ui/button';
import { AuthCard } from '@/components/layouts/auth-layout';
import { useCompletePasswordReset } from '@/features/auth/api/complete-password-reset';
import { NewPasswordForm } from '@/features/auth/components/new-password-form';

export function ResetPasswordPage() {
  const [params] = useSearchParams();
  const token = params.get('token') ?? '';
  const complete = useCompletePasswordReset();

  if (!token) {
    return (
      <AuthCard title="This link is incomplete" description="The address has no reset token. Open the link from the e-mail again, or ask for a new one.">
        <ButtonLink to={paths.auth.forgotPassword.getHref()} variant="primary">
          Request a new link
        </ButtonLink>
      </AuthCard>
    );
  }

  return (
    <AuthCard title="Choose a new password" description="Once it is set, sign in with it. Sessions on your other devices end.">
      <NewPasswordForm
        token={token}
        ariaLabel="Choose a new password"
        submitLabel="Set new password"
        onSubmit={(input) => complete.mutateAsync(input)}
        done={
          <div className="flex flex-col gap-5">
            <Alert tone="success" title="Your new password is set">
              Sign in with your e-mail and the new password.
            </Alert>
            <ButtonLink to={paths.auth.signIn.getHref()} variant="primary" size="lg">
              Sign in
            </ButtonLink>
          </div>
        }
        invalidToken={
          <div className="flex flex-col gap-5">
            <Alert tone="danger" title="This link has expired or has already been used">
              Reset links work once and only for a short time. Ask for a new one.
            </Alert>
            <ButtonLink to={paths.auth.forgotPassword.getHref()} variant="primary">
              Request a new link
            </ButtonLink>
            <TextLink to={paths.auth.signIn.getHref()}>Back to sign in</TextLink>
          </div>
        }
      />
    </AuthCard>
  );
}
