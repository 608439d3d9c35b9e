import { Card, Typography } from 'antd';
import { PageHeader } from '@/components/page-header';
import { EmptyState } from '@/components/query-state';
import { useSignedInUser } from '@/features/auth/api/get-current-user';
import { greeting } from './greeting';

export function CounterHome() {
  const user = useSignedInUser();
  return (
    <>
      <PageHeader eyebrow={user.shop.name} title={greeting(user.name)} subtitle="Matched parts lists, stock and pick lists." />
      <Card data-testid="counter-placeholder">
        <EmptyState
          description={
            <>
              <Typography.Title level={4} style={{ marginTop: 0 }}>
                The parts counter arrives with the catalog
              </Typography.Title>
              <Typography.Text type="secondary">
                Once the shop catalog is in, approved parts plans show up here with stock on hand and bin locations,
                ready to reserve and pick.
              </Typography.Text>
            </>
          }
        />
      </Card>
    </>
  );
}
