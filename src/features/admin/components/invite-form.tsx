import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { roles } from '@shared/schemas/auth';
import { inviteUserSchema, type InviteUserInput } from '@shared/schemas/users';
import { Button } from '@/components/button';
import { Select } from '@/components/select';
import { TextField } from '@/components/text-field';
import { FormError } from '@/components/form-error';
import { applyServerFieldErrors } from '@/lib/form-errors';
import { roleLabels } from '@/lib/roles';
import { useInviteUser } from '../api/invite-user';

/** Invite a researcher or editor by e-mail, with the role they will have. */
export function InviteForm() {
  const invite = useInviteUser();
  const [sentTo, setSentTo] = useState('');
  const form = useForm<InviteUserInput>({ resolver: zodResolver(inviteUserSchema), defaultValues: { email: '', displayName: '', role: 'contributor' } });
  const { errors } = form.formState;

  const onSubmit = form.handleSubmit((values) => {
    setSentTo('');
    invite.mutate(values, {
      onSuccess: () => {
        setSentTo(values.email);
        form.reset({ email: '', displayName: '', role: values.role });
      },
      onError: (error) => applyServerFieldErrors(error, form.setError, ['email', 'displayName', 'role']),
    });
  });

  return (
    <form onSubmit={onSubmit} noValidate className="space-y-3" aria-labelledby="invite-heading">
      <h2 id="invite-heading" className="font-serif text-xl font-medium">
        Invite someone
      </h2>
      {invite.isError && <FormError error={invite.error} title="The invitation was not sent" />}
      <div className="grid gap-3 sm:grid-cols-[1fr_1fr_12rem_auto] sm:items-end">
        <TextField label="E-mail" type="email" autoComplete="off" error={errors.email?.message} {...form.register('email')} />
        <TextField label="Name as credited" error={errors.displayName?.message} {...form.register('displayName')} />
        <Select label="Role" error={errors.role?.message} options={roles.map((r) => ({ value: r, label: roleLabels[r] }))} {...form.register('role')} />
        <Button type="submit" loading={invite.isPending}>
          Send invitation
        </Button>
      </div>
      <p aria-live="polite" className="min-h-6 text-sm text-accent-strong">
        {sentTo && `✓ An invitation is on its way to ${sentTo}; the link lets them choose a password within seven days.`}
      </p>
    </form>
  );
}
