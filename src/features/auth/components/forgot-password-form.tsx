import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { passwordResetRequestSchema, type PasswordResetRequestInput } from '@shared/schemas/auth';
import { Alert } from '@/components/alert';
import { Button } from '@/components/button';
import { FormError } from '@/components/form-error';
import { TextField } from '@/components/text-field';
import { useRequestPasswordReset } from '../api/request-password-reset';

export function ForgotPasswordForm({ mailCapture = false }: { mailCapture?: boolean }) {
  const request = useRequestPasswordReset();
  const {
    register,
    handleSubmit,
    getValues,
    formState: { errors },
  } = useForm<PasswordResetRequestInput>({
    resolver: zodResolver(passwordResetRequestSchema),
    defaultValues: { email: '' },
  });

  if (request.isSuccess) {
    return (
      <Alert tone="success" title="Check your e-mail">
        <p>
          If <strong>{getValues('email')}</strong> belongs to an account, a link to choose a new password is on its
          way. The link works for a limited time.
        </p>
        {mailCapture && (
          <p className="mt-2">
            This installation keeps outgoing mail instead of sending it; an admin can read it under Admin → Outbox.
          </p>
        )}
      </Alert>
    );
  }

  return (
    <form noValidate onSubmit={handleSubmit((values) => request.mutate(values))} className="space-y-5" aria-label="Request a password reset">
      <FormError title="The link was not sent" error={request.error} />
      <TextField
        label="E-mail address"
        type="email"
        autoComplete="email"
        error={errors.email?.message}
        {...register('email')}
      />
      <Button type="submit" loading={request.isPending}>
        Send reset link
      </Button>
    </form>
  );
}
