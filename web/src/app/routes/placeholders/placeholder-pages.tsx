import { Card, Typography } from 'antd';
import { PageHeader } from '@/components/page-header';
import { EmptyState } from '@/components/query-state';

type PlaceholderProps = { title: string; subtitle: string; heading: string; body: string; testId: string };

function Placeholder({ title, subtitle, heading, body, testId }: PlaceholderProps) {
  return (
    <>
      <PageHeader title={title} subtitle={subtitle} />
      <Card data-testid={testId}>
        <EmptyState
          description={
            <>
              <Typography.Title level={4} style={{ marginTop: 0 }}>
                {heading}
              </Typography.Title>
              <Typography.Text type="secondary">{body}</Typography.Text>
            </>
          }
        />
      </Card>
    </>
  );
}

export function WorkOrdersPage() {
  return (
    <Placeholder
      testId="work-orders-placeholder"
      title="Work orders"
      subtitle="Operations in order, torque specs and the checks to record."
      heading="Work orders open when a quote is approved"
      body="Each approved swap will get its operations in order with tightening sequences and sign-off checks."
    />
  );
}

export function CatalogPage() {
  return (
    <Placeholder
      testId="catalog-placeholder"
      title="Catalog"
      subtitle="The shop’s own chassis, engines, transmissions and parts."
      heading="The shop catalog is on its way"
      body="You will enter items here or import a supplier list from CSV."
    />
  );
}
