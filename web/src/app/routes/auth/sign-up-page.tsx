import { Alert, Button, Spin } from 'antd';
import { useEffect, useRef } from 'react';
import { Link, useNavigate, useSearchParams } from 'react-router-dom';
import { paths } from '@/config/paths';
import { useConfirmSignUp } from '@/features/auth/api/confirm-sign-up';
import { useCurrentUser } from '@/features/auth/api/get-current-user';
import { SignUpForm } from '@/features/auth/components/sign-up-form';
import { getErrorMessage } from '@/lib/api-error';
import { RedirectIfSignedIn } from '../../guards';
import { AuthHeading } from './auth-heading';

/** With `?token=` from the e-mailed link: create the shop and sign in. */
function FinishSignUp({ token }: { token: string }) {
  const navigate = useNavigate();
  const confirm = useConfirmSignUp({ onSuccess: () => navigate(paths.home, { replace: true }) });
  const { data: user } = useCurrentUser();
  const sent = useRef(false);
  useEffect(() => {
    if (sent.current) return;
    sent.current = true;
    confirm.mutate(token);
  }, [confirm, token]);

  if (confirm.isError && user) {
    // The link was used already (most often by this very person): they are in, so the way on is home.
    return (
      <>
        <AuthHeading title="You are already signed in" subtitle={`as ${user.name}, in ${user.shop.name}.`} />
        <Alert type="info" showIcon title="This sign-up link has been used. Your shop is ready; carry on from your home page." />
        <Button type="primary" block style={{ marginTop: 16 }} onClick={() => navigate(paths.home, { replace: true })}>
          Go to my home page
        </Button>
      </>
    );
  }
  if (confirm.isError) {
    return (
      <>
        <AuthHeading title="Create your shop" />
        <Alert type="error" showIcon role="alert" title={getErrorMessage(confirm.error)} />
        <p style={{ marginTop: 16, textAlign: 'center', marginBottom: 0 }}>
          <Link to={paths.signUp}>Sign up again</Link> or <Link to={paths.signIn}>sign in</Link>
        </p>
      </>
    );
  }
  return (
    <>
      <AuthHeading title="Creating your shop" />
      <Spin aria-label="Creating your shop" />
    </>
  );
}

export function SignUpPage() {
  const navigate = useNavigate();
  const [params] = useSearchParams();
  const token = params.get('token');
  if (token) return <FinishSignUp token={token} />;
  return (
    <RedirectIfSignedIn>
      <AuthHeading title="Create your shop" subtitle="You will be its owner and can invite your crew later. We e-mail you a link to finish." />
      <SignUpForm onBack={() => navigate(paths.signIn)} />
      <p style={{ marginTop: 16, textAlign: 'center', marginBottom: 0 }}>
        Already have an account? <Link to={paths.signIn}>Sign in</Link>
      </p>
    </RedirectIfSignedIn>
  );
}
