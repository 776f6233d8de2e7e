import { useState, type ReactNode } from 'react';
import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { tokenPasswordSchema, type TokenPasswordInput } from '@shared/schemas/auth.schema';
import { isApiError } from '@/lib/api-client';
import { applyServerError } from '@/lib/form-errors';
import { Alert } from '@/components/ui/alert';
import { Button } from '@/components/ui/button';
import { PasswordField } from '@/components/ui/field';
import { NEW_PASSWORD_HINT } from './password-hint';

interface NewPasswordFormProps {
  token: string;
  /** Sends the token and password; rejects with the server's error. */
  onSubmit: (input: TokenPasswordInput) => Promise<void>;
  submitLabel: string;
  /** Shown in place of the form once the password is set. */
  done: ReactNode;
  /** Shown when the link has expired or has been used. */
  invalidToken: ReactNode;
  ariaLabel: string;
}

/** Choose a password from an e-mailed link: a password reset or an invitation. */
export function NewPasswordForm({ token, onSubmit, submitLabel, done, invalidToken, ariaLabel }: NewPasswordFormProps) {
  const [state, setState] = useState<'form' | 'done' | 'invalid-token'>('form');
  const {
    register,
    handleSubmit,
    setError,
    formState: { errors, isSubmitting },
  } = useForm({
    resolver: zodResolver(tokenPasswordSchema),
    mode: 'onTouched',
    defaultValues: { token, password: '' },
  });

  if (state === 'done') return <>{done}</>;
  if (state === 'invalid-token') return <>{invalidToken}</>;

  const submit = handleSubmit(async (values) => {
    try {
      await onSubmit(values);
      setState('done');
    } catch (error) {
      if (isApiError(error) && error.code === 'invalid_token') setState('invalid-token');
      else applyServerError(error, setError, ['password']);
    }
  });

  const linkProblem = errors.token?.message;

  return (
    <form onSubmit={submit} noValidate className="flex flex-col gap-5" aria-label={ariaLabel}>
      {errors.root?.server ? <Alert tone="danger">{errors.root.server.message}</Alert> : null}
      {linkProblem ? (
        <Alert tone="danger" title={linkProblem}>
          Open the link from the e-mail again, or copy the whole address into the browser.
        </Alert>
      ) : null}
      <input type="hidden" {...register('token')} />
      <PasswordField label="New password" hint={NEW_PASSWORD_HINT} autoComplete="new-password" error={errors.password?.message} {...register('password')} />
      <Button type="submit" size="lg" loading={isSubmitting} className="w-full">
        {submitLabel}
      </Button>
    </form>
  );
}
