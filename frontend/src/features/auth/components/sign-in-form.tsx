import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { signInSchema, type MeDto } from '@shared/schemas/auth.schema';
import { paths } from '@/config/paths';
import { applyServerError } from '@/lib/form-errors';
import { Alert } from '@/components/ui/alert';
import { Button, TextLink } from '@/components/ui/button';
import { PasswordField, TextField } from '@/components/ui/field';
import { useSignIn } from '../api/sign-in';

export function SignInForm({ onSignedIn }: { onSignedIn: (me: MeDto) => void }) {
  const {
    register,
    handleSubmit,
    setError,
    formState: { errors },
  } = useForm({
    resolver: zodResolver(signInSchema),
    mode: 'onTouched',
    defaultValues: { email: '', password: '' },
  });
  const signIn = useSignIn({ onSuccess: onSignedIn });

  const onSubmit = handleSubmit((values) =>
    signIn.mutate(values, { onError: (error) => applyServerError(error, setError, ['email', 'password']) }),
  );

  return (
    <form onSubmit={onSubmit} noValidate className="flex flex-col gap-5" aria-label="Sign in">
      {errors.root?.server ? <Alert tone="danger">{errors.root.server.message}</Alert> : null}
      <TextField
        label="E-mail"
        type="email"
        autoComplete="username"
        inputMode="email"
        autoCapitalize="off"
        spellCheck={false}
        error={errors.email?.message}
        {...register('email')}
      />
      <PasswordField label="Password" autoComplete="current-password" error={errors.password?.message} {...register('password')} />
      <Button type="submit" size="lg" loading={signIn.isPending} className="w-full">
        Sign in
      </Button>
      <TextLink to={paths.auth.forgotPassword.getHref()} className="self-start">
        Forgot password?
      </TextLink>
    </form>
  );
}
