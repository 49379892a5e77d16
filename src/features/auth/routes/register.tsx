import { Link, Navigate, useNavigate, useSearchParams } from 'react-router-dom';
import { PageSpinner } from '@/components/spinner';
import { safeReturnPath } from '@/lib/safe-redirect';
import { useSession } from '../api/get-session';
import { AuthPanel } from '../components/auth-panel';
import { RegisterForm } from '../components/register-form';

export function Component() {
  const [params] = useSearchParams();
  const navigate = useNavigate();
  const session = useSession();
  const next = safeReturnPath(params.get('next'), '/account');

  if (session.isPending) return <PageSpinner />;
  if (session.user) return <Navigate to={next} replace />;

  return (
    <AuthPanel
      title="Create an account"
      description="A free account lets you keep programmes. Researchers can then be given the contributor role to add sources."
    >
      <RegisterForm onSuccess={() => navigate(next, { replace: true })} />
      <p className="mt-8 border-t border-rule pt-4 text-sm text-ink-muted">
        Already registered? <Link to="/sign-in">Sign in</Link>.
      </p>
    </AuthPanel>
  );
}
