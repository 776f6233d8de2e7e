import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { setupSchema } from '@shared/schemas/auth.schema';
import { applyServerError } from '@/lib/form-errors';
import { Alert } from '@/components/ui/alert';
import { Button } from '@/components/ui/button';
import { PasswordField, TextField } from '@/components/ui/field';
import { useSetUp } from '../api/set-up';
import { NEW_PASSWORD_HINT } from './password-hint';

const FIELDS = ['token', 'email', 'name', 'password'] as const;

/** Creates the first administrator of a new production installation. */
export function SetupForm({ token, onDone }: { token: string; onDone: () => void }) {
  const {
    register,
    handleSubmit,
    setError,
    formState: { errors },
  } = useForm({
    resolver: zodResolver(setupSchema),
    mode: 'onTouched',
    defaultValues: { token, email: '', name: '', password: '' },
  });
  const setUp = useSetUp();

  const onSubmit = handleSubmit((values) =>
    setUp.mutate(values, { onSuccess: onDone, onError: (error) => applyServerError(error, setError, FIELDS) }),
  );

  return (
    <form onSubmit={onSubmit} noValidate className="flex flex-col gap-5" aria-label="Set up Ferrule">
      {errors.root?.server ? <Alert tone="danger">{errors.root.server.message}</Alert> : null}
      <TextField
        label="Set-up token"
        hint="The one-time token from the server's start-up log. It is filled in when you open the set-up link."
        autoComplete="off"
        autoCapitalize="off"
        spellCheck={false}
        error={errors.token?.message}
        {...register('token')}
      />
      <TextField label="Your name" autoComplete="name" error={errors.name?.message} {...register('name')} />
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
      <PasswordField label="Password" hint={NEW_PASSWORD_HINT} autoComplete="new-password" error={errors.password?.message} {...register('password')} />
      <Button type="submit" size="lg" loading={setUp.isPending} className="w-full">
        Create administrator
      </Button>
    </form>
  );
}
