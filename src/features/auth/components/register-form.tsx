import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { passwordLimits, registerSchema, type PublicUser, type RegisterInput } from '@shared/schemas/auth';
import { Button } from '@/components/button';
import { FormError } from '@/components/form-error';
import { TextField } from '@/components/text-field';
import { applyServerFieldErrors } from '@/lib/form-errors';
import { useRegister } from '../api/register';
import { PasswordField } from './password-field';

const fieldLabels = { email: 'E-mail address', displayName: 'Name', password: 'Password' };

export function RegisterForm({ onSuccess }: { onSuccess: (user: PublicUser) => void }) {
  const registration = useRegister();
  const {
    register,
    handleSubmit,
    setError,
    formState: { errors },
  } = useForm<RegisterInput>({
    resolver: zodResolver(registerSchema),
    defaultValues: { email: '', displayName: '', password: '' },
  });

  const onSubmit = handleSubmit((values) =>
    registration.mutate(values, {
      onSuccess: (result) => onSuccess(result.user),
      onError: (error) => applyServerFieldErrors(error, setError, ['email', 'displayName', 'password']),
    }),
  );

  return (
    <form noValidate onSubmit={onSubmit} className="space-y-5" aria-label="Register">
      <FormError title="Your account was not created" error={registration.error} fieldLabels={fieldLabels} />
      <TextField
        label={fieldLabels.displayName}
        hint="As it should appear when your transcriptions and translations are credited."
        autoComplete="name"
        error={errors.displayName?.message}
        {...register('displayName')}
      />
      <TextField
        label={fieldLabels.email}
        type="email"
        autoComplete="email"
        error={errors.email?.message}
        {...register('email')}
      />
      <PasswordField
        label={fieldLabels.password}
        hint={`At least ${passwordLimits.min} characters. A phrase of several words is easier to remember.`}
        autoComplete="new-password"
        error={errors.password?.message}
        {...register('password')}
      />
      <Button type="submit" loading={registration.isPending}>
        Create account
      </Button>
    </form>
  );
}
