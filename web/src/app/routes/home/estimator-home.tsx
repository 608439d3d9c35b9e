import { Button, Card, Col, Row } from 'antd';
import { Link, useNavigate } from 'react-router-dom';
import { paths, toProjectFit } from '@/config/paths';
import { PageHeader } from '@/components/page-header';
import { useSignedInUser } from '@/features/auth/api/get-current-user';
import { RecentCustomers } from '@/features/customers/components/recent-customers';
import { ProjectsPanel } from '@/features/projects/components/projects-panel';
import { greeting } from './greeting';

export function EstimatorHome() {
  const user = useSignedInUser();
  const navigate = useNavigate();
  return (
    <>
      <PageHeader
        eyebrow={user.shop.name}
        title={greeting(user.name)}
        subtitle="Quotes to write and fit reports to review."
        extra={
          <Button type="primary" onClick={() => navigate(`${paths.projects}?new=1`)}>
            New project
          </Button>
        }
      />
      <Row gutter={[16, 16]}>
        <Col xs={24} xl={14}>
          <Card title="Measured, ready for a fit check" extra={<Link to={`${paths.projects}?status=measured`}>All</Link>} style={{ marginBottom: 16 }}>
            <ProjectsPanel
              label="Projects ready for a fit check"
              status="measured"
              emptyText="No signed-off sheet is waiting for a fit check."
              moreTo={`${paths.projects}?status=measured`}
              rowLink={{ label: 'Fit check', to: toProjectFit }}
            />
          </Card>
          <Card title="Needs a quote" extra={<Link to={`${paths.projects}?status=parts-planned`}>All</Link>} style={{ marginBottom: 16 }}>
            <ProjectsPanel
              label="Projects needing a quote"
              status="parts-planned"
              emptyText="No project is waiting for a quote."
              moreTo={`${paths.projects}?status=parts-planned`}
            />
          </Card>
          <Card title="Fit checked, needs a parts plan" extra={<Link to={`${paths.projects}?status=fit-checked`}>All</Link>} style={{ marginBottom: 16 }}>
            <ProjectsPanel
              label="Projects with a fit report and no parts plan"
              status="fit-checked"
              emptyText="No fit report waiting for a parts plan."
              moreTo={`${paths.projects}?status=fit-checked`}
            />
          </Card>
          <Card title="Quotes with the customer" extra={<Link to={`${paths.projects}?status=quote-sent`}>All</Link>}>
            <ProjectsPanel
              label="Projects awaiting the customer's answer"
              status="quote-sent"
              emptyText="No quote is waiting for an answer."
              moreTo={`${paths.projects}?status=quote-sent`}
            />
          </Card>
        </Col>
        <Col xs={24} xl={10}>
          <Card title="Recent customers" extra={<Link to={paths.customers}>All</Link>}>
            <RecentCustomers
              emptyAction={
                <Button type="primary" onClick={() => navigate(`${paths.customers}?new=1`)}>
                  Add a customer
                </Button>
              }
            />
          </Card>
          <Card title="New, waiting to be measured" extra={<Link to={`${paths.projects}?status=intake`}>All</Link>} style={{ marginTop: 16 }}>
            <ProjectsPanel
              label="New projects waiting to be measured"
              status="intake"
              limit={5}
              emptyText="No new project is waiting for the fabricator."
              moreTo={`${paths.projects}?status=intake`}
              rowLink={{ label: 'Fit check', to: toProjectFit }}
            />
          </Card>
        </Col>
      </Row>
    </>
  );
}
