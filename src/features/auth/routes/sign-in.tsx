import { Link, Navigate, useNavigate, useSearchParams } from 'react-router-dom';
import { PageSpinner } from '@/components/spinner';
import { safeReturnPath } from '@/lib/safe-redirect';
import { useSession } from '../api/get-session';
import { AuthPanel } from '../components/auth-panel';
import { SignInForm } from '../components/sign-in-form';

export function Component() {
  const [params] = useSearchParams();
  const navigate = useNavigate();
  const session = useSession();
  const next = safeReturnPath(params.get('next'));
  const registerLink = params.get('next') ? `/register?next=${encodeURIComponent(next)}` : '/register';

  if (session.isPending) return <PageSpinner />;
  if (session.user) return <Navigate to={next} replace />;

  return (
    <AuthPanel title="Sign in" description="Sign in to keep programmes, contribute sources and review submissions.">
      <SignInForm onSuccess={() => navigate(next, { replace: true })} />
      <p className="mt-8 border-t border-rule pt-4 text-sm text-ink-muted">
        New to Windway? <Link to={registerLink}>Create an account</Link>.
      </p>
    </AuthPanel>
  );
}
