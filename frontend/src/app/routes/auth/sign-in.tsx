import { useNavigate, useSearchParams } from 'react-router-dom';
import { safeNextPath } from '@/config/paths';
import { AuthCard } from '@/components/layouts/auth-layout';
import { SignInForm } from '@/features/auth/components/sign-in-form';

export function SignInPage() {
  const [params] = useSearchParams();
  const navigate = useNavigate();
  const next = safeNextPath(params.get('next'));

  return (
    <AuthCard title="Sign in" description="Use the e-mail address your administrator invited.">
      <SignInForm onSignedIn={() => void navigate(next, { replace: true })} />
    </AuthCard>
  );
}
