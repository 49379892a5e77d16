import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { Link } from 'react-router-dom';
import { loginSchema, type LoginInput, type PublicUser } from '@shared/schemas/auth';
import { Button } from '@/components/button';
import { FormError } from '@/components/form-error';
import { TextField } from '@/components/text-field';
import { ApiError } from '@/lib/api';
import { applyServerFieldErrors } from '@/lib/form-errors';
import { useLogin } from '../api/login';
import { PasswordField } from './password-field';

function signInProblem(error: unknown): string | undefined {
  if (!(error instanceof ApiError)) return undefined;
  if (error.status === 401) return 'That e-mail address and password do not match an account.';
  if (error.status === 429) {
    const wait = error.retryAfter ? ` Try again in about ${Math.ceil(error.retryAfter / 60)} minute(s).` : ' Wait a few minutes and try again.';
    return `Too many sign-in attempts.${wait}`;
  }
  return undefined;
}

export function SignInForm({ onSuccess }: { onSuccess: (user: PublicUser) => void }) {
  const login = useLogin();
  const {
    register,
    handleSubmit,
    setError,
    formState: { errors },
  } = useForm<LoginInput>({ resolver: zodResolver(loginSchema), defaultValues: { email: '', password: '' } });

  const onSubmit = handleSubmit((values) =>
    login.mutate(values, {
      onSuccess: (result) => onSuccess(result.user),
      onError: (error) => applyServerFieldErrors(error, setError, ['email', 'password']),
    }),
  );
  const problem = signInProblem(login.error);

  return (
    <form noValidate onSubmit={onSubmit} className="space-y-5" aria-label="Sign in">
      <FormError title="Not signed in" error={login.error} message={problem} />
      <TextField
        label="E-mail address"
        type="email"
        autoComplete="email"
        error={errors.email?.message}
        {...register('email')}
      />
      <PasswordField
        label="Password"
        autoComplete="current-password"
        error={errors.password?.message}
        {...register('password')}
      />
      <div className="flex flex-wrap items-center justify-between gap-3">
        <Button type="submit" loading={login.isPending}>
          Sign in
        </Button>
        <Link to="/forgot-password" className="text-sm">
          Forgotten your password?
        </Link>
      </div>
    </form>
  );
}
