import { AuthCard } from '@/components/layouts/auth-layout';
import { ResetRequestForm } from '@/features/auth/components/reset-request-form';

export function ForgotPasswordPage() {
  return (
    <AuthCard title="Reset your password" description="We will e-mail you a link to choose a new password. The link works once and for a short time.">
      <ResetRequestForm />
    </AuthCard>
  );
}
