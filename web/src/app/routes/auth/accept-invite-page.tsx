import { Button, Result } from 'antd';
import { useNavigate, useSearchParams } from 'react-router-dom';
import { paths } from '@/config/paths';
import { AcceptInviteForm } from '@/features/auth/components/accept-invite-form';
import { AuthHeading } from './auth-heading';

export function AcceptInvitePage() {
  const [params] = useSearchParams();
  const navigate = useNavigate();
  const token = params.get('token');

  if (!token) {
    return (
      <Result
        status="warning"
        title="This invitation link is incomplete"
        subTitle="Open the link from the invitation email again, or ask the shop owner to send a new one."
        extra={<Button onClick={() => navigate(paths.signIn)}>Go to sign in</Button>}
      />
    );
  }
  return (
    <>
      <AuthHeading title="Join the shop" subtitle="Pick your name and a password to accept the invitation." />
      <AcceptInviteForm token={token} onAccepted={() => navigate(paths.home, { replace: true })} />
    </>
  );
}
