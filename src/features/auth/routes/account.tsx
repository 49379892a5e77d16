import { Alert } from '@/components/alert';
import { Button } from '@/components/button';
import { Card } from '@/components/card';
import { FormError } from '@/components/form-error';
import { PageHeader } from '@/components/page-header';
import { formatDate } from '@/lib/format';
import { roleDescriptions, roleLabels } from '@/lib/roles';
import { useLogout } from '../api/logout';
import { useSession } from '../api/get-session';

/** Rendered inside <RequireRole>, so a user is present. */
export function Component() {
  const { user } = useSession();
  const logout = useLogout();
  if (!user) return null;

  return (
    <div className="mx-auto max-w-reading">
      <PageHeader eyebrow="Account" title={user.displayName} description="Your details as Windway holds them." />
      <div className="space-y-6">
        {!user.emailVerifiedAt && (
          <Alert tone="caution" title="E-mail address not yet confirmed">
            Follow the link in the message we sent to {user.email}.
          </Alert>
        )}
        <Card title="Profile">
          <dl className="grid grid-cols-1 gap-x-6 gap-y-3 sm:grid-cols-[10rem_1fr]">
            <dt className="text-sm font-medium text-ink-muted">Name</dt>
            <dd>{user.displayName}</dd>
            <dt className="text-sm font-medium text-ink-muted">E-mail address</dt>
            <dd className="break-all">
              {user.email}{' '}
              <span className="text-sm text-ink-muted">
                {user.emailVerifiedAt ? `(confirmed ${formatDate(user.emailVerifiedAt)})` : '(not confirmed)'}
              </span>
            </dd>
            <dt className="text-sm font-medium text-ink-muted">Member since</dt>
            <dd className="figures">{formatDate(user.createdAt)}</dd>
          </dl>
        </Card>
        <Card title="Role">
          <p>
            <span className="label-caps rounded-soft border border-accent px-2 py-0.5 text-accent-strong">
              {roleLabels[user.role]}
            </span>
          </p>
          <p className="mt-3 text-ink-muted">{roleDescriptions[user.role]}</p>
          {user.role === 'reader' && (
            <p className="mt-3 text-sm text-ink-muted">
              To contribute sources, ask an admin of this installation for the contributor role.
            </p>
          )}
        </Card>
        <FormError title="Not signed out" error={logout.error} />
        <Button
          variant="secondary"
          loading={logout.isPending}
          onClick={() => logout.mutate()}
        >
          Sign out
        </Button>
      </div>
    </div>
  );
}
