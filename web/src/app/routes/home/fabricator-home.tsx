import { Alert, Card, Col, Row } from 'antd';
import { Link } from 'react-router-dom';
import { paths, toProjectMeasurements } from '@/config/paths';
import { PageHeader } from '@/components/page-header';
import { useSignedInUser } from '@/features/auth/api/get-current-user';
import { ProjectsPanel } from '@/features/projects/components/projects-panel';
import { greeting } from './greeting';

export function FabricatorHome() {
  const user = useSignedInUser();
  return (
    <>
      <PageHeader eyebrow={user.shop.name} title={greeting(user.name)} subtitle="Chassis waiting for the tape and the camera." />
      <Row gutter={[16, 16]}>
        <Col xs={24} xl={16}>
          <Card title="Waiting to be measured" extra={<Link to={`${paths.projects}?status=intake`}>All</Link>} style={{ marginBottom: 16 }}>
            <ProjectsPanel
              label="Projects waiting to be measured"
              status="intake"
              limit={10}
              emptyText="No chassis is waiting to be measured."
              moreTo={`${paths.projects}?status=intake`}
              rowLink={{ label: 'Open sheet', to: toProjectMeasurements }}
            />
          </Card>
          <Card title="Ready for the bay" extra={<Link to={paths.workOrders}>Work orders</Link>} style={{ marginBottom: 16 }}>
            <ProjectsPanel label="Projects ready for the bay" status="deposit-paid" limit={10} emptyText="No paid job is waiting for the bay." moreTo={`${paths.projects}?status=deposit-paid`} />
          </Card>
          <Card title="In the bay" extra={<Link to={`${paths.projects}?status=in-the-bay`}>All</Link>}>
            <ProjectsPanel label="Projects in the bay" status="in-the-bay" limit={10} emptyText="No job in the bay." moreTo={`${paths.projects}?status=in-the-bay`} />
          </Card>
        </Col>
        <Col xs={24} xl={8}>
          <Alert
            type="warning"
            showIcon
            title="Before you get under a vehicle"
            description="Use rated jack stands on solid ground, chock the wheels and never work under a vehicle held only by a jack. Measure at ride height as the sheet asks."
          />
        </Col>
      </Row>
    </>
  );
}
