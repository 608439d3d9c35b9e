import { Link, useNavigate, useSearchParams } from 'react-router-dom';
import { paths } from '@/config/paths';
import { ResetConfirmForm } from '@/features/auth/components/reset-confirm-form';
import { ResetRequestForm } from '@/features/auth/components/reset-request-form';
import { AuthHeading } from './auth-heading';

/** Without a token: ask for a link. With `?token=` from the mail: set the new password. */
export function ResetPasswordPage() {
  const [params] = useSearchParams();
  const navigate = useNavigate();
  const token = params.get('token');

  if (token) {
    return (
      <>
        <AuthHeading title="Set a new password" />
        <ResetConfirmForm
          token={token}
          onDone={() => navigate(paths.signIn, { replace: true })}
          onRequestNew={() => navigate(paths.resetPassword, { replace: true })}
        />
      </>
    );
  }
  return (
    <>
      <AuthHeading title="Reset your password" />
      <ResetRequestForm onBack={() => navigate(paths.signIn)} />
      <p style={{ marginTop: 16, textAlign: 'center', marginBottom: 0 }}>
        <Link to={paths.signIn}>Back to sign in</Link>
      </p>
    </>
  );
}
