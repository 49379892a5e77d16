import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { Link } from 'react-router-dom';
import { passwordLimits, passwordResetConfirmSchema, type PasswordResetConfirmInput } from '@shared/schemas/auth';
import { Alert } from '@/components/alert';
import { Button } from '@/components/button';
import { FormError } from '@/components/form-error';
import { ApiError } from '@/lib/api';
import { applyServerFieldErrors } from '@/lib/form-errors';
import { useConfirmPasswordReset } from '../api/confirm-password-reset';
import { PasswordField } from './password-field';

export function ResetPasswordForm({ token }: { token: string }) {
  const confirm = useConfirmPasswordReset();
  const {
    register,
    handleSubmit,
    setError,
    formState: { errors },
  } = useForm<PasswordResetConfirmInput>({
    resolver: zodResolver(passwordResetConfirmSchema),
    defaultValues: { token, password: '' },
  });

  if (confirm.isSuccess) {
    return (
      <Alert tone="success" title="Password changed">
        <p>
          You can now <Link to="/sign-in">sign in</Link> with your new password.
        </p>
      </Alert>
    );
  }

  const tokenProblem =
    errors.token?.message ??
    (confirm.error instanceof ApiError && (confirm.error.fields?.token || confirm.error.status === 404 || confirm.error.status === 410)
      ? 'This reset link has expired or was already used.'
      : undefined);

  return (
    <form
      noValidate
      className="space-y-5"
      aria-label="Choose a new password"
      onSubmit={handleSubmit((values) =>
        confirm.mutate(values, { onError: (error) => applyServerFieldErrors(error, setError, ['password']) }),
      )}
    >
      {tokenProblem ? (
        <Alert tone="danger" title="Link not valid">
          <p>
            {tokenProblem} <Link to="/forgot-password">Ask for a new link</Link>.
          </p>
        </Alert>
      ) : (
        <FormError title="Your password was not changed" error={confirm.error} />
      )}
      <input type="hidden" {...register('token')} />
      <PasswordField
        label="New password"
        hint={`At least ${passwordLimits.min} characters. A phrase of several words is easier to remember.`}
        autoComplete="new-password"
        error={errors.password?.message}
        {...register('password')}
      />
      <Button type="submit" loading={confirm.isPending}>
        Save new password
      </Button>
    </form>
  );
}
