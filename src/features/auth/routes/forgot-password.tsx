import { Link } from 'react-router-dom';
import { useSession } from '../api/get-session';
import { AuthPanel } from '../components/auth-panel';
import { ForgotPasswordForm } from '../components/forgot-password-form';

export function Component() {
  const { mailCapture } = useSession();
  return (
    <AuthPanel
      title="Forgotten password"
      description="Enter the e-mail address of your account and we will send a link to choose a new password."
    >
      <ForgotPasswordForm mailCapture={mailCapture} />
      <p className="mt-8 border-t border-rule pt-4 text-sm text-ink-muted">
        Remembered it? <Link to="/sign-in">Sign in</Link>.
      </p>
    </AuthPanel>
  );
}
