import { Link, useSearchParams } from 'react-router-dom';
import { Alert } from '@/components/alert';
import { AuthPanel } from '../components/auth-panel';
import { ResetPasswordForm } from '../components/reset-password-form';

export function Component() {
  const [params] = useSearchParams();
  const token = params.get('token')?.trim() ?? '';
  return (
    <AuthPanel title="Choose a new password">
      {token ? (
        <ResetPasswordForm token={token} />
      ) : (
        <Alert tone="danger" title="Link incomplete">
          <p>
            This page needs the full link from your e-mail. <Link to="/forgot-password">Ask for a new link</Link> if
            you no longer have it.
          </p>
        </Alert>
      )}
    </AuthPanel>
  );
}
