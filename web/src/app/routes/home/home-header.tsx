import { Button } from 'antd';
import { useNavigate } from 'react-router-dom';
import { paths } from '@/config/paths';
import { PageHeader } from '@/components/page-header';
import { useSignedInUser } from '@/features/auth/api/get-current-user';
import { greeting } from './greeting';

/** The owner's greeting over the shop's name, with the way to start a project. */
export function HomeHeader({ subtitle }: { subtitle: string }) {
  const user = useSignedInUser();
  const navigate = useNavigate();
  return (
    <PageHeader
      eyebrow={user.shop.name}
      title={greeting(user.name)}
      subtitle={subtitle}
      extra={
        <Button type="primary" onClick={() => navigate(`${paths.projects}?new=1`)}>
          New project
        </Button>
      }
    />
  );
}
