import { Divider } from 'antd';
import { Link, useNavigate, useSearchParams } from 'react-router-dom';
import { paths } from '@/config/paths';
import { SignInForm } from '@/features/auth/components/sign-in-form';
import { RedirectIfSignedIn } from '../../guards';
import { AuthHeading } from './auth-heading';
import { safeNext } from './safe-next';

export function SignInPage() {
  const navigate = useNavigate();
  const [params] = useSearchParams();
  const next = safeNext(params.get('next'));
  return (
    <RedirectIfSignedIn>
      <AuthHeading title="Sign in" subtitle="Welcome back to the shop." />
      <SignInForm onSignedIn={() => navigate(next, { replace: true })} />
      <p style={{ marginTop: 12, textAlign: 'center' }}>
        <Link to={paths.resetPassword}>Forgot your password?</Link>
      </p>
      <Divider plain>New here?</Divider>
      <p style={{ textAlign: 'center', margin: 0 }}>
        <Link to={paths.signUp}>Set up your shop or garage</Link> — free for one person building their own truck.
      </p>
    </RedirectIfSignedIn>
  );
}
