import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { resetRequestSchema } from '@shared/schemas/auth.schema';
import { paths } from '@/config/paths';
import { applyServerError } from '@/lib/form-errors';
import { Alert } from '@/components/ui/alert';
import { Button, TextLink } from '@/components/ui/button';
import { TextField } from '@/components/ui/field';
import { useRequestPasswordReset } from '../api/request-password-reset';

export function ResetRequestForm() {
  const {
    register,
    handleSubmit,
    setError,
    formState: { errors },
  } = useForm({ resolver: zodResolver(resetRequestSchema), mode: 'onTouched', defaultValues: { email: '' } });
  const request = useRequestPasswordReset();

  if (request.isSuccess) {
    return (
      <div className="flex flex-col gap-5">
        <Alert tone="success" title="Check your e-mail">
          {request.data.message}
        </Alert>
        <TextLink to={paths.auth.signIn.getHref()}>Back to sign in</TextLink>
      </div>
    );
  }

  const onSubmit = handleSubmit((values) => request.mutate(values, { onError: (error) => applyServerError(error, setError, ['email']) }));

  return (
    <form onSubmit={onSubmit} noValidate className="flex flex-col gap-5" aria-label="Request a password reset">
      {errors.root?.server ? <Alert tone="danger">{errors.root.server.message}</Alert> : null}
      <TextField
        label="E-mail"
        hint="The address you sign in with. If it has an account, a link to set a new password is sent to it."
        type="email"
        autoComplete="email"
        inputMode="email"
        autoCapitalize="off"
        spellCheck={false}
        error={errors.email?.message}
        {...register('email')}
      />
      <Button type="submit" size="lg" loading={request.isPending} className="w-full">
        Send reset link
      </Button>
      <TextLink to={paths.auth.signIn.getHref()} className="self-start">
        Back to sign in
      </TextLink>
    </form>
  );
}
