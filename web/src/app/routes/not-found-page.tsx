import { Button, Result } from 'antd';
import { useNavigate } from 'react-router-dom';
import { paths } from '@/config/paths';

export function NotFoundPage() {
  const navigate = useNavigate();
  return (
    <Result
      status="404"
      title="No such page"
      subTitle="The address may be mistyped, or the page moved."
      extra={
        <Button type="primary" onClick={() => navigate(paths.home)}>
          Go to home
        </Button>
      }
    />
  );
}
