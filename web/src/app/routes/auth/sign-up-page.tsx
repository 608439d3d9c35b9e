import { Typography } from 'antd';
import { Link, useNavigate } from 'react-router-dom';
import { paths } from '@/config/paths';
import { SignUpForm } from '@/features/auth/components/sign-up-form';
import { RedirectIfSignedIn } from '../../guards';
import { AuthHeading } from './auth-heading';

export function SignUpPage() {
  const navigate = useNavigate();
  return (
    <RedirectIfSignedIn>
      <AuthHeading title="Create your shop" subtitle="You will be its owner and can invite your crew later." />
      <SignUpForm onSignedUp={() => navigate(paths.home, { replace: true })} />
      <Typography.Paragraph style={{ marginTop: 16, textAlign: 'center', marginBottom: 0 }}>
        Already have an account? <Link to={paths.signIn}>Sign in</Link>
      </Typography.Paragraph>
    </RedirectIfSignedIn>
  );
}
