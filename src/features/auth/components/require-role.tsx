import type { ReactNode } from 'react';
import { Navigate, Outlet, useLocation } from 'react-router-dom';
import type { Role } from '@shared/schemas/auth';
import { Alert } from '@/components/alert';
import { Button } from '@/components/button';
import { PageSpinner } from '@/components/spinner';
import { errorMessage } from '@/lib/api';
import { signInPath } from '@/lib/safe-redirect';
import { hasRole, useSession } from '../api/get-session';
import { NotAllowed } from './not-allowed';

export interface RequireRoleProps {
  /** Roles that may see the page; leave out to admit any signed-in user. */
  roles?: readonly Role[];
  /** Section name for the "not allowed" page, e.g. "Review". */
  section?: string;
  /** What to guard; defaults to the child routes (<Outlet />). */
  children?: ReactNode;
}

/**
 * Route guard. Anonymous visitors go to sign-in with a return path;
 * signed-in people with another role see a clear "not allowed" page.
 * The server enforces the same rules; this only spares a useless page.
 */
export function RequireRole({ roles, section, children }: RequireRoleProps) {
  const session = useSession();
  const location = useLocation();

  if (session.isPending) return <PageSpinner label="Checking your account…" />;
  if (session.isError) {
    return (
      <Alert
        tone="danger"
        title="Your account could not be checked"
        action={
          <Button variant="secondary" onClick={() => void session.refetch()}>
            Try again
          </Button>
        }
      >
        {errorMessage(session.error)}
      </Alert>
    );
  }
  if (!session.user) {
    return <Navigate to={signInPath(location.pathname + location.search + location.hash)} replace />;
  }
  if (roles && !hasRole(session.user.role, roles)) {
    return <NotAllowed role={session.user.role} allowed={roles} section={section} />;
  }
  return <>{children ?? <Outlet />}</>;
}
