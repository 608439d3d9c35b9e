import { Button, Result } from 'antd';
import { useNavigate } from 'react-router-dom';
import { paths } from '@/config/paths';

export function Forbidden() {
  const navigate = useNavigate();
  return (
    <Result
      status="403"
      title="Not part of your role"
      subTitle="Ask the shop owner if you need this page."
      extra={
        <Button type="primary" onClick={() => navigate(paths.home)}>
          Go to home
        </Button>
      }
      data-testid="forbidden"
    />
  );
}
